namespace Readiness.Service.Worker;

/// <summary>How a job ended: its final state, the run it stored (if any) and a note for the job row.</summary>
public sealed record JobOutcome(string State, long? RunId, string? Note);
