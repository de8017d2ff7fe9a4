using Microsoft.Data.Sqlite;

namespace Readiness.Service.Storage;

/// <summary>
/// The job queue in the SQLite file: one process, writes through the database's single writer thread. A queued
/// job waits for a quiet period after its last event (capped from its first), so a burst of events becomes one run.
/// </summary>
public sealed class SqliteJobStore(SqliteDatabase database, TimeProvider time, JobStoreOptions? options = null) : IJobStore
{
    private readonly JobStoreOptions options = options ?? new JobStoreOptions();

    public Task<(EnqueueOutcome Outcome, long? JobId)> RecordDeliveryAsync(
        string deliveryId, string eventName, JobRequest? request, CancellationToken cancellationToken)
    {
        ArgumentException.ThrowIfNullOrEmpty(deliveryId);
        var now = Now();
        return database.WriteAsync((c, t) => JobQueueLogic.RecordDelivery(sql => Command(c, t, sql), deliveryId, eventName, request, now, options), cancellationToken);
    }

    public Task<Job?> ClaimAsync(string owner, TimeSpan lease, CancellationToken cancellationToken)
    {
        ArgumentException.ThrowIfNullOrEmpty(owner);
        var now = Now();
        return database.WriteAsync((c, t) =>
        {
            using var claim = Command(c, t, JobSql.Claim(string.Empty));
            JobSql.AddClaim(claim, owner, lease, now, options);
            using var reader = claim.ExecuteReader();
            return reader.Read() ? JobSql.Read(reader) : null;
        }, cancellationToken);
    }

    public Task<bool> RenewAsync(long jobId, string owner, TimeSpan lease, CancellationToken cancellationToken)
    {
        var now = Now();
        return Change(JobSql.Renew, c => c.With("@until", now + (long)lease.TotalMilliseconds).With("@now", now).With("@id", jobId).With("@owner", owner), cancellationToken);
    }

    public Task<bool> FinishAsync(long jobId, string owner, string state, long? runId, string? error, CancellationToken cancellationToken)
    {
        var now = Now();
        return Change(JobSql.Finish, c => c.With("@state", state).With("@run", runId).With("@error", error).With("@now", now).With("@id", jobId).With("@owner", owner), cancellationToken);
    }

    public Task<bool> RequeueAsync(long jobId, string owner, TimeSpan delay, string? error, CancellationToken cancellationToken, bool countAttempt = true)
    {
        var now = Now();
        return Change(JobSql.Requeue, c => c.With("@due", now + (long)delay.TotalMilliseconds).With("@error", error).With("@now", now).With("@id", jobId).With("@owner", owner).With("@refund", countAttempt ? 0 : 1), cancellationToken);
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

    public Task<long> PruneAsync(TimeSpan retention, CancellationToken cancellationToken)
    {
        var cutoff = Now() - (long)retention.TotalMilliseconds;
        return database.WriteAsync((c, t) =>
        {
            using var deliveries = Command(c, t, JobSql.PruneDeliveries).With("@cutoff", cutoff);
            using var jobs = Command(c, t, JobSql.PruneJobs).With("@cutoff", cutoff);
            return (long)deliveries.ExecuteNonQuery() + jobs.ExecuteNonQuery();
        }, cancellationToken);
    }

    private Task<bool> Change(string sql, Action<SqliteCommand> parameters, CancellationToken cancellationToken) =>
        database.WriteAsync((c, t) =>
        {
            using var command = Command(c, t, sql);
            parameters(command);
            return command.ExecuteNonQuery() == 1;
        }, cancellationToken);

    private long Now() => time.GetUtcNow().ToUnixTimeMilliseconds();

    private static SqliteCommand Command(SqliteConnection c, SqliteTransaction t, string sql)
    {
        var command = c.CreateCommand();
        command.Transaction = t;
        command.CommandText = sql;
        return command;
    }
}
