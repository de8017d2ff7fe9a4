namespace Readiness.Core.Projects;

/// <summary>Where a declaration stands: repository-relative path and 1-based line.</summary>
public sealed record SourceLocation(string Path, int Line)
{
    public override string ToString() => $"{Path}:{Line}";
}
