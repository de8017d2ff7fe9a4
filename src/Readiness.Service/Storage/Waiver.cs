namespace Readiness.Service.Storage;

/// <summary>A check a person chose to bypass, and why.</summary>
public sealed record Waiver(string Check, string Reason);
