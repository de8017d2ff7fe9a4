namespace Readiness.Service.Storage;

/// <summary>What an orchestrator's readiness probe reads: waiting and running jobs, and how long the oldest has waited.</summary>
public sealed record QueueStatus(long Queued, long Running, TimeSpan? OldestWaiting);
