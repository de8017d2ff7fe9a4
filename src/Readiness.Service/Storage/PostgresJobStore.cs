using Npgsql;

namespace Readiness.Service.Storage;

/// <summary>
/// The job queue in PostgreSQL, shared by several instances with no coordinator of their own: a claim takes its
/// candidate <c>FOR UPDATE SKIP LOCKED</c>, so one job goes to exactly one instance; a unique index allows one
/// running job per pull request; deliveries of one pull request queue under a transaction advisory lock, so two
/// instances never queue two jobs for it.
/// </summary>
public sealed class PostgresJobStore(PostgresDatabase database, TimeProvider time, JobStoreOptions? options = null) : IJobStore
{
    private const string UniqueViolation = "23505";
    private readonly JobStoreOptions options = options ?? new JobStoreOptions();

    public async Task<(EnqueueOutcome Outcome, long? JobId)> RecordDeliveryAsync(
        string deliveryId, string eventName, JobRequest? request, CancellationToken cancellationToken)
    {
        ArgumentException.ThrowIfNullOrEmpty(deliveryId);
        var now = Now();
        await using var c = await database.OpenAsync(cancellationToken).ConfigureAwait(false);
        await using var t = await c.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
        if (request is not null)
        {
            await using var lockPullRequest = new NpgsqlCommand("SELECT pg_advisory_xact_lock(hashtext(@repo), @pr)", c, t);
            lockPullRequest.With("@repo", request.Repository).With("@pr", request.Number);
            await lockPullRequest.ExecuteNonQueryAsync(cancellationToken).ConfigureAwait(false);
        }

        var result = JobQueueLogic.RecordDelivery(sql => new NpgsqlCommand(sql, c, t), deliveryId, eventName, request, now, options);
        await t.CommitAsync(cancellationToken).ConfigureAwait(false);
        return result;
    }

    public async Task<Job?> ClaimAsync(string owner, TimeSpan lease, CancellationToken cancellationToken)
    {
        ArgumentException.ThrowIfNullOrEmpty(owner);
        await using var c = await database.OpenAsync(cancellationToken).ConfigureAwait(false);
        await using var claim = new NpgsqlCommand(JobSql.Claim("FOR UPDATE OF j SKIP LOCKED"), c);
        JobSql.AddClaim(claim, owner, lease, Now(), options);
        try
        {
            await using var reader = await claim.ExecuteReaderAsync(cancellationToken).ConfigureAwait(false);
            return await reader.ReadAsync(cancellationToken).ConfigureAwait(false) ? JobSql.Read(reader) : null;
        }
        catch (PostgresException e) when (e.SqlState == UniqueViolation)
        {
            // Another instance claimed a job of the same pull request at the same moment; the next claim looks again.
            return null;
        }
    }

    public Task<bool> RenewAsync(long jobId, string owner, TimeSpan lease, CancellationToken cancellationToken)
    {
        var now = Now();
        return ChangeAsync(JobSql.Renew, c => c.With("@until", now + (long)lease.TotalMilliseconds).With("@now", now).With("@id", jobId).With("@owner", owner), cancellationToken);
    }

    public Task<bool> FinishAsync(long jobId, string owner, string state, long? runId, string? error, CancellationToken cancellationToken)
    {
        var now = Now();
        return ChangeAsync(JobSql.Finish, c => c.With("@state", state).With("@run", runId).With("@error", error).With("@now", now).With("@id", jobId).With("@owner", owner), cancellationToken);
    }

    public Task<bool> RequeueAsync(long jobId, string owner, TimeSpan delay, string? error, CancellationToken cancellationToken, bool countAttempt = true)
    {
        var now = Now();
        return ChangeAsync(JobSql.Requeue, c => c.With("@due", now + (long)delay.TotalMilliseconds).With("@error", error).With("@now", now).With("@id", jobId).With("@owner", owner).With("@refund", countAttempt ? 0 : 1), cancellationToken);
    }

    public bool HasNewer(Job job)
    {
        ArgumentNullException.ThrowIfNull(job);
        using var c = database.Open();
        return JobReads.HasNewer(c, job);
    }

    public Job? Find(long jobId)
    {
        using var c = database.Open();
        return JobReads.Find(c, jobId);
    }

    public IReadOnlyDictionary<string, long> CountByState()
    {
        using var c = database.Open();
        return JobReads.CountByState(c);
    }

    public DateTimeOffset? NextDue()
    {
        using var c = database.Open();
        return JobReads.NextDue(c);
    }

    public QueueStatus Status()
    {
        using var c = database.Open();
        return JobReads.Status(c, time.GetUtcNow());
    }

    public async Task<long> PruneAsync(TimeSpan retention, CancellationToken cancellationToken)
    {
        var cutoff = Now() - (long)retention.TotalMilliseconds;
        await using var c = await database.OpenAsync(cancellationToken).ConfigureAwait(false);
        long removed = 0;
        foreach (var sql in new[] { JobSql.PruneDeliveries, JobSql.PruneJobs })
        {
            await using var command = new NpgsqlCommand(sql, c);
            command.With("@cutoff", cutoff);
            removed += await command.ExecuteNonQueryAsync(cancellationToken).ConfigureAwait(false);
        }

        return removed;
    }

    private async Task<bool> ChangeAsync(string sql, Action<NpgsqlCommand> parameters, CancellationToken cancellationToken)
    {
        await using var c = await database.OpenAsync(cancellationToken).ConfigureAwait(false);
        await using var command = new NpgsqlCommand(sql, c);
        parameters(command);
        return await command.ExecuteNonQueryAsync(cancellationToken).ConfigureAwait(false) == 1;
    }

    private long Now() => time.GetUtcNow().ToUnixTimeMilliseconds();
}
