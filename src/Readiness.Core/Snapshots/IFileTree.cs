namespace Readiness.Core.Snapshots;

/// <summary>
/// The files of a release candidate: a commit's tree read from the object database, or a working tree.
/// Paths are repository-relative with '/' separators. Reads are bounded.
/// </summary>
public interface IFileTree
{
    /// <summary>Every file path (blobs only; no folders, no submodules), sorted ordinally.</summary>
    IReadOnlyList<string> Paths { get; }

    /// <summary>
    /// Entries that are in the tree but not listed in <see cref="Paths"/>: symbolic links (never followed),
    /// submodules, folders nested deeper than <see cref="FileLimits.MaxFolderDepth"/>. Reports name each one.
    /// </summary>
    IReadOnlyList<UnreadEntry> Unread => [];

    bool Exists(string path);

    /// <summary>The file's size in bytes, or null when it does not exist.</summary>
    long? SizeOf(string path);

    /// <summary>
    /// The file's bytes, or null when it does not exist. Throws <see cref="FileTooLargeException"/> when the file
    /// is larger than <paramref name="maxBytes"/>.
    /// </summary>
    byte[]? ReadBytes(string path, long maxBytes = FileLimits.DefaultMaxBytes);
}
