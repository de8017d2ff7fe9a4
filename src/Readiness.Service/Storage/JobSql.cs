using System.Data.Common;

namespace Readiness.Service.Storage;

/// <summary>
/// The job queue's statements, written once for both stores: SQLite and PostgreSQL agree on <c>RETURNING</c>,
/// <c>ON CONFLICT</c>, window functions and <c>@name</c> parameters. Times are Unix milliseconds from the
/// service's clock, so both stores behave the same under a test clock.
/// </summary>
internal static class JobSql
{
    public const string Columns =
        "id, repository, clone_url, installation_id, pr_number, head_sha, base_ref, body, release_reason, delivery_id, deliveries, state, lease_owner, lease_until, attempts, run_id, error";

    public const string InsertDelivery = "INSERT INTO deliveries(id, event, received) VALUES (@id, @event, @now) ON CONFLICT(id) DO NOTHING";

    public const string ForgetDelivery = "DELETE FROM deliveries WHERE id = @id";

    public const string LinkDelivery = "UPDATE deliveries SET job_id = @job WHERE id = @id";

    /// <summary>The newest queued job of the pull request takes the newer event; its wait never passes the cap from its first event.</summary>
    public const string Collapse = """
        UPDATE jobs SET head_sha = @sha, base_ref = @base, body = @body, release_reason = @reason, clone_url = @url,
            installation_id = @installation, delivery_id = @delivery, deliveries = deliveries + 1, updated = @now,
            not_before = CASE WHEN @due < created + @cap THEN @due ELSE created + @cap END
        WHERE id = (SELECT id FROM jobs WHERE repository = @repo AND pr_number = @pr AND state = 'queued' ORDER BY id DESC LIMIT 1)
        RETURNING id
        """;

    public const string QueuedInRepository = "SELECT COUNT(*) FROM jobs WHERE repository = @repo AND state = 'queued'";

    public const string Insert = """
        INSERT INTO jobs(repository, clone_url, installation_id, pr_number, head_sha, base_ref, body, release_reason,
            delivery_id, state, not_before, created, updated)
        VALUES (@repo, @url, @installation, @pr, @sha, @base, @body, @reason, @delivery, 'queued', @due, @now, @now)
        RETURNING id
        """;

    public const string Renew = "UPDATE jobs SET lease_until = @until, updated = @now WHERE id = @id AND lease_owner = @owner AND state = 'running'";

    public const string Finish = """
        UPDATE jobs SET state = @state, run_id = COALESCE(@run, run_id), error = @error, lease_owner = NULL, lease_until = NULL, updated = @now
        WHERE id = @id AND lease_owner = @owner AND state = 'running'
        """;

    public const string Requeue = """
        UPDATE jobs SET state = 'queued', not_before = @due, error = @error, lease_owner = NULL, lease_until = NULL, updated = @now,
            attempts = attempts - @refund
        WHERE id = @id AND lease_owner = @owner AND state = 'running'
        """;

    public const string HasNewer = "SELECT COUNT(*) FROM jobs WHERE repository = @repo AND pr_number = @pr AND id > @id AND state IN ('queued', 'running')";

    public const string Find = $"SELECT {Columns} FROM jobs WHERE id = @id";

    public const string CountByState = "SELECT state, COUNT(*) FROM jobs GROUP BY state";

    public const string NextDue = "SELECT MIN(not_before) FROM jobs WHERE state = 'queued'";

    public const string Status = """
        SELECT COALESCE(SUM(CASE WHEN state = 'queued' THEN 1 ELSE 0 END), 0), COALESCE(SUM(CASE WHEN state = 'running' THEN 1 ELSE 0 END), 0),
            MIN(CASE WHEN state = 'queued' THEN created END)
        FROM jobs
        """;

    public const string PruneDeliveries = "DELETE FROM deliveries WHERE received < @cutoff";

    public const string PruneJobs = "DELETE FROM jobs WHERE state IN ('done', 'skipped', 'superseded', 'failed') AND updated < @cutoff";

    /// <summary>The message of a job whose lease ran out after its last attempt.</summary>
    public const string GaveUp = "gave up: the worker holding the last allowed attempt stopped before finishing (its lease ran out)";

    /// <summary>
    /// Claims the oldest claimable job. <paramref name="lockClause"/> is PostgreSQL's <c>FOR UPDATE SKIP LOCKED</c>
    /// (instances never wait for or take each other's candidate); SQLite has one writer and needs none.
    /// </summary>
    public static string Claim(string lockClause) => $"""
        UPDATE jobs SET
            state = CASE WHEN state = 'running' AND attempts >= @max THEN 'failed' ELSE 'running' END,
            error = CASE WHEN state = 'running' AND attempts >= @max THEN @gaveUp ELSE error END,
            lease_owner = CASE WHEN state = 'running' AND attempts >= @max THEN NULL ELSE @owner END,
            lease_until = CASE WHEN state = 'running' AND attempts >= @max THEN NULL ELSE @until END,
            attempts = CASE WHEN state = 'running' AND attempts >= @max THEN attempts ELSE attempts + 1 END,
            updated = @now
        WHERE id = (
            SELECT j.id FROM jobs j
            WHERE ((j.state = 'queued' AND j.not_before <= @now) OR (j.state = 'running' AND j.lease_until < @now))
              AND NOT EXISTS (
                SELECT 1 FROM jobs r
                WHERE r.repository = j.repository AND r.pr_number = j.pr_number AND r.id <> j.id
                  AND r.state = 'running' AND r.lease_until >= @now)
              AND (SELECT COUNT(*) FROM jobs x WHERE x.repository = j.repository AND x.state = 'running' AND x.lease_until >= @now) < @maxRunning
            ORDER BY j.id LIMIT 1 {lockClause})
        RETURNING {Columns}
        """;

    public static void AddClaim(DbCommand command, string owner, TimeSpan lease, long now, JobStoreOptions options) => command
        .With("@owner", owner)
        .With("@until", now + (long)lease.TotalMilliseconds)
        .With("@now", now)
        .With("@max", options.MaxAttempts)
        .With("@maxRunning", (long)options.MaxRunningPerRepository)
        .With("@gaveUp", GaveUp);

    public static void AddRequest(DbCommand command, JobRequest r, string deliveryId, long now, JobStoreOptions options) => command
        .With("@due", now + (long)options.QuietPeriod.TotalMilliseconds)
        .With("@cap", (long)options.QuietCap.TotalMilliseconds)
        .With("@repo", r.Repository)
        .With("@url", r.CloneUrl)
        .With("@installation", r.InstallationId)
        .With("@pr", r.Number)
        .With("@sha", r.HeadSha)
        .With("@base", r.BaseRef)
        .With("@body", r.Body)
        .With("@reason", r.ReleaseReason)
        .With("@delivery", deliveryId)
        .With("@now", now);

    public static Job Read(DbDataReader r) => new(
        r.Long(0),
        new JobRequest(
            r.GetString(1),
            r.GetString(2),
            r.NullableLong(3),
            (int)r.Long(4),
            r.GetString(5),
            r.GetString(6),
            r.NullableString(7),
            r.NullableString(8)),
        r.GetString(9),
        (int)r.Long(10),
        r.GetString(11),
        r.NullableString(12),
        r.NullableLong(13) is { } until ? DateTimeOffset.FromUnixTimeMilliseconds(until) : null,
        (int)r.Long(14),
        r.NullableLong(15),
        r.NullableString(16));
}
