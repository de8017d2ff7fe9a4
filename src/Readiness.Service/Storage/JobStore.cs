using Microsoft.Data.Sqlite;

namespace Readiness.Service.Storage;

/// <summary>
/// Deliveries and jobs. A job is claimed with a lease; a lease that runs out (the process died) makes the job
/// claimable again. Jobs for one pull request collapse to the newest head commit and never run side by side.
/// A queued job waits for a quiet period after its last event, so a burst of events (opened, labeled, a push)
/// becomes one run.
/// </summary>
public sealed class JobStore(Database database, TimeProvider time, TimeSpan quietPeriod = default)
{
    private const string Columns =
        "id, repository, clone_url, installation_id, pr_number, head_sha, base_ref, body, release_reason, delivery_id, deliveries, state, lease_owner, lease_until, attempts, run_id";

    /// <summary>Records a delivery and, when <paramref name="request"/> is given, queues (or collapses into) a job, in one transaction.</summary>
    public Task<(EnqueueOutcome Outcome, long? JobId)> RecordDeliveryAsync(
        string deliveryId, string eventName, JobRequest? request, CancellationToken cancellationToken)
    {
        ArgumentException.ThrowIfNullOrEmpty(deliveryId);
        var now = Now();
        return database.WriteAsync<(EnqueueOutcome, long?)>((c, t) =>
        {
            using (var insert = Command(c, t, "INSERT INTO deliveries(id, event, received) VALUES ($id, $event, $now) ON CONFLICT(id) DO NOTHING"))
            {
                insert.Parameters.AddWithValue("$id", deliveryId);
                insert.Parameters.AddWithValue("$event", eventName);
                insert.Parameters.AddWithValue("$now", now);
                if (insert.ExecuteNonQuery() == 0)
                {
                    return (EnqueueOutcome.Duplicate, null);
                }
            }

            if (request is null)
            {
                return (EnqueueOutcome.Ignored, null);
            }

            EnqueueOutcome outcome;
            long jobId;
            using (var collapse = Command(c, t, """
                UPDATE jobs SET head_sha = $sha, base_ref = $base, body = $body, release_reason = $reason, clone_url = $url,
                    installation_id = $installation, delivery_id = $delivery, deliveries = deliveries + 1, updated = $now, not_before = $due
                WHERE id = (SELECT id FROM jobs WHERE repository = $repo AND pr_number = $pr AND state = 'queued' ORDER BY id DESC LIMIT 1)
                RETURNING id
                """))
            {
                AddRequest(collapse, request, deliveryId, now);
                var existing = collapse.ExecuteScalar();
                if (existing is long id)
                {
                    outcome = EnqueueOutcome.Collapsed;
                    jobId = id;
                }
                else
                {
                    using var insert = Command(c, t, """
                        INSERT INTO jobs(repository, clone_url, installation_id, pr_number, head_sha, base_ref, body, release_reason,
                            delivery_id, state, not_before, created, updated)
                        VALUES ($repo, $url, $installation, $pr, $sha, $base, $body, $reason, $delivery, 'queued', $due, $now, $now)
                        RETURNING id
                        """);
                    AddRequest(insert, request, deliveryId, now);
                    jobId = (long)insert.ExecuteScalar()!;
                    outcome = EnqueueOutcome.Queued;
                }
            }

            using var link = Command(c, t, "UPDATE deliveries SET job_id = $job WHERE id = $id");
            link.Parameters.AddWithValue("$job", jobId);
            link.Parameters.AddWithValue("$id", deliveryId);
            link.ExecuteNonQuery();
            return (outcome, jobId);
        }, cancellationToken);
    }

