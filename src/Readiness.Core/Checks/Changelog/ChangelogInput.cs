using NuGet.Versioning;

using Readiness.Core.Changelogs;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Checks.Changelog;

/// <summary>A changelog read and parsed for one target, with the version its section must carry.</summary>
internal sealed record ChangelogInput(ChangelogTarget Target, string Path, string VersionText, NuGetVersion Version, ChangelogDocument Document)
{
    /// <summary>The parsed input, or the skip/error finding that says why there is nothing to judge.</summary>
    public static (ChangelogInput? Input, Finding? Instead) Open(CheckContext context, ChangelogTarget target)
    {
        if (target.Version is not { Length: > 0 } versionText)
        {
            return (null, Finding.Skip(
                $"No version to look for in the changelog: the version comes from {target.VersionSource}. Tag the release, pass --version, or declare a version.",
                target.Package));
        }

        if (target.Path is not { } path)
        {
            return (null, Finding.Skip($"No changelog found ({target.Searched}); changelog.present reports it.", target.Package));
        }

        if (!NuGetVersion.TryParse(versionText.TrimStart('v', 'V'), out var version))
        {
            return (null, Finding.Skip($"'{versionText}' (from {target.VersionSource}) is not a version; version.well-formed reports it.", target.Package));
        }

        string? text;
        try
        {
            text = context.Snapshot.Files.ReadText(path);
        }
        catch (FileTooLargeException e)
        {
            return (null, Finding.Error(e.Message, target.Package, new Evidence(path)));
        }

        if (text is null)
        {
            return (null, Finding.Skip($"{path} could not be read at the inspected commit.", target.Package, new Evidence(path)));
        }

        if (!path.EndsWith(".md", StringComparison.OrdinalIgnoreCase) && !path.EndsWith(".markdown", StringComparison.OrdinalIgnoreCase))
        {
            text = ChangelogParser.PlainTextAsMarkdown(text);
        }

        if (!ChangelogParser.TryParse(text, out var document, out var error))
        {
            return (null, Finding.Error($"{path}: {error}", target.Package, new Evidence(path)));
        }

        return (new ChangelogInput(target, path, versionText, version, document!), null);
    }
}
