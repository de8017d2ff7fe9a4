using System.Text.RegularExpressions;

using Readiness.Core.Snapshots;

namespace Readiness.Core.Licensing;

/// <summary>Finds license files in a tree.</summary>
/// <remarks>
/// Names, compared case-insensitively: <c>LICENSE</c>, <c>LICENSE.md</c>, <c>LICENSE.txt</c>, <c>COPYING</c>
/// (checks.md); the British spelling <c>LICENCE</c>, the same names with <c>.md</c>/<c>.txt</c>/<c>.markdown</c>,
/// per-license files of dual-licensed projects such as <c>LICENSE-MIT</c> and <c>LICENSE-APACHE</c> (common
/// practice, no published source), <c>COPYING.LESSER</c> (the GNU project's instructions for LGPL, from memory)
/// and <c>UNLICENSE</c> (unlicense.org, from memory). At the root, the files of a <c>LICENSES/</c> folder too
/// (REUSE 3.2, https://reuse.software/spec-3.2/).
/// </remarks>
public static partial class LicenseFiles
{
    [GeneratedRegex(@"^(?:licen[cs]e|copying|unlicense)(?:[-_][a-z0-9.\-]+?)?(?:\.(?:md|txt|markdown|rst|lesser))?$", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex LicenseName();

    /// <summary>True for a file name taken as a license file.</summary>
    public static bool IsLicenseFileName(string fileName)
    {
        ArgumentNullException.ThrowIfNull(fileName);
        return LicenseName().IsMatch(fileName);
    }

    /// <summary>License files directly in <paramref name="folder"/> (plus <c>LICENSES/*</c> at the root), primary names first.</summary>
    public static IReadOnlyList<string> In(FolderIndex index, string folder)
    {
        ArgumentNullException.ThrowIfNull(index);
        var files = index.FilesIn(folder).Where(p => IsLicenseFileName(RepoPath.FileName(p)))
            .OrderBy(p => Rank(RepoPath.FileName(p)))
            .ThenBy(p => p, StringComparer.Ordinal)
            .ToList();
        if (folder.Length == 0)
        {
            files.AddRange(index.FilesIn("LICENSES"));
        }

        return files;
    }

    /// <summary>The license files of the nearest folder that has any, from the project's folder up to the root.</summary>
    public static IReadOnlyList<string> Nearest(FolderIndex index, string projectPath)
    {
        ArgumentNullException.ThrowIfNull(index);
        ArgumentNullException.ThrowIfNull(projectPath);
        return RepoPath.FoldersUpward(projectPath).Select(f => In(index, f)).FirstOrDefault(files => files.Count > 0) ?? [];
    }

    private static int Rank(string name)
    {
        var stem = name.Split('.')[0].ToUpperInvariant();
        return stem is "LICENSE" or "LICENCE" or "COPYING" or "UNLICENSE" ? 0 : 1;
    }
}