    /// <summary>
    /// Claims the oldest job that is queued (and due) or whose lease ran out, unless another job for the same pull
    /// request holds a live lease.
    /// </summary>
    public Task<Job?> ClaimAsync(string owner, TimeSpan lease, CancellationToken cancellationToken)
    {
        ArgumentException.ThrowIfNullOrEmpty(owner);
        var now = Now();
        return database.WriteAsync((c, t) =>
        {
            using var claim = Command(c, t, $"""
                UPDATE jobs SET state = 'running', lease_owner = $owner, lease_until = $until, attempts = attempts + 1, updated = $now
                WHERE id = (
                    SELECT j.id FROM jobs j
                    WHERE ((j.state = 'queued' AND j.not_before <= $now) OR (j.state = 'running' AND j.lease_until < $now))
                      AND NOT EXISTS (
                        SELECT 1 FROM jobs r
                        WHERE r.repository = j.repository AND r.pr_number = j.pr_number AND r.id <> j.id
                          AND r.state = 'running' AND r.lease_until >= $now)
                    ORDER BY j.id LIMIT 1)
                RETURNING {Columns}
                """);
            claim.Parameters.AddWithValue("$owner", owner);
            claim.Parameters.AddWithValue("$until", now + (long)lease.TotalMilliseconds);
            claim.Parameters.AddWithValue("$now", now);
            using var reader = claim.ExecuteReader();
            return reader.Read() ? ReadJob(reader) : null;
        }, cancellationToken);
    }

    /// <summary>Extends the lease; false when this owner no longer holds it.</summary>
    public Task<bool> RenewAsync(long jobId, string owner, TimeSpan lease, CancellationToken cancellationToken)
    {
        var now = Now();
        return database.WriteAsync((c, t) =>
        {
            using var renew = Command(c, t, "UPDATE jobs SET lease_until = $until, updated = $now WHERE id = $id AND lease_owner = $owner AND state = 'running'");
            renew.Parameters.AddWithValue("$until", now + (long)lease.TotalMilliseconds);
            renew.Parameters.AddWithValue("$now", now);
            renew.Parameters.AddWithValue("$id", jobId);
            renew.Parameters.AddWithValue("$owner", owner);
            return renew.ExecuteNonQuery() == 1;
        }, cancellationToken);
    }

    /// <summary>Ends a job this owner holds (done, skipped, superseded or failed); false when the lease was lost.</summary>
    public Task<bool> FinishAsync(long jobId, string owner, string state, long? runId, string? error, CancellationToken cancellationToken)
    {
        var now = Now();
        return database.WriteAsync((c, t) =>
        {
            using var finish = Command(c, t, """
                UPDATE jobs SET state = $state, run_id = COALESCE($run, run_id), error = $error, lease_owner = NULL, lease_until = NULL, updated = $now
                WHERE id = $id AND lease_owner = $owner AND state = 'running'
                """);
            finish.Parameters.AddWithValue("$state", state);
            finish.Parameters.AddWithValue("$run", (object?)runId ?? DBNull.Value);
            finish.Parameters.AddWithValue("$error", (object?)error ?? DBNull.Value);
            finish.Parameters.AddWithValue("$now", now);
            finish.Parameters.AddWithValue("$id", jobId);
            finish.Parameters.AddWithValue("$owner", owner);
            return finish.ExecuteNonQuery() == 1;
        }, cancellationToken);
    }

    /// <summary>Puts a job this owner holds back in the queue, due after <paramref name="delay"/>.</summary>
    public Task<bool> RequeueAsync(long jobId, string owner, TimeSpan delay, string? error, CancellationToken cancellationToken)
    {
        var now = Now();
        return database.WriteAsync((c, t) =>
        {
            using var requeue = Command(c, t, """
                UPDATE jobs SET state = 'queued', not_before = $due, error = $error, lease_owner = NULL, lease_until = NULL, updated = $now
                WHERE id = $id AND lease_owner = $owner AND state = 'running'
                """);
            requeue.Parameters.AddWithValue("$due", now + (long)delay.TotalMilliseconds);
            requeue.Parameters.AddWithValue("$error", (object?)error ?? DBNull.Value);
            requeue.Parameters.AddWithValue("$now", now);
            requeue.Parameters.AddWithValue("$id", jobId);
            requeue.Parameters.AddWithValue("$owner", owner);
            return requeue.ExecuteNonQuery() == 1;
        }, cancellationToken);
    }

