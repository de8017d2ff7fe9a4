using NuGet.Versioning;

namespace Readiness.Core.Changelogs;

/// <summary>A changelog read as release sections and link reference definitions.</summary>
/// <param name="Sections">Release sections in file order (newest first in a Keep a Changelog file).</param>
/// <param name="Links">Every link reference definition of the file.</param>
/// <param name="SectionLevel">The heading level release sections use (2 in Keep a Changelog), or null when none was found.</param>
public sealed record ChangelogDocument(
    IReadOnlyList<ChangelogSection> Sections,
    IReadOnlyList<ChangelogLink> Links,
    int? SectionLevel)
{
    public ChangelogSection? Unreleased => Sections.FirstOrDefault(s => s.IsUnreleased);

    /// <summary>
    /// Sections whose version equals <paramref name="version"/> by NuGet's comparison: numeric parts and
    /// pre-release labels (case-insensitively) compared, build metadata ignored, so <c>2.4</c> matches <c>2.4.0</c>.
    /// </summary>
    public IReadOnlyList<ChangelogSection> SectionsFor(NuGetVersion version)
    {
        ArgumentNullException.ThrowIfNull(version);
        return Sections.Where(s => s.Version is { } v && VersionComparer.Default.Equals(v, version)).ToArray();
    }

    /// <summary>Link definitions whose label is a version or <c>Unreleased</c>.</summary>
    public IEnumerable<ChangelogLink> VersionLinks => Links.Where(l =>
        string.Equals(l.Label.Trim(), "unreleased", StringComparison.OrdinalIgnoreCase)
        || NuGetVersion.TryParse(l.Label.Trim().TrimStart('v', 'V'), out _));

    /// <summary>The definition labelled with <paramref name="version"/> (with or without a leading <c>v</c>).</summary>
    public ChangelogLink? LinkFor(NuGetVersion version)
    {
        ArgumentNullException.ThrowIfNull(version);
        return Links.FirstOrDefault(l => NuGetVersion.TryParse(l.Label.Trim().TrimStart('v', 'V'), out var v)
            && VersionComparer.Default.Equals(v, version));
    }
}
