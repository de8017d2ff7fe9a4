using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects;

/// <summary>
/// What a repository holds in the way of builds when no SDK-style project could be read: the words of the
/// "could not inspect" answer, so that the maintainer sees what the tool found and why it gave no verdict.
/// </summary>
public static class BuildInventory
{
    /// <summary>The repository configuration key that lets a release have no .NET project (default true).</summary>
    public const string ProjectsRequiredKey = "projects-required";

    private static readonly (string Suffix, string What)[] Kinds =
    [
        (".sln", "solution"),
        (".slnx", "solution"),
        (".csproj", "project"),
        (".fsproj", "project"),
        (".vbproj", "project"),
        (".nuspec", "nuspec"),
        ("build.cake", "build script"),
        ("build.ps1", "build script"),
        ("build.sh", "build script"),
        ("makefile", "build script"),
        ("package.json", "other ecosystem"),
        ("pom.xml", "other ecosystem"),
        ("cargo.toml", "other ecosystem"),
        ("pyproject.toml", "other ecosystem"),
        ("go.mod", "other ecosystem"),
    ];

    /// <summary>
    /// The sentence that explains why there is nothing to judge: the build files found (at most a few named), and
    /// the projects that could not be read with their reason.
    /// </summary>
    public static string Describe(IFileTree files, ProjectModel model)
    {
        ArgumentNullException.ThrowIfNull(files);
        ArgumentNullException.ThrowIfNull(model);
        var found = files.Paths
            .Select(p => (Path: p, Kind: Kinds.FirstOrDefault(k => p.EndsWith(k.Suffix, StringComparison.OrdinalIgnoreCase)
                && (k.Suffix[0] == '.' || string.Equals(RepoPath.FileName(p), k.Suffix, StringComparison.OrdinalIgnoreCase))).What))
            .Where(x => x.Kind is not null)
            .ToList();
        var parts = new List<string>();
        foreach (var group in found.GroupBy(x => x.Kind))
        {
            var names = group.Select(x => x.Path).Take(3).ToList();
            var more = group.Count() > names.Count ? $" and {group.Count() - names.Count} more" : string.Empty;
            parts.Add($"{group.Count()} {group.Key} file(s): {string.Join(", ", names)}{more}");
        }

        var problems = model.Problems.Take(3)
            .Select(p => p.Line is { } line ? $"{p.Path}:{line}: {p.Message}" : $"{p.Path}: {p.Message}")
            .ToList();
        var what = parts.Count == 0 ? "no solution, project or build script at all" : string.Join("; ", parts);
        var unread = problems.Count == 0 ? string.Empty : $" Not read: {string.Join(" ", problems)}";
        return "No SDK-style .NET project that the tool can read was found, so there is nothing to judge and no verdict "
            + $"is given. Found: {what}.{unread} If this release has no .NET project, set '{ProjectsRequiredKey}: false' "
            + $"in {Configuration.RepositoryConfig.FileName}.";
    }
}
