using NuGet.Versioning;

namespace Readiness.Core.Changelogs;

/// <summary>One release section of a changelog: a version heading (or <c>Unreleased</c>) and what stands under it.</summary>
/// <param name="Heading">The heading's text without the <c>#</c> marks, links flattened to <c>[text]</c>.</param>
/// <param name="VersionText">The version as written (e.g. <c>1.1.1</c>, <c>v1.1.1</c>); null for Unreleased.</param>
/// <param name="DateText">The text read as the date, when there is one.</param>
/// <param name="Date">The date, when <paramref name="DateText"/> is exactly <c>YYYY-MM-DD</c> and a real date.</param>
/// <param name="IsYanked">The heading ends with <c>[YANKED]</c>.</param>
/// <param name="Line">1-based line of the heading.</param>
/// <param name="Entries">List items (top level of each list) under the section, change-type subsections included.</param>
/// <param name="Paragraphs">Paragraphs under the section outside lists.</param>
/// <param name="ChangeTypes">The sub-headings (<c>### Added</c>, ...), in order.</param>
/// <param name="HeadingLink">Where the heading's link goes, when the heading holds a resolved link.</param>
/// <param name="HeadingLinkLine">1-based line of the reference definition the heading link uses, if any.</param>
public sealed record ChangelogSection(
    string Heading,
    string? VersionText,
    string? DateText,
    DateOnly? Date,
    bool IsYanked,
    int Line,
    int Entries,
    int Paragraphs,
    IReadOnlyList<string> ChangeTypes,
    string? HeadingLink,
    int? HeadingLinkLine)
{
    public bool IsUnreleased => VersionText is null;

    /// <summary>The version, parsed as NuGet does after dropping a leading <c>v</c>; null when it is not one.</summary>
    public NuGetVersion? Version =>
        VersionText is { } text && NuGetVersion.TryParse(text.TrimStart('v', 'V'), out var version) ? version : null;
}
