using Readiness.Testing;

namespace Readiness.Git.Tests;

/// <summary>The shared repository builder does what it says; git itself is the reference for every assertion.</summary>
public sealed class TestRepositoryTests
{
    [Fact]
    public void CommitWithDate_GitLogShowsThatDateAndIdentity()
    {
        using var repo = TestRepository.Create();
        var date = new DateTimeOffset(2026, 11, 20, 14, 30, 0, TimeSpan.FromHours(1));
        var sha = repo.Write("README.md", "# Bramble.Sketches\n").Commit("Initial import", date);

        // git log --format: %cI is the strict ISO 8601 committer date, %ae the author address.
        Assert.Equal("2026-11-20T14:30:00+01:00|dev@bramblecote.example|Initial import", repo.Git("log", "-1", "--format=%cI|%ae|%s", sha).Trim());
        Assert.Equal("main", repo.Git("symbolic-ref", "--short", "HEAD").Trim());
    }

    [Fact]
    public void WriteDeleteCommit_GitLsTreeListsCommittedFiles()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Write("src/b.txt", "b").Commit("one");
        var second = repo.Delete("a.txt").Write("c.txt", "c").Commit("two");

        Assert.Equal(["c.txt", "src/b.txt"], repo.Git("ls-tree", "-r", "--name-only", second).Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Equal("a", repo.Git("show", "HEAD~1:a.txt"));
    }

    [Fact]
    public void Tags_LightweightIsCommitAnnotatedIsTagObject()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");
        var taggerDate = new DateTimeOffset(2026, 11, 21, 8, 0, 0, TimeSpan.Zero);
        repo.Tag("v1.0.0").AnnotatedTag("v1.1.0", "Release 1.1.0", taggerDate);

        // git cat-file -t: a lightweight tag names the commit itself; an annotated tag is a tag object.
        Assert.Equal("commit", repo.Git("cat-file", "-t", "v1.0.0").Trim());
        Assert.Equal("tag", repo.Git("cat-file", "-t", "v1.1.0").Trim());
        Assert.Equal("2026-11-21T08:00:00+00:00", repo.Git("for-each-ref", "--format=%(taggerdate:iso-strict)", "refs/tags/v1.1.0").Trim());
    }

    [Fact]
    public void SignedTagAndCommit_GitVerifiesWithAllowedSigners()
    {
        using var keys = new SshKeys();
        var key = keys.Create();
        var allowed = keys.WriteAllowedSigners(key);
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").SignedCommit("signed", key.PrivateKeyPath);
        repo.SignedTag("v2.4.0", "Release 2.4.0", key.PrivateKeyPath);

        // git verify-tag / verify-commit exit 0 for a good signature by an allowed signer (git-config gpg.ssh.allowedSignersFile).
        Assert.True(repo.TryGit("-c", $"gpg.ssh.allowedSignersFile={allowed}", "verify-tag", "v2.4.0").Succeeded);
        Assert.True(repo.TryGit("-c", $"gpg.ssh.allowedSignersFile={allowed}", "verify-commit", "HEAD").Succeeded);
        Assert.StartsWith("dev@bramblecote.example namespaces=\"git\" ssh-ed25519 AAAA", key.AllowedSignersLine);
    }

    [Fact]
    public void CloneBareAndShallowClone_HaveTheExpectedShape()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");
        repo.Tag("v1.0.0");
        repo.Write("a.txt", "b").Commit("two");

        using var bare = repo.CloneBare();
        using var shallow = repo.Clone("--depth", "1");

        Assert.True(bare.IsBare);
        Assert.Equal("true", bare.Git("rev-parse", "--is-bare-repository").Trim());
        Assert.Equal(repo.Sha("v1.0.0^{commit}"), bare.Sha("v1.0.0^{commit}"));
        Assert.Equal(repo.Head, bare.Sha("main"));
        Assert.Equal("true", shallow.Git("rev-parse", "--is-shallow-repository").Trim());
        Assert.False(shallow.TryGit("rev-parse", "--verify", "-q", "HEAD~1").Succeeded);
    }

    [Fact]
    public void Dispose_DeletesTheFolder()
    {
        var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");
        var path = repo.Path;
        repo.Dispose();

        Assert.False(Directory.Exists(path));
    }
}
