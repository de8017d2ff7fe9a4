namespace Readiness.Core.Projects;

/// <summary>Whether one project is released as a package, and the evidence that decided it (for the report).</summary>
public sealed record ReleaseDecision(string Path, bool Released, string Reason);
