using Readiness.Core.Changelogs;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Changelog;

/// <summary>
/// Where the changelog links its versions (link reference definitions such as <c>[1.1.1]: https://...</c>, or
/// headings that are links), the release's section has a link too, and that link mentions the version.
/// </summary>
/// <remarks>
/// A file "uses link references for versions" when some definition is labelled with a version or
/// <c>Unreleased</c>, or some release heading is a link. A file that does neither is skipped: Keep a Changelog
/// shows the links in its example but does not require them.
/// </remarks>
public sealed class ChangelogLinksCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.ChangelogLinks,
        "The changelog links this version",
        Severity.Info,
        Standards.KeepAChangelog,
        "Readers follow a version's link to the exact changes between two tags; a file that links every version "
        + "but this one (or links it to the wrong comparison) sends them elsewhere.",
        "Add a definition such as `[VERSION]: https://git.example/OWNER/REPO/compare/vPREVIOUS...vVERSION` beside the "
        + "others at the bottom of the file, and move `[unreleased]` to compare from the new tag.")
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
            yield return instead ?? Judge(input!);
        }
    }

    private Finding Judge(ChangelogInput input)
    {
        var document = input.Document;
        var path = input.Path;
        var package = input.Target.Package;
        var shown = input.Version.ToNormalizedString();
        var versionLinks = document.VersionLinks.ToArray();
        var linkedHeadings = document.Sections.Where(s => s.HeadingLink is not null).ToArray();
        if (versionLinks.Length == 0 && linkedHeadings.Length == 0)
        {
            return Finding.Skip($"{path} does not link its versions (no `[version]: url` definitions, no linked headings); nothing to check.", package, new Evidence(path));
        }

        var section = document.SectionsFor(input.Version).FirstOrDefault();
        var definition = document.LinkFor(input.Version);
        var (url, line) = section?.HeadingLink is { } headingUrl
            ? (headingUrl, section.HeadingLinkLine ?? section.Line)
            : definition is not null ? (definition.Url, definition.Line) : (null, 0);
        if (url is null && section is null)
        {
            return Finding.Skip($"{path} has no section for {shown} yet (changelog.has-entry reports it), so no link is expected.", package, new Evidence(path));
        }

        if (url is null)
        {
            var example = versionLinks.FirstOrDefault(l => !string.Equals(l.Label, "unreleased", StringComparison.OrdinalIgnoreCase));
            var others = example is null ? "other versions" : $"other versions (e.g. [{example.Label}] at line {example.Line})";
            return Finding.Fail(
                $"{path} links {others} but has no link for {shown}.",
                Descriptor.Fix.Replace("VERSION", shown, StringComparison.Ordinal),
                package,
                new Evidence(path, section!.Line));
        }

        var versionText = input.VersionText.TrimStart('v', 'V');
        if (!url.Contains(versionText, StringComparison.OrdinalIgnoreCase) && !url.Contains(shown, StringComparison.OrdinalIgnoreCase))
        {
            return Finding.Fail(
                $"{path}:{line}: the link for {shown} goes to {url}, which does not mention {shown} (copied from another version?).",
                $"Point the link at this release, e.g. a comparison ending in ...v{shown}.",
                package,
                new Evidence(path, line));
        }

        return Finding.Pass($"{path}:{line}: {shown} links to {url}.", package, new Evidence(path, line));
    }
}
