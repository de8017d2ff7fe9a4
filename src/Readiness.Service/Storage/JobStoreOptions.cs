namespace Readiness.Service.Storage;

/// <summary>How the queue behaves, the same for both stores.</summary>
/// <param name="QuietPeriod">How long a queued job waits after its pull request's last event before it may run.</param>
/// <param name="MaxQuietPeriod">The longest a job waits from its first event however many follow (bursts never starve it).</param>
/// <param name="MaxAttempts">Claims a job may have; a lease that runs out after the last one fails the job.</param>
/// <param name="MaxQueuedPerRepository">Queued jobs one repository may hold; more are refused (the forge redelivers on demand).</param>
/// <param name="MaxRunningPerRepository">Jobs of one repository running at once, so one repository's burst leaves workers for others.</param>
public sealed record JobStoreOptions(
    TimeSpan QuietPeriod = default,
    TimeSpan? MaxQuietPeriod = null,
    int MaxAttempts = 5,
    int MaxQueuedPerRepository = 1000,
    int MaxRunningPerRepository = 4)
{
    /// <summary>The quiet period's cap: ten quiet periods, at least one minute, unless set.</summary>
    public TimeSpan QuietCap => MaxQuietPeriod ?? TimeSpan.FromTicks(Math.Max(QuietPeriod.Ticks * 10, TimeSpan.FromMinutes(1).Ticks));
}
