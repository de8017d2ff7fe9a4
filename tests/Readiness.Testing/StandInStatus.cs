namespace Readiness.Testing;

/// <summary>A commit status the forge stand-in received.</summary>
public sealed record StandInStatus(string Owner, string Repo, string Sha, string State, string? Description, string? TargetUrl, string Context);
