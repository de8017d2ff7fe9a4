using Readiness.Core.Snapshots;

namespace Readiness.Testing;

/// <summary>
/// A file tree over a folder on disk (the folder's files, '.git' excluded), so the same files can be given to
/// a reference tool and to the code under test.
/// </summary>
public sealed class FolderFileTree : IFileTree
{
    private readonly string root;
    private readonly HashSet<string> set;

    public FolderFileTree(string root)
    {
        ArgumentNullException.ThrowIfNull(root);
        this.root = Path.GetFullPath(root);
        var options = new EnumerationOptions { RecurseSubdirectories = true, AttributesToSkip = FileAttributes.ReparsePoint };
        Paths = Directory.EnumerateFiles(this.root, "*", options)
            .Select(f => Path.GetRelativePath(this.root, f).Replace('\\', '/'))
            .Where(p => p != ".git" && !p.StartsWith(".git/", StringComparison.Ordinal))
            .Order(StringComparer.Ordinal)
            .ToArray();
        set = new HashSet<string>(Paths, StringComparer.Ordinal);
    }

    public IReadOnlyList<string> Paths { get; }

    public bool Exists(string path) => set.Contains(path);

    public long? SizeOf(string path) => set.Contains(path) ? new FileInfo(Full(path)).Length : null;

    public byte[]? ReadBytes(string path, long maxBytes = FileLimits.DefaultMaxBytes)
    {
        if (!set.Contains(path))
        {
            return null;
        }

        var size = new FileInfo(Full(path)).Length;
        return size > maxBytes ? throw new FileTooLargeException(path, size, maxBytes) : File.ReadAllBytes(Full(path));
    }

    /// <summary>Writes the given files (repository-relative path → text) under <paramref name="root"/> and reads the tree.</summary>
    public static FolderFileTree Write(string root, IEnumerable<KeyValuePair<string, string>> files)
    {
        ArgumentNullException.ThrowIfNull(files);
        foreach (var (path, text) in files)
        {
            var full = Path.Combine(root, path.Replace('/', Path.DirectorySeparatorChar));
            Directory.CreateDirectory(Path.GetDirectoryName(full)!);
            File.WriteAllText(full, text);
        }

        return new FolderFileTree(root);
    }

    private string Full(string path) => Path.Combine(root, path.Replace('/', Path.DirectorySeparatorChar));
}
