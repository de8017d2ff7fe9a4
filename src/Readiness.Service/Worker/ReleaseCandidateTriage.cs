using Readiness.Core.Configuration;
using Readiness.Core.Projects;
using Readiness.Core.Snapshots;
using Readiness.Core.Versioning;
using Readiness.Service.Mirrors;

namespace Readiness.Service.Worker;

/// <summary>
/// Decides, from what a pull request changes, whether it is a release candidate when neither its base branch nor a
/// label said so: the base branch matches the repository's own <c>release-branches</c>, or the pull request edits
/// the changelog, or it changes a packable project's declared version.
/// </summary>
public sealed class ReleaseCandidateTriage(IProjectModelReader projects)
{
    private static readonly string[] ProjectFileEndings = [".csproj", ".fsproj", ".vbproj", ".props", ".targets"];

    /// <summary>Why the pull request is a release candidate, or null when it is not.</summary>
    public string? Reason(string baseBranch, RepositoryConfig baseConfig, PullRequestChanges changes, Func<IFileTree> mergeBaseFiles, Func<IFileTree> headFiles)
    {
        ArgumentNullException.ThrowIfNull(baseConfig);
        ArgumentNullException.ThrowIfNull(changes);
        ArgumentNullException.ThrowIfNull(mergeBaseFiles);
        ArgumentNullException.ThrowIfNull(headFiles);
        var repositoryBranches = baseConfig.GetList("release-branches");
        if (repositoryBranches.FirstOrDefault(p => !string.IsNullOrWhiteSpace(p) && NameGlob.Matches(p.Trim(), baseBranch)) is { } pattern)
        {
            return $"the base branch {baseBranch} matches release-branches '{pattern}' in {RepositoryConfig.FileName}";
        }

        var changelog = baseConfig.Get("changelog") ?? "CHANGELOG.md";
        var changedLog = changes.Paths.FirstOrDefault(p =>
            string.Equals(p, changelog, StringComparison.OrdinalIgnoreCase)
            || string.Equals(Path.GetFileName(p), "CHANGELOG.md", StringComparison.OrdinalIgnoreCase));
        if (changedLog is not null)
        {
            return $"it changes the changelog ({changedLog})";
        }

        if (!changes.Paths.Any(p => ProjectFileEndings.Any(e => p.EndsWith(e, StringComparison.OrdinalIgnoreCase))
            || string.Equals(Path.GetFileName(p), "version.json", StringComparison.OrdinalIgnoreCase)))
        {
            return null;
        }

        var before = DeclaredVersions(mergeBaseFiles());
        var after = DeclaredVersions(headFiles());
        foreach (var (id, version) in after)
        {
            if (before.TryGetValue(id, out var old) && !string.Equals(old, version, StringComparison.Ordinal))
            {
                return $"it changes the declared version of {id} from {old ?? "(none)"} to {version ?? "(none)"}";
            }
        }

        return null;
    }

    private Dictionary<string, string?> DeclaredVersions(IFileTree files)
    {
        var result = new Dictionary<string, string?>(StringComparer.OrdinalIgnoreCase);
        foreach (var project in projects.Read(files).Packable)
        {
            result.TryAdd(project.PackageId, DeclaredVersion.Of(project).Value);
        }

        return result;
    }
}
