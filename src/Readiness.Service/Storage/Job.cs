namespace Readiness.Service.Storage;

/// <summary>A job row as a worker claimed it.</summary>
public sealed record Job(
    long Id,
    JobRequest Request,
    string DeliveryId,
    int Deliveries,
    string State,
    string? LeaseOwner,
    DateTimeOffset? LeaseUntil,
    int Attempts,
    long? RunId,
    string? Error = null);
