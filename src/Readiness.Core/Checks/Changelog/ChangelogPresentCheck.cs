using Readiness.Core.Changelogs;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Changelog;

/// <summary>
/// A changelog file exists: <c>CHANGELOG.md</c>, <c>CHANGES.md</c>, <c>HISTORY.md</c> or <c>RELEASE_NOTES.md</c>
/// (names compared case-insensitively) at the root or next to a packable project, or the configured path.
/// </summary>
public sealed class ChangelogPresentCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.ChangelogPresent,
        "A changelog exists",
        Severity.Block,
        Standards.KeepAChangelog,
        "People who depend on the library decide whether and how to upgrade from the changelog; without one they "
        + "must read the commit history.",
        "Add a CHANGELOG.md at the repository root in the Keep a Changelog format (newest version first, an "
        + "Unreleased section on top), or set `changelog:` in .readiness.yml to the file you keep.")
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
            if (target.Path is { } path)
            {
                yield return Finding.Pass(
                    target.Package is null ? $"Changelog found: {path}." : $"Changelog for {target.Package} found: {path}.",
                    target.Package,
                    new Evidence(path));
            }
            else if (target.Configured)
            {
                yield return Finding.Fail(
                    $"No changelog at {target.Searched}: the file does not exist at the inspected commit.",
                    "Create the file, or correct `changelog:` in .readiness.yml (a repository-relative path).",
                    target.Package);
            }
            else
            {
                yield return Finding.Fail(
                    target.Package is null ? $"No changelog: looked for {target.Searched}." : $"No changelog for {target.Package}: looked for {target.Searched}.",
                    Descriptor.Fix,
                    target.Package);
            }
        }
    }
}
