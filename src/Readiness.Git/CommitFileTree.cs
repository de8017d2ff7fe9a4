using LibGit2Sharp;

using Readiness.Core.Snapshots;

namespace Readiness.Git;

/// <summary>
/// The files of one commit, read from the object database without a checkout: what was committed, byte for byte,
/// whatever the working tree holds. Holds the repository open until disposed.
/// </summary>
public sealed class CommitFileTree : IFileTree, IDisposable
{
    private readonly Repository repository;
    private readonly bool ownsRepository;
    private readonly Dictionary<string, ObjectId> blobs;
    private readonly Lock gate = new();
    private bool disposed;

    private CommitFileTree(Repository repository, bool ownsRepository, Dictionary<string, ObjectId> blobs, string[] paths, IReadOnlyList<UnreadEntry> unread)
    {
        this.repository = repository;
        this.ownsRepository = ownsRepository;
        this.blobs = blobs;
        Paths = paths;
        Unread = unread;
    }

    public IReadOnlyList<string> Paths { get; }

    public IReadOnlyList<UnreadEntry> Unread { get; }

    /// <summary>Lists every blob of <paramref name="commit"/>'s tree (submodule entries skipped).</summary>
    public static CommitFileTree Create(Repository repository, Commit commit, bool ownsRepository)
    {
        ArgumentNullException.ThrowIfNull(repository);
        ArgumentNullException.ThrowIfNull(commit);
        var blobs = new Dictionary<string, ObjectId>(StringComparer.Ordinal);
        var unread = new List<UnreadEntry>();
        try
        {
            Collect(commit.Tree, blobs, unread);
        }
        catch (LibGit2SharpException e)
        {
            throw MissingObject(repository, $"the tree of commit {commit.Sha}", e);
        }

        var paths = blobs.Keys.ToArray();
        Array.Sort(paths, StringComparer.Ordinal);
        return new CommitFileTree(repository, ownsRepository, blobs, paths, unread);
    }

    public bool Exists(string path) => path is not null && blobs.ContainsKey(path);

    public long? SizeOf(string path)
    {
        if (path is null || !blobs.TryGetValue(path, out var id))
        {
            return null;
        }

        lock (gate)
        {
            ObjectDisposedException.ThrowIf(disposed, this);
            return Size(path, id);
        }
    }

    public byte[]? ReadBytes(string path, long maxBytes = FileLimits.DefaultMaxBytes)
    {
        if (path is null || !blobs.TryGetValue(path, out var id))
        {
            return null;
        }

        lock (gate)
        {
            ObjectDisposedException.ThrowIf(disposed, this);

            // The header gives the size without inflating the content, so an oversized blob is never read.
            var size = Size(path, id);
            if (size > maxBytes)
            {
                throw new FileTooLargeException(path, size, maxBytes);
            }

            try
            {
                var blob = repository.Lookup<Blob>(id) ?? throw new NotFoundException($"object {id.Sha} not found");
                using var stream = blob.GetContentStream();
                var bytes = new byte[size];
                stream.ReadExactly(bytes);
                return bytes;
            }
            catch (LibGit2SharpException e)
            {
                throw MissingObject(repository, path, e);
            }
        }
    }

    public void Dispose()
    {
        lock (gate)
        {
            if (disposed)
            {
                return;
            }

            disposed = true;
            if (ownsRepository)
            {
                repository.Dispose();
            }
        }
    }

    internal static RepositoryInspectionException MissingObject(Repository repository, string what, Exception inner)
    {
        var location = GitSnapshotSource.Location(repository);
        var partial = IsPartialClone(repository)
            ? " This is a partial clone (objects filtered out at clone time, e.g. --filter=blob:none); fetch the missing objects or clone without --filter, and run again."
            : " The repository is incomplete or damaged (git fsck names what is missing).";
        return new RepositoryInspectionException(
            $"{what} could not be read from {location}: {GitSnapshotSource.OneLine(inner.Message)}.{partial}", inner);
    }

    private static bool IsPartialClone(Repository repository)
    {
        try
        {
            // git records a partial clone's promisor remote in extensions.partialClone and remote.<name>.promisor.
            return repository.Config.Get<string>("extensions.partialclone") is not null
                || repository.Config.Any(e => e.Key.StartsWith("remote.", StringComparison.Ordinal)
                    && e.Key.EndsWith(".promisor", StringComparison.Ordinal)
                    && string.Equals(e.Value, "true", StringComparison.OrdinalIgnoreCase));
        }
        catch (LibGit2SharpException)
        {
            return false;
        }
    }

    private long Size(string path, ObjectId id)
    {
        try
        {
            return repository.ObjectDatabase.RetrieveObjectMetadata(id).Size;
        }
        catch (LibGit2SharpException e)
        {
            throw MissingObject(repository, path, e);
        }
    }

    /// <summary>
    /// Lists the tree without recursion: a stack of (tree, folder path, depth). Each folder's path is built once from
    /// its parent's, and nothing below <see cref="FileLimits.MaxFolderDepth"/> is entered.
    /// </summary>
    private static void Collect(Tree root, Dictionary<string, ObjectId> blobs, List<UnreadEntry> unread)
    {
        var pending = new Stack<(Tree Tree, string Prefix, int Depth)>();
        pending.Push((root, string.Empty, 0));
        while (pending.TryPop(out var current))
        {
            foreach (var entry in current.Tree)
            {
                var path = current.Prefix + entry.Name;
                switch (entry.TargetType)
                {
                    case TreeEntryTargetType.Blob when entry.Mode == Mode.SymbolicLink:
                        // The blob holds the link's target text; git checks it out as a link, never as this content.
                        unread.Add(new UnreadEntry(path, $"is a symbolic link (to {LinkTarget(entry)}); links are not followed"));
                        break;
                    case TreeEntryTargetType.Blob:
                        if (blobs.Count >= FileLimits.MaxPaths)
                        {
                            throw new RepositoryInspectionException(
                                $"The commit holds more than {FileLimits.MaxPaths:N0} files; the repository is refused as too large to inspect.");
                        }

                        blobs[path] = entry.Target.Id;
                        break;
                    case TreeEntryTargetType.Tree when current.Depth + 1 >= FileLimits.MaxFolderDepth:
                        unread.Add(new UnreadEntry(path, $"is nested {current.Depth + 1} folders deep; nothing below {FileLimits.MaxFolderDepth} levels is read"));
                        break;
                    case TreeEntryTargetType.Tree:
                        pending.Push(((Tree)entry.Target, path + "/", current.Depth + 1));
                        break;
                    default:
                        // Submodule entries (gitlinks) name a commit of another repository: not a file of this one.
                        unread.Add(new UnreadEntry(path, $"is a submodule (commit {entry.Target.Sha}); its files are not part of this repository's inspection"));
                        break;
                }
            }
        }
    }

    private static string LinkTarget(TreeEntry entry)
    {
        try
        {
            var blob = (Blob)entry.Target;
            if (blob.Size > 1024)
            {
                return "a target longer than 1 KiB";
            }

            using var reader = new StreamReader(blob.GetContentStream(), System.Text.Encoding.UTF8);
            return reader.ReadToEnd();
        }
        catch (LibGit2SharpException)
        {
            return "an unreadable target";
        }
    }
}