    /// <summary>Whether a newer job for the same pull request is waiting or running.</summary>
    public bool HasNewer(Job job)
    {
        ArgumentNullException.ThrowIfNull(job);
        using var c = database.Open();
        using var q = c.CreateCommand();
        q.CommandText = "SELECT EXISTS(SELECT 1 FROM jobs WHERE repository = $repo AND pr_number = $pr AND id > $id AND state IN ('queued', 'running'))";
        q.Parameters.AddWithValue("$repo", job.Request.Repository);
        q.Parameters.AddWithValue("$pr", job.Request.Number);
        q.Parameters.AddWithValue("$id", job.Id);
        return (long)q.ExecuteScalar()! == 1;
    }

    public Job? Find(long jobId)
    {
        using var c = database.Open();
        using var q = c.CreateCommand();
        q.CommandText = $"SELECT {Columns} FROM jobs WHERE id = $id";
        q.Parameters.AddWithValue("$id", jobId);
        using var reader = q.ExecuteReader();
        return reader.Read() ? ReadJob(reader) : null;
    }

    /// <summary>How many jobs are in each state.</summary>
    public IReadOnlyDictionary<string, long> CountByState()
    {
        using var c = database.Open();
        using var q = c.CreateCommand();
        q.CommandText = "SELECT state, COUNT(*) FROM jobs GROUP BY state";
        using var reader = q.ExecuteReader();
        var counts = new Dictionary<string, long>(StringComparer.Ordinal);
        while (reader.Read())
        {
            counts[reader.GetString(0)] = reader.GetInt64(1);
        }

        return counts;
    }

    /// <summary>The time of the next queued job that is not yet due, if any.</summary>
    public DateTimeOffset? NextDue()
    {
        using var c = database.Open();
        using var q = c.CreateCommand();
        q.CommandText = "SELECT MIN(not_before) FROM jobs WHERE state = 'queued'";
        return q.ExecuteScalar() is long ms ? DateTimeOffset.FromUnixTimeMilliseconds(ms) : null;
    }

    private long Now() => time.GetUtcNow().ToUnixTimeMilliseconds();

    private static SqliteCommand Command(SqliteConnection c, SqliteTransaction t, string sql)
    {
        var command = c.CreateCommand();
        command.Transaction = t;
        command.CommandText = sql;
        return command;
    }

    private void AddRequest(SqliteCommand command, JobRequest r, string deliveryId, long now)
    {
        command.Parameters.AddWithValue("$due", now + (long)quietPeriod.TotalMilliseconds);
        command.Parameters.AddWithValue("$repo", r.Repository);
        command.Parameters.AddWithValue("$url", r.CloneUrl);
        command.Parameters.AddWithValue("$installation", (object?)r.InstallationId ?? DBNull.Value);
        command.Parameters.AddWithValue("$pr", r.Number);
        command.Parameters.AddWithValue("$sha", r.HeadSha);
        command.Parameters.AddWithValue("$base", r.BaseRef);
        command.Parameters.AddWithValue("$body", (object?)r.Body ?? DBNull.Value);
        command.Parameters.AddWithValue("$reason", (object?)r.ReleaseReason ?? DBNull.Value);
        command.Parameters.AddWithValue("$delivery", deliveryId);
        command.Parameters.AddWithValue("$now", now);
    }

    private static Job ReadJob(SqliteDataReader r) => new(
        r.GetInt64(0),
        new JobRequest(
            r.GetString(1),
            r.GetString(2),
            r.IsDBNull(3) ? null : r.GetInt64(3),
            r.GetInt32(4),
            r.GetString(5),
            r.GetString(6),
            r.IsDBNull(7) ? null : r.GetString(7),
            r.IsDBNull(8) ? null : r.GetString(8)),
        r.GetString(9),
        r.GetInt32(10),
        r.GetString(11),
        r.IsDBNull(12) ? null : r.GetString(12),
        r.IsDBNull(13) ? null : DateTimeOffset.FromUnixTimeMilliseconds(r.GetInt64(13)),
        r.GetInt32(14),
        r.IsDBNull(15) ? null : r.GetInt64(15));
}
