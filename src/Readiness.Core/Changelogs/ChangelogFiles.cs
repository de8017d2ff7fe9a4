using Readiness.Core.Checks;
using Readiness.Core.Projects;
using Readiness.Core.Snapshots;
using Readiness.Core.Versioning;

namespace Readiness.Core.Changelogs;

/// <summary>Finds the changelog(s) a release must carry.</summary>
public static class ChangelogFiles
{
    /// <summary>The names libraries give their changelog (common practice, no published source), in order of preference.</summary>
    public static readonly IReadOnlyList<string> BaseNames = ["CHANGELOG", "CHANGES", "HISTORY", "RELEASE_NOTES", "RELEASENOTES", "NEWS"];

    /// <summary>File names taken for a changelog, in order of preference, matched case-insensitively: each base name
    /// with .md, no extension, .txt or .rst (Markdown first).</summary>
    public static readonly IReadOnlyList<string> Names =
        [.. new[] { ".md", string.Empty, ".txt", ".rst" }.SelectMany(e => BaseNames.Select(b => b + e))];

    /// <summary>Folders below the root where a repository-wide changelog is also looked for.</summary>
    public static readonly IReadOnlyList<string> RootFolders = [string.Empty, "docs", "doc"];

    /// <summary>The configuration key (and checklist parameter) naming the changelog's path.</summary>
    public const string ParameterName = "changelog";

    private static string NameList => "CHANGELOG, CHANGES, HISTORY, RELEASE_NOTES or NEWS (.md, .txt, .rst or no extension)";

    private static string? RootChangelog(FolderIndex index) =>
        RootFolders.Select(f => index.FindFirst(f, Names)).FirstOrDefault(p => p is not null);

    /// <summary>The <c>changelog:</c> value saying the release notes live in the forge's releases, not in a file.</summary>
    public const string ForgeReleases = "forge-releases";

    /// <summary>
    /// The skip for a repository whose notes are kept in the forge's releases (<c>changelog: forge-releases</c>):
    /// no file is looked for, and a run that cannot ask the forge says so; else null.
    /// </summary>
    public static Finding? InForgeReleases(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        return string.Equals(context.Parameters.String(ParameterName), ForgeReleases, StringComparison.OrdinalIgnoreCase)
            ? Finding.Skip($"The release notes are kept in the forge's releases ({ParameterName}: {ForgeReleases}); this run reads no forge, so they are not judged here.")
            : null;
    }

    /// <summary>The nearest changelog from <paramref name="projectPath"/>'s folder up to the root.</summary>
    public static string? Nearest(FolderIndex index, string projectPath)
    {
        ArgumentNullException.ThrowIfNull(index);
        return RepoPath.FoldersUpward(projectPath).Select(f => index.FindFirst(f, Names)).FirstOrDefault(p => p is not null);
    }

    /// <summary>
    /// The changelogs to judge. A configured path wins. With per-package tags, the tagged package's nearest
    /// changelog (its folder, then each folder up to the root), or each packable project's when no tag names a
    /// package. Otherwise the root changelog; without one, each packable project's nearest (one per file).
    /// </summary>
    public static IReadOnlyList<ChangelogTarget> Resolve(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var release = context.Release;
        if (context.Parameters.String(ParameterName) is { Length: > 0 } configured)
        {
            var path = RepoPath.TryNormalize(configured) ?? configured;
            return [new(null, context.Snapshot.Files.Exists(path) ? path : null, release.Version, release.VersionSource, $"the configured path {path}", true)];
        }

        var index = new FolderIndex(context.Snapshot.Files);
        var packable = context.Projects.Packable.ToArray();
        var rootSearch = $"{NameList} at the repository root or in docs/";
        if (release.TagPattern.IsPerPackage)
        {
            if (release.Tag is { } tag && release.TagPattern.Match(tag.Name)?.Id is { } id)
            {
                var project = packable.FirstOrDefault(p => string.Equals(p.PackageId, id, StringComparison.OrdinalIgnoreCase));
                return project is null
                    ? [new(id, RootChangelog(index), release.Version, release.VersionSource, rootSearch, false)]
                    : [ForProject(index, project, release.Version, release.VersionSource)];
            }

            if (packable.Length > 0)
            {
                return packable.Select(p =>
                {
                    var declared = DeclaredVersion.Of(p);
                    return release.VersionSource == ReleaseFacts.VersionOptionSource || declared.Value is null
                        ? ForProject(index, p, release.Version, release.VersionSource)
                        : ForProject(index, p, declared.Value, $"{declared.Property} in {declared.Location}");
                }).ToArray();
            }
        }

        var rootFile = RootChangelog(index);
        if (rootFile is not null || packable.Length == 0)
        {
            return [new(null, rootFile, release.Version, release.VersionSource, rootSearch, false)];
        }

        var perProject = packable.Select(p => ForProject(index, p, release.Version, release.VersionSource)).ToArray();
        if (perProject.All(t => t.Path is null))
        {
            return [new(null, null, release.Version, release.VersionSource, $"{rootSearch} and next to each packable project", false)];
        }

        return perProject
            .GroupBy(t => t.Path ?? "\0" + t.Package, StringComparer.Ordinal)
            .Select(g => g.Count() == 1 ? g.First() : g.First() with { Package = null })
            .ToArray();
    }

    private static ChangelogTarget ForProject(FolderIndex index, ProjectInfo project, string? version, string source) =>
        new(project.PackageId, Nearest(index, project.Path), version, source,
            $"{NameList} next to {project.Path} or in a folder above it", false);
}
