namespace Readiness.Service.Storage;

/// <summary>
/// Deliveries and jobs, in SQLite (<see cref="SqliteJobStore"/>) or PostgreSQL (<see cref="PostgresJobStore"/>);
/// both pass one contract test suite. A job is claimed with a lease; a lease that runs out (the process died) makes
/// the job claimable again, each claim counting one attempt. Jobs for one pull request collapse to the newest head
/// commit and never run side by side.
/// </summary>
public interface IJobStore
{
    /// <summary>Records a delivery and, when <paramref name="request"/> is given, queues (or collapses into) a job, in one transaction.</summary>
    Task<(EnqueueOutcome Outcome, long? JobId)> RecordDeliveryAsync(string deliveryId, string eventName, JobRequest? request, CancellationToken cancellationToken);

    /// <summary>
    /// Claims the oldest job that is queued (and due) or whose lease ran out, unless another job for the same pull
    /// request holds a live lease or its repository already runs its share. A job whose lease ran out after its
    /// last allowed attempt is returned once in state <see cref="JobState.Failed"/> instead, so the caller reports it.
    /// </summary>
    Task<Job?> ClaimAsync(string owner, TimeSpan lease, CancellationToken cancellationToken);

    /// <summary>Extends the lease; false when this owner no longer holds it.</summary>
    Task<bool> RenewAsync(long jobId, string owner, TimeSpan lease, CancellationToken cancellationToken);

    /// <summary>Ends a job this owner holds (done, skipped, superseded or failed); false when the lease was lost.</summary>
    Task<bool> FinishAsync(long jobId, string owner, string state, long? runId, string? error, CancellationToken cancellationToken);

    /// <summary>
    /// Puts a job this owner holds back in the queue, due after <paramref name="delay"/>; with
    /// <paramref name="countAttempt"/> false its claim is not counted (the forge asked it to wait; it did not fail).
    /// </summary>
    Task<bool> RequeueAsync(long jobId, string owner, TimeSpan delay, string? error, CancellationToken cancellationToken, bool countAttempt = true);

    /// <summary>Whether a newer job for the same pull request is waiting or running.</summary>
    bool HasNewer(Job job);

    Job? Find(long jobId);

    /// <summary>How many jobs are in each state.</summary>
    IReadOnlyDictionary<string, long> CountByState();

    /// <summary>The time of the next queued job that is not yet due, if any.</summary>
    DateTimeOffset? NextDue();

    /// <summary>The queue's depth and the oldest waiting job's age; throws when the database cannot be reached.</summary>
    QueueStatus Status();

    /// <summary>Deletes deliveries and finished jobs older than <paramref name="retention"/>; returns how many rows went.</summary>
    Task<long> PruneAsync(TimeSpan retention, CancellationToken cancellationToken);
}
