using System.Text;

using LibGit2Sharp;

using Readiness.Core.Snapshots;

namespace Readiness.Git;

/// <summary>
/// The files of the working tree as git sees them: tracked files still present plus untracked files that are not
/// ignored. A symbolic link reads as its target text (as git would commit it) and is never followed, nor is any
/// file reached through a linked folder.
/// </summary>
public sealed class WorkingTreeFileTree : IFileTree
{
    private readonly string root;
    private readonly HashSet<string> files;

    private WorkingTreeFileTree(string root, string[] paths)
    {
        this.root = root;
        Paths = paths;
        files = new HashSet<string>(paths, StringComparer.Ordinal);
    }

    public IReadOnlyList<string> Paths { get; }

    /// <summary>Lists the working tree of <paramref name="repository"/> (which must not be bare).</summary>
    public static WorkingTreeFileTree Create(Repository repository)
    {
        ArgumentNullException.ThrowIfNull(repository);
        var root = repository.Info.WorkingDirectory
            ?? throw new RepositoryInspectionException($"{repository.Info.Path} is a bare repository: it has no working tree.");
        var options = new StatusOptions
        {
            Show = StatusShowOption.IndexAndWorkDir,
            IncludeUnaltered = true,
            IncludeUntracked = true,
            RecurseUntrackedDirs = true,
            IncludeIgnored = false,
            ExcludeSubmodules = true,
            DetectRenamesInIndex = false,
            DetectRenamesInWorkDir = false,
        };

        var paths = new List<string>();
        try
        {
            foreach (var entry in repository.RetrieveStatus(options))
            {
                if (IsPresent(entry.State))
                {
                    if (paths.Count >= FileLimits.MaxPaths)
                    {
                        throw new RepositoryInspectionException(
                            $"The working tree holds more than {FileLimits.MaxPaths:N0} files; it is refused as too large to inspect.");
                    }

                    paths.Add(entry.FilePath.Replace('\\', '/'));
                }
            }
        }
        catch (LibGit2SharpException e)
        {
            throw new RepositoryInspectionException(
                $"The working tree of {GitSnapshotSource.Location(repository)} could not be read: {GitSnapshotSource.OneLine(e.Message)}", e);
        }

        var sorted = paths.Distinct(StringComparer.Ordinal).ToArray();
        Array.Sort(sorted, StringComparer.Ordinal);
        return new WorkingTreeFileTree(Path.TrimEndingDirectorySeparator(root), sorted);
    }

    public bool Exists(string path) => path is not null && files.Contains(path);

    public long? SizeOf(string path)
    {
        var info = Locate(path);
        return info switch
        {
            null => null,
            { LinkTarget: { } target } => Encoding.UTF8.GetByteCount(target),
            FileInfo file => file.Length,
            _ => null,
        };
    }

    public byte[]? ReadBytes(string path, long maxBytes = FileLimits.DefaultMaxBytes)
    {
        var info = Locate(path);
        if (info is null)
        {
            return null;
        }

        if (info.LinkTarget is { } target)
        {
            var link = Encoding.UTF8.GetBytes(target);
            return link.LongLength > maxBytes ? throw new FileTooLargeException(path, link.LongLength, maxBytes) : link;
        }

        if (info is not FileInfo file)
        {
            return null;
        }

        if (file.Length > maxBytes)
        {
            throw new FileTooLargeException(path, file.Length, maxBytes);
        }

        try
        {
            using var stream = new FileStream(file.FullName, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete, 1, FileOptions.SequentialScan);
            var length = stream.Length;
            if (length > maxBytes)
            {
                throw new FileTooLargeException(path, length, maxBytes);
            }

            // Read at most one byte past the limit: a file that grows while it is read is still bounded.
            var buffer = new byte[length];
            var read = stream.ReadAtLeast(buffer, buffer.Length, throwOnEndOfStream: false);
            if (read == buffer.Length && stream.ReadByte() >= 0)
            {
                throw new FileTooLargeException(path, length + 1, maxBytes);
            }

            return read == buffer.Length ? buffer : buffer[..read];
        }
        catch (FileNotFoundException)
        {
            return null;
        }
        catch (DirectoryNotFoundException)
        {
            return null;
        }
        catch (IOException e)
        {
            throw new RepositoryInspectionException($"{path} could not be read from the working tree: {e.Message}", e);
        }
        catch (UnauthorizedAccessException e)
        {
            throw new RepositoryInspectionException($"{path} could not be read from the working tree: {e.Message}", e);
        }
    }

    private static bool IsPresent(FileStatus state) =>
        (state & (FileStatus.DeletedFromWorkdir | FileStatus.Ignored | FileStatus.Nonexistent | FileStatus.Unreadable)) == 0
        && state != FileStatus.DeletedFromIndex;

    /// <summary>
    /// The file system entry for a listed path, or null when it is not listed, is gone, or lies behind a linked
    /// folder (which could lead out of the repository).
    /// </summary>
    private FileSystemInfo? Locate(string path)
    {
        if (path is null || !files.Contains(path))
        {
            return null;
        }

        var current = root;
        var parts = path.Split('/');
        for (var i = 0; i < parts.Length - 1; i++)
        {
            current = Path.Combine(current, parts[i]);
            var folder = new DirectoryInfo(current);
            if (!folder.Exists || folder.LinkTarget is not null)
            {
                return null;
            }
        }

        var file = new FileInfo(Path.Combine(current, parts[^1]));
        if (file.LinkTarget is not null)
        {
            return file;
        }

        return file.Exists ? file : null;
    }
}
