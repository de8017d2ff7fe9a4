namespace Readiness.Core.Projects;

/// <summary>A <c>ProjectReference</c>: <paramref name="Path"/> is the referenced project, repository-relative and normalised.</summary>
public sealed record ProjectReferenceItem(
    string Path,
    IReadOnlyDictionary<string, string> Metadata,
    SourceLocation Location)
{
    public string? Meta(string name) => Metadata.TryGetValue(name, out var v) ? v : null;
}
