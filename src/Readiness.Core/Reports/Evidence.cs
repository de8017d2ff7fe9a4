namespace Readiness.Core.Reports;

/// <summary>Where a result points: a repository-relative path and, when known, a 1-based line.</summary>
public sealed record Evidence(string Path, int? Line = null)
{
    public override string ToString() => Line is { } line ? $"{Path}:{line}" : Path;

    /// <summary>The places without repeats, and without a bare path that a line of the same file already names.</summary>
    public static IReadOnlyList<Evidence> Condense(IEnumerable<Evidence> evidence)
    {
        ArgumentNullException.ThrowIfNull(evidence);
        var all = evidence.Distinct().ToList();
        return all.Where(e => e.Line is not null || !all.Any(o => o.Line is not null && o.Path == e.Path)).ToArray();
    }
}
