using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// Paths as MSBuild would see them, under a fixed fake root: <c>$(MSBuildProjectDirectory)</c> of <c>src/A/A.csproj</c>
/// is <c>/repo/src/A</c>. Expanded paths map back to repository-relative paths for the file tree.
/// </summary>
internal static class VirtualPaths
{
    public const string Root = "/repo";

    /// <summary>The full path of a repository-relative file or folder (no trailing slash).</summary>
    public static string Full(string repoPath) => repoPath.Length == 0 ? Root : Root + "/" + repoPath;

    /// <summary>A folder with the trailing slash MSBuild puts on <c>MSBuildThisFileDirectory</c>.</summary>
    public static string Folder(string repoFolder) => Full(repoFolder) + "/";

    /// <summary>Resolves an expanded path: under the fake root, relative to <paramref name="baseFolder"/>, or outside.</summary>
    public static PathTarget Resolve(string path, string baseFolder)
    {
        var p = path.Trim().Replace('\\', '/');
        if (p.Length == 0)
        {
            return PathTarget.Empty;
        }

        string combined;
        if (p == Root || p.StartsWith(Root + "/", StringComparison.Ordinal))
        {
            combined = p[Root.Length..].TrimStart('/');
        }
        else if (p.StartsWith('/') || (p.Length >= 2 && p[1] == ':') || p.StartsWith('~'))
        {
            return PathTarget.Outside(p);
        }
        else
        {
            combined = baseFolder.Length == 0 ? p : baseFolder + "/" + p;
        }

        var normal = RepoPath.TryNormalize(combined);
        return normal is null ? PathTarget.Outside(p) : PathTarget.Inside(normal);
    }

    /// <summary>Like <see cref="RepoPath.TryNormalize"/>, but keeps the '..' that climb above the root.</summary>
    public static string NormalizeClimbing(string path)
    {
        var parts = new List<string>();
        foreach (var part in path.Replace('\\', '/').Split('/'))
        {
            if (part.Length == 0 || part == ".")
            {
                continue;
            }

            if (part == ".." && parts.Count > 0 && parts[^1] != "..")
            {
                parts.RemoveAt(parts.Count - 1);
                continue;
            }

            parts.Add(part);
        }

        return string.Join('/', parts);
    }

    public static bool HasWildcard(string path) => path.Contains('*', StringComparison.Ordinal) || path.Contains('?', StringComparison.Ordinal);
}
