using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Git.Tests;

public sealed class GitSnapshotSourceErrorTests
{
    private readonly GitSnapshotSource source = new();

    [Fact]
    public void NotARepository_ThrowsWithClearMessage()
    {
        using var folder = new TempDirectory();

        // git rev-parse --git-dir is the reference: it fails outside a repository too.
        Assert.False(GitCli.TryRun(folder.Path, ["-c", $"safe.directory=*", "rev-parse", "--git-dir"], new Dictionary<string, string> { ["GIT_CEILING_DIRECTORIES"] = Path.GetTempPath() }).Succeeded);
        var error = Assert.Throws<RepositoryInspectionException>(() => source.Open(new SnapshotRequest(folder.Path)));
        Assert.Contains("is not a git repository", error.Message, StringComparison.Ordinal);
        Assert.DoesNotContain('\n', error.Message);
    }

    [Fact]
    public void MissingFolder_ThrowsWithClearMessage()
    {
        using var folder = new TempDirectory();

        var error = Assert.Throws<RepositoryInspectionException>(() => source.Open(new SnapshotRequest(folder.Combine("nowhere"))));

        Assert.Contains("does not exist", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("v9.9.9")]
    [InlineData("no-such-branch")]
    [InlineData("HEAD~5")]
    [InlineData("0123456789abcdef0123456789abcdef01234567")]
    public void UnknownRevision_ThrowsWithClearMessage(string revision)
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "1").Commit("one");

        // git rev-parse --verify fails for the same revisions.
        Assert.False(repo.TryGit("rev-parse", "--verify", "-q", revision + "^{commit}").Succeeded);
        var error = Assert.Throws<RepositoryInspectionException>(() => source.Open(new SnapshotRequest(repo.Path, revision)));
        Assert.Contains($"Revision '{revision}'", error.Message, StringComparison.Ordinal);
        Assert.DoesNotContain('\n', error.Message);
    }

    [Fact]
    public void RevisionNamingATree_ThrowsNotACommit()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "1").Commit("one");

        var error = Assert.Throws<RepositoryInspectionException>(() => source.Open(new SnapshotRequest(repo.Path, "HEAD^{tree}")));

        Assert.Contains("not a commit", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void EmptyRepository_ThrowsNoCommits()
    {
        using var repo = TestRepository.Create();

        // git rev-parse HEAD fails in a repository without commits.
        Assert.False(repo.TryGit("rev-parse", "--verify", "-q", "HEAD").Succeeded);
        var commit = Assert.Throws<RepositoryInspectionException>(() => source.Open(new SnapshotRequest(repo.Path)));
        var worktree = Assert.Throws<RepositoryInspectionException>(() => source.Open(new SnapshotRequest(repo.Path, Worktree: true)));
        Assert.Contains("empty repository", commit.Message, StringComparison.Ordinal);
        Assert.Contains("empty repository", worktree.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ShallowClone_ThrowsHistoryMissing()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "1").Commit("one");
        repo.AnnotatedTag("v1.0.0", "Release 1.0.0");
        repo.Write("a.txt", "2").Commit("two");
        using var shallow = repo.Clone("--depth", "1");

        // git itself confirms the clone is shallow, lacks the parent and the older release tag.
        Assert.Equal("true", shallow.Git("rev-parse", "--is-shallow-repository").Trim());
        Assert.False(shallow.TryGit("rev-parse", "--verify", "-q", "HEAD~1").Succeeded);
        Assert.Equal(string.Empty, shallow.Git("tag", "--list").Trim());
        foreach (var request in (SnapshotRequest[])[new(shallow.Path), new(shallow.Path, "HEAD~1"), new(shallow.Path, Tag: "v1.0.0")])
        {
            var error = Assert.Throws<RepositoryInspectionException>(() => source.Open(request));
            Assert.Contains("shallow clone", error.Message, StringComparison.Ordinal);
            Assert.Contains("git fetch --unshallow", error.Message, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void PartialClone_ReadingAMissingBlob_ThrowsInspectionError()
    {
        using var repo = TestRepository.Create();
        repo.Write("CHANGELOG.md", "old entry\n").Commit("one");
        repo.Write("CHANGELOG.md", "new entry\n").Commit("two");
        using var partial = repo.Clone("--filter=blob:none");

        // git confirms the old blob is absent: rev-list --missing=print marks missing objects with '?'.
        var oldBlob = repo.Sha("HEAD~1:CHANGELOG.md");
        Assert.Contains("?" + oldBlob, partial.Git("rev-list", "--objects", "--missing=print", "HEAD~1"), StringComparison.Ordinal);

        using var head = source.Open(new SnapshotRequest(partial.Path));
        using var older = source.Open(new SnapshotRequest(partial.Path, "HEAD~1"));

        Assert.Equal("new entry\n", head.Files.ReadText("CHANGELOG.md"));
        Assert.True(older.Files.Exists("CHANGELOG.md"));
        var read = Assert.Throws<RepositoryInspectionException>(() => older.Files.ReadBytes("CHANGELOG.md"));
        var size = Assert.Throws<RepositoryInspectionException>(() => older.Files.SizeOf("CHANGELOG.md"));
        Assert.Contains("partial clone", read.Message, StringComparison.Ordinal);
        Assert.Contains("CHANGELOG.md", read.Message, StringComparison.Ordinal);
        Assert.Contains("partial clone", size.Message, StringComparison.Ordinal);
        Assert.DoesNotContain('\n', read.Message);
    }

    [Fact]
    public void RepositoryOwnedByAnotherUser_IsReadAndVerified()
    {
        using var keys = new SshKeys();
        var key = keys.Create();
        using var repo = TestRepository.Create();
        var sha = repo.Write("a.txt", "1").Commit("one");
        repo.SignedTag("v2.4.0", "Release 2.4.0", key.PrivateKeyPath);

        if (Environment.UserName == "root" && ChownToNobody(repo.Path))
        {
            // git itself refuses the repository now (git-config safe.directory: "dubious ownership").
            var refused = repo.TryGit("log", "-1");
            Assert.False(refused.Succeeded);
            Assert.Contains("dubious ownership", refused.StdErr, StringComparison.Ordinal);
        }

        using var snapshot = source.Open(new SnapshotRequest(repo.Path, "v2.4.0"));

        Assert.Equal(sha, snapshot.Commit);
        Assert.Equal("1", snapshot.Files.ReadText("a.txt"));
        Assert.True(snapshot.Signatures!.VerifyTag("v2.4.0", SshKeys.AllowedSigners(key)).Valid);

        // Opening any repository runs the static constructor that turns libgit2's owner check off.
        Assert.False(LibGit2Sharp.GlobalSettings.GetOwnerValidation());
    }

    /// <summary>Hands the folder to the unprivileged user "nobody" (possible only as root); false when that fails.</summary>
    private static bool ChownToNobody(string path)
    {
        var start = new System.Diagnostics.ProcessStartInfo("chown") { UseShellExecute = false, RedirectStandardError = true };
        foreach (var arg in (string[])["-R", "nobody", path])
        {
            start.ArgumentList.Add(arg);
        }

        using var process = System.Diagnostics.Process.Start(start);
        if (process is null)
        {
            return false;
        }

        process.StandardError.ReadToEnd();
        process.WaitForExit();
        return process.ExitCode == 0;
    }
}
