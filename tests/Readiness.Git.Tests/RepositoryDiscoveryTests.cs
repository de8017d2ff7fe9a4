using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Git.Tests;

/// <summary>The managed repository discovery opens the same repository git finds (<c>git rev-parse --git-dir</c>).</summary>
public sealed class RepositoryDiscoveryTests
{
    [Fact]
    public void FromASubfolder_FindsTheWorkingTree()
    {
        using var repo = SampleLibrary.ReadyRelease();
        var sub = Path.Combine(repo.Path, "src");
        Directory.CreateDirectory(sub);

        var snapshot = new GitSnapshotSource().Open(new SnapshotRequest(sub, "HEAD"));
        using (snapshot)
        {
            Assert.Equal(repo.Head, snapshot.Commit);
        }

        // git(1): discovery walks up from the current folder to the one holding .git.
        Assert.Equal(Path.GetFullPath(repo.Path), Path.GetFullPath(GitCli.Run(sub, ["rev-parse", "--show-toplevel"]).Trim()));
    }

    [Fact]
    public void LinkedWorktreeAndBareRepository_AreFoundLikeGit()
    {
        using var repo = SampleLibrary.ReadyRelease();
        using var folder = new TempDirectory();
        var worktree = folder.Combine("second");
        repo.Git("worktree", "add", "-q", "-b", "side", worktree);
        using var bare = repo.CloneBare();

        foreach (var path in new[] { worktree, bare.Path })
        {
            // git rev-parse succeeds in both (a .git file "gitdir: …", a bare git directory).
            var head = GitCli.Run(path, ["rev-parse", "HEAD"]).Trim();
            var snapshot = new GitSnapshotSource().Open(new SnapshotRequest(path, "HEAD"));
            using (snapshot)
            {
                Assert.Equal(head, snapshot.Commit);
            }
        }
    }

    [Fact]
    public void AnEmptyDotGitFolder_IsNotARepository_LikeGit()
    {
        using var folder = new TempDirectory();
        Directory.CreateDirectory(folder.Combine(".git"));

        // git rev-parse refuses a .git folder without HEAD, objects and refs (is_git_directory).
        Assert.NotEqual(0, GitCli.TryRun(folder.Path, ["-c", "safe.directory=*", "rev-parse", "--git-dir"], new Dictionary<string, string> { ["GIT_CEILING_DIRECTORIES"] = Path.GetDirectoryName(folder.Path)! }).ExitCode);
        var e = Assert.Throws<RepositoryInspectionException>(() => new GitSnapshotSource().Open(new SnapshotRequest(folder.Path, "HEAD")));
        Assert.Contains("not a git repository", e.Message, StringComparison.Ordinal);
    }
}
