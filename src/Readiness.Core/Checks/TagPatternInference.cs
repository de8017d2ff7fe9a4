using Readiness.Core.Projects;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Checks;

/// <summary>
/// Without a configured <c>tag-pattern</c>, the pattern the repository's own release tags follow: the candidate
/// that the most release-looking tags on the history match (ties go to the earlier candidate). The inspected tag,
/// when there is one, must match the chosen pattern if any candidate matches it.
/// </summary>
public static class TagPatternInference
{
    /// <summary>The forms libraries tag releases with (common practice, no published source), most usual first.</summary>
    public static readonly IReadOnlyList<string> Candidates =
    [
        "v{version}",
        "{version}",
        "{id}/v{version}",
        "{id}/{version}",
        "{id}-v{version}",
        "{id}-{version}",
        "release-{version}",
        "release/v{version}",
        "release/{version}",
    ];

    /// <summary>The pattern and a sentence saying how it was chosen, for the report.</summary>
    public static (TagPattern Pattern, string Reason) Infer(ReleaseSnapshot snapshot, ProjectModel projects)
    {
        ArgumentNullException.ThrowIfNull(snapshot);
        ArgumentNullException.ThrowIfNull(projects);
        var ids = projects.Projects.Select(p => p.PackageId).ToHashSet(StringComparer.OrdinalIgnoreCase);
        var tags = snapshot.Tags.Select(t => t.Name).Distinct(StringComparer.Ordinal).ToList();
        var scored = Candidates
            .Select((pattern, order) => (Pattern: new TagPattern(pattern), Order: order))
            .Select(c => (c.Pattern, c.Order, Count: tags.Count(t => Matches(c.Pattern, t, ids))))
            .ToList();
        var inspected = snapshot.Tag?.Name;
        var fitting = inspected is null ? scored : scored.Where(c => Matches(c.Pattern, inspected, ids)).ToList();
        if (fitting.Count == 0)
        {
            fitting = scored;
        }

        var best = fitting.OrderByDescending(c => c.Count).ThenBy(c => c.Order).First();
        if (best.Count == 0 && inspected is null)
        {
            return (TagPattern.Default, $"tag pattern {TagPattern.Default.Pattern}: the default (no tag-pattern in {Configuration.RepositoryConfig.FileName}, and no release tags on the history to infer one from)");
        }

        return (best.Pattern, $"tag pattern {best.Pattern.Pattern}: inferred from {best.Count} of {tags.Count} tags on the history"
            + (inspected is null ? string.Empty : $" and the release tag {inspected}")
            + $" (no tag-pattern in {Configuration.RepositoryConfig.FileName}; set one to fix it)");
    }

    private static bool Matches(TagPattern pattern, string tag, HashSet<string> ids) =>
        pattern.Match(tag) is { } match && (match.Id is null || ids.Contains(match.Id));
}
