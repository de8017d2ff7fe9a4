namespace Readiness.Git;

/// <summary>
/// Finds the repository that holds a folder the way git does (git(1) "GIT_DIR" discovery, gitrepository-layout(5)):
/// from the folder up to the root, the first folder with a <c>.git</c> folder or <c>.git</c> file (a linked worktree or
/// submodule: <c>gitdir: PATH</c>), or that is itself a git directory (a bare repository). Done in managed code because
/// libgit2's own discovery returns its answer in a native buffer that the ahead-of-time compiled program never sees.
/// </summary>
internal static class RepositoryDiscovery
{
    /// <summary>The folder to open (a working tree or a bare repository), or null when none holds <paramref name="start"/>.</summary>
    public static string? Find(string start)
    {
        for (var folder = new DirectoryInfo(start); folder is not null; folder = folder.Parent)
        {
            var dotGit = Path.Combine(folder.FullName, ".git");
            if ((Directory.Exists(dotGit) && IsGitDirectory(dotGit)) || IsGitLink(dotGit) || IsGitDirectory(folder.FullName))
            {
                return folder.FullName;
            }
        }

        return null;
    }

    /// <summary>git's is_git_directory: a <c>HEAD</c> file, and objects (or a <c>commondir</c> file for a linked worktree).</summary>
    private static bool IsGitDirectory(string path) =>
        File.Exists(Path.Combine(path, "HEAD"))
        && (Directory.Exists(Path.Combine(path, "objects")) || File.Exists(Path.Combine(path, "commondir")))
        && (Directory.Exists(Path.Combine(path, "refs")) || File.Exists(Path.Combine(path, "commondir")));

    /// <summary>A <c>.git</c> file whose first line is <c>gitdir: PATH</c> (gitrepository-layout(5)).</summary>
    private static bool IsGitLink(string path)
    {
        if (!File.Exists(path))
        {
            return false;
        }

        try
        {
            using var reader = new StreamReader(path);
            var buffer = new char[8];
            var read = reader.ReadBlock(buffer, 0, buffer.Length);
            return new string(buffer, 0, read) == "gitdir: ";
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return false;
        }
    }
}
