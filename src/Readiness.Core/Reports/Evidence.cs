namespace Readiness.Core.Reports;

/// <summary>Where a result points: a repository-relative path and, when known, a 1-based line.</summary>
public sealed record Evidence(string Path, int? Line = null)
{
    public override string ToString() => Line is { } line ? $"{Path}:{line}" : Path;
}
