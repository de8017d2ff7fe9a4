namespace Readiness.Core.Reports;

/// <summary>The published standard a check enforces, linked from every report line.</summary>
public sealed record StandardReference(string Name, string Url);
