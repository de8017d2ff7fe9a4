using Readiness.Core.Projects;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Licensing;

/// <summary>Where a project's <c>Pack="true"</c> items land in the package.</summary>
public static class PackedFiles
{
    /// <summary>
    /// The package paths an item is packed to. <c>PackagePath</c> may hold several paths separated by <c>;</c>; an
    /// empty one, <c>/</c> or <c>\</c> is the package root. A path with the source file's extension names the file
    /// itself; otherwise it is a folder the file goes into (NuGet pack targets' rule, from memory).
    /// </summary>
    public static IReadOnlyList<string> TargetsOf(PackItem item)
    {
        ArgumentNullException.ThrowIfNull(item);
        var source = item.Path ?? item.Include;
        var fileName = RepoPath.FileName(source.Replace('\\', '/'));
        var extension = Path.GetExtension(fileName);
        var targets = new List<string>();
        foreach (var raw in (item.PackagePath ?? string.Empty).Split(';'))
        {
            var packagePath = raw.Trim().Replace('\\', '/').Trim('/');
            if (packagePath.Length == 0)
            {
                targets.Add(fileName);
            }
            else if (!raw.TrimEnd().EndsWith('/') && !raw.TrimEnd().EndsWith('\\') && extension.Length > 0
                && string.Equals(Path.GetExtension(packagePath), extension, StringComparison.OrdinalIgnoreCase))
            {
                targets.Add(packagePath);
            }
            else
            {
                targets.Add(packagePath + "/" + fileName);
            }
        }

        return targets.Distinct(StringComparer.OrdinalIgnoreCase).ToArray();
    }

    /// <summary>The items that put a file at <paramref name="packagePath"/> (compared case-insensitively, '/' or '\').</summary>
    public static IReadOnlyList<PackItem> ItemsPackedAt(ProjectInfo project, string packagePath)
    {
        ArgumentNullException.ThrowIfNull(project);
        ArgumentNullException.ThrowIfNull(packagePath);
        var wanted = packagePath.Replace('\\', '/').Trim('/');
        return project.PackItems.Where(i => i.Path is not null
            && TargetsOf(i).Any(t => string.Equals(t, wanted, StringComparison.OrdinalIgnoreCase))).ToArray();
    }
}
