using Readiness.Core.Projects;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Checks.Metadata;

/// <summary>Where packed files land inside the package (NuGet pack: PackagePath as a folder or a file name).</summary>
public static class PackagePaths
{
    /// <summary>
    /// The path inside the package of a packed file: a PackagePath ending in a separator (or empty) is a folder
    /// the file goes into; one whose last part has an extension names the file; no PackagePath at all puts the file
    /// under <c>content/</c> (https://learn.microsoft.com/nuget/reference/msbuild-targets#including-content-in-a-package).
    /// </summary>
    public static string? InPackage(PackItem item)
    {
        ArgumentNullException.ThrowIfNull(item);
        var fileName = RepoPath.FileName((item.Path ?? item.Include).Replace('\\', '/'));
        if (item.PackagePath is null)
        {
            return "content/" + fileName;
        }

        var packagePath = item.PackagePath.Replace('\\', '/').TrimStart('/');
        if (packagePath.Length == 0 || packagePath.EndsWith('/'))
        {
            return packagePath + fileName;
        }

        return Path.HasExtension(RepoPath.FileName(packagePath)) ? packagePath : packagePath + "/" + fileName;
    }

    /// <summary>The packed item that lands at <paramref name="packagePath"/> in the package, if any.</summary>
    public static PackItem? Find(ProjectInfo project, string packagePath)
    {
        ArgumentNullException.ThrowIfNull(project);
        ArgumentNullException.ThrowIfNull(packagePath);
        var wanted = packagePath.Replace('\\', '/').TrimStart('/');
        return project.PackItems.LastOrDefault(i => string.Equals(InPackage(i), wanted, StringComparison.OrdinalIgnoreCase));
    }
}
