using System.Globalization;

using Readiness.Core.Changelogs;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Changelog;

/// <summary>
/// The changelog has a section for exactly the release's version, dated <c>YYYY-MM-DD</c> no later than the release
/// date, with at least one entry.
/// </summary>
/// <remarks>
/// "Exactly this version" is NuGet's equality: numeric parts compared as numbers (<c>2.4</c> is <c>2.4.0</c>, as the
/// registry would store it), pre-release labels compared case-insensitively, build metadata ignored (SemVer 2.0.0
/// §10). A leading <c>v</c> in the heading is tolerated. The release date is the tag's date as a calendar date in
/// the tagger's own UTC offset (a tag made on the 21st in UTC+13 is dated the 21st even though it is the 20th in
/// UTC); without a tag it is today. Headings accepted: see <see cref="ChangelogParser"/>. Entries are list items;
/// a section written as prose (paragraphs, no list) passes with a note.
/// </remarks>
public sealed class ChangelogHasEntryCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.ChangelogHasEntry,
        "The changelog has a dated entry for this version",
        Severity.Block,
        Standards.KeepAChangelog,
        "The changelog is how consumers learn what a version changes; a release missing from it, or dated in the "
        + "future, leaves them guessing whether upgrading is safe.",
        "Move the entries under `## [Unreleased]` into a new section `## [VERSION] - YYYY-MM-DD` (the release date), "
        + "grouped under ### Added / Changed / Deprecated / Removed / Fixed / Security.")
    {
        Settings = ["changelog"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (ChangelogFiles.InForgeReleases(context) is { } elsewhere)
        {
            yield return elsewhere;
            yield break;
        }

        foreach (var target in ChangelogFiles.Resolve(context))
        {
            var (input, instead) = ChangelogInput.Open(context, target);
            yield return instead ?? Judge(context, input!);
        }
    }

    private static Finding Judge(CheckContext context, ChangelogInput input)
    {
        var release = context.Release;
        var releaseDate = DateOnly.FromDateTime(release.Date.DateTime);
        var dateName = release.Tag is { } tag ? $"the date of tag {tag.Name}" : "today (there is no release tag)";
        var shown = input.Version.ToNormalizedString();
        var newHeading = $"## [{shown}] - {Iso(releaseDate)}";
        var path = input.Path;
        var package = input.Target.Package;
        var unreleased = input.Document.Unreleased;
        var unreleasedCount = unreleased is null ? 0 : unreleased.Entries + unreleased.Paragraphs;
        var moveHint = unreleased is not null && unreleasedCount > 0
            ? $"{(unreleasedCount == 1 ? "1 entry still sits" : $"{unreleasedCount} entries still sit")} under '## {unreleased.Heading}' ({path}:{unreleased.Line}): "
              + $"move them under a new heading `{newHeading}` and leave `## [Unreleased]` empty above it (Keep a Changelog)."
            : null;

        var sections = input.Document.SectionsFor(input.Version);
        if (sections.Count == 0)
        {
            var none = input.Document.SectionLevel is null ? " (it has no release headings at all)" : string.Empty;
            return Finding.Fail(
                $"{path} has no section for {shown}{none}.",
                moveHint ?? $"Add a section `{newHeading}` listing this release's changes under ### Added / Changed / Fixed (etc.), newest version first.",
                package,
                unreleased is null ? [new(path)] : [new(path), new(path, unreleased.Line)]);
        }

        if (sections.Count > 1)
        {
            return Finding.Fail(
                $"{path} has {sections.Count} sections for {shown} (lines {string.Join(", ", sections.Select(s => s.Line))}).",
                "Keep one section per version: merge the entries into one and delete the others.",
                package,
                sections.Select(s => new Evidence(path, s.Line)).ToArray());
        }

        var section = sections[0];
        var where = $"{path}:{section.Line}";
        var problems = new List<string>();
        if (section.IsYanked)
        {
            problems.Add("it is marked [YANKED], yet this version is being released");
        }

        if (section.Date is not { } date)
        {
            // An undated heading still is this release's entry: a warning in the message, not a missing entry.
            if (section.DateText is not null)
            {
                problems.Add($"its date '{section.DateText}' is not an ISO date YYYY-MM-DD");
            }
        }
        else if (date > releaseDate)
        {
            problems.Add($"it is dated {Iso(date)}, after {dateName} ({Iso(releaseDate)})");
        }

        var entries = section.Entries + section.Paragraphs;
        if (entries == 0)
        {
            problems.Add("it has no entries");
        }

        if (problems.Count > 0)
        {
            var hint = entries == 0 && moveHint is not null
                ? moveHint
                : $"Write the heading as `{newHeading}` (or with the actual release date, not after {Iso(releaseDate)}) and list the changes under it.";
            return Finding.Fail($"{where}: the section '## {section.Heading}' is not ready: {string.Join("; ", problems)}.", hint, package, new Evidence(path, section.Line));
        }

        var notes = new List<string>();
        if (section.Date is null)
        {
            notes.Add("warning: the heading has no date (Keep a Changelog dates every release YYYY-MM-DD)");
        }

        var written = section.VersionText!.TrimStart('v', 'V');
        if (!string.Equals(written, input.Version.ToNormalizedString(), StringComparison.Ordinal)
            && !string.Equals(written, input.VersionText, StringComparison.Ordinal))
        {
            notes.Add($"the heading writes {section.VersionText}, which NuGet reads as {shown}");
        }

        if (section.Entries == 0)
        {
            notes.Add("written as prose, not as a list of entries");
        }

        var types = section.ChangeTypes.Count > 0 ? $" ({string.Join(", ", section.ChangeTypes)})" : string.Empty;
        var note = notes.Count > 0 ? $" Note: {string.Join("; ", notes)}." : string.Empty;
        return Finding.Pass(
            $"{where}: '## {section.Heading}' has {Count(entries, "entry", "entries")}{types}"
            + (section.Date is { } dated ? $", dated {Iso(dated)}, not after {dateName} ({Iso(releaseDate)})." : ".") + note,
            package,
            new Evidence(path, section.Line));
    }

    private static string Iso(DateOnly date) => date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);

    private static string Count(int n, string one, string many) => n == 1 ? $"1 {one}" : $"{n} {many}";
}
