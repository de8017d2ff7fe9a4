namespace Readiness.Core.Snapshots;

/// <summary>The files of a tree grouped by folder, for repeated "which of these names is in this folder" lookups.</summary>
public sealed class FolderIndex
{
    private readonly Dictionary<string, List<string>> byFolder = new(StringComparer.Ordinal);

    public FolderIndex(IFileTree tree)
    {
        ArgumentNullException.ThrowIfNull(tree);
        foreach (var path in tree.Paths)
        {
            var folder = RepoPath.Directory(path);
            if (!byFolder.TryGetValue(folder, out var files))
            {
                byFolder[folder] = files = [];
            }

            files.Add(path);
        }
    }

    /// <summary>Paths directly in <paramref name="folder"/> ("" for the root).</summary>
    public IReadOnlyList<string> FilesIn(string folder) =>
        byFolder.TryGetValue(folder.TrimEnd('/'), out var files) ? files : [];

    /// <summary>
    /// The first of <paramref name="names"/> (in their order) present in <paramref name="folder"/>, file names
    /// compared case-insensitively; null when none is.
    /// </summary>
    public string? FindFirst(string folder, IEnumerable<string> names)
    {
        ArgumentNullException.ThrowIfNull(names);
        var files = FilesIn(folder);
        foreach (var name in names)
        {
            var hit = files.FirstOrDefault(p => string.Equals(RepoPath.FileName(p), name, StringComparison.OrdinalIgnoreCase));
            if (hit is not null)
            {
                return hit;
            }
        }

        return null;
    }
}
