using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Git.Tests;

public sealed class GitSnapshotSourceTagTests
{
    private readonly GitSnapshotSource source = new();

    [Fact]
    public void LightweightAndAnnotatedTags_AreToldApart()
    {
        using var repo = TestRepository.Create();
        var sha = repo.Write("a.txt", "a").Commit("one");
        var taggerDate = new DateTimeOffset(2026, 11, 20, 10, 30, 0, TimeSpan.FromHours(1));
        repo.Tag("v2.3.9").AnnotatedTag("v2.4.0", "Release 2.4.0\n\nCompile-only host references.", taggerDate);

        using var snapshot = source.Open(new SnapshotRequest(repo.Path));

        // git cat-file -t is the reference: "commit" for a lightweight tag, "tag" for a tag object.
        Assert.Equal("commit", repo.Git("cat-file", "-t", "v2.3.9").Trim());
        Assert.Equal("tag", repo.Git("cat-file", "-t", "v2.4.0").Trim());
        var lightweight = Assert.Single(snapshot.Tags, t => t.Name == "v2.3.9");
        var annotated = Assert.Single(snapshot.Tags, t => t.Name == "v2.4.0");
        Assert.False(lightweight.IsAnnotated);
        Assert.Null(lightweight.TaggerDate);
        Assert.Null(lightweight.Tagger);
        Assert.Null(lightweight.Message);
        Assert.True(annotated.IsAnnotated);
        Assert.Equal(sha, annotated.TargetCommit);
        Assert.Equal(sha, lightweight.TargetCommit);

        // git for-each-ref %(taggerdate:iso-strict) / %(taggername) %(taggeremail) / %(contents) (git-for-each-ref(1)).
        var (date, tagger, contents) = ForEachRef(repo, "v2.4.0");
        Assert.Equal(DateTimeOffset.Parse(date, System.Globalization.CultureInfo.InvariantCulture), annotated.TaggerDate);
        Assert.Equal(taggerDate, annotated.TaggerDate);
        Assert.Equal(tagger, annotated.Tagger);
        Assert.Equal("Bramblecote Dev <dev@bramblecote.example>", annotated.Tagger);
        Assert.Equal(contents, annotated.Message);
        Assert.Equal("Release 2.4.0\n\nCompile-only host references.\n", annotated.Message);
        Assert.Null(annotated.Signature);
    }

    [Fact]
    public void SshSignedTag_MessageAndSignatureAreSplit()
    {
        using var keys = new SshKeys();
        var key = keys.Create();
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");
        repo.SignedTag("v2.4.0", "Release 2.4.0", key.PrivateKeyPath);

        using var snapshot = source.Open(new SnapshotRequest(repo.Path, "v2.4.0"));

        // gitformat-signature: the signature block follows the message inside the tag object; for-each-ref's
        // %(contents:body)/%(contents:signature) split it the same way.
        Assert.NotNull(snapshot.Tag);
        Assert.Equal("v2.4.0", snapshot.Tag.Name);
        Assert.Equal(repo.Git("for-each-ref", "--format=%(contents:subject)%0a%(contents:body)", "refs/tags/v2.4.0").TrimEnd('\n') + "\n", snapshot.Tag.Message);
        Assert.Equal("Release 2.4.0\n", snapshot.Tag.Message);
        Assert.NotNull(snapshot.Tag.Signature);
        Assert.Equal(SignatureKind.Ssh, snapshot.Tag.Signature.Kind);
        Assert.Equal(repo.Git("for-each-ref", "--format=%(contents:signature)", "refs/tags/v2.4.0").TrimEnd('\n'), snapshot.Tag.Signature.Armored.TrimEnd('\n'));
        Assert.StartsWith("-----BEGIN SSH SIGNATURE-----", snapshot.Tag.Signature.Armored, StringComparison.Ordinal);
    }

    [Fact]
    public void SignedCommit_SignatureFound_UnsignedCommit_Null()
    {
        using var keys = new SshKeys();
        var key = keys.Create();
        using var repo = TestRepository.Create();
        var unsigned = repo.Write("a.txt", "a").Commit("unsigned");
        var signed = repo.Write("a.txt", "b").SignedCommit("signed", key.PrivateKeyPath);

        using var signedSnapshot = source.Open(new SnapshotRequest(repo.Path, signed));
        using var unsignedSnapshot = source.Open(new SnapshotRequest(repo.Path, unsigned));

        // gitformat-signature: a signed commit carries a gpgsig header; git cat-file commit shows it.
        Assert.Contains("gpgsig -----BEGIN SSH SIGNATURE-----", repo.Git("cat-file", "commit", signed), StringComparison.Ordinal);
        Assert.DoesNotContain("gpgsig", repo.Git("cat-file", "commit", unsigned), StringComparison.Ordinal);
        Assert.NotNull(signedSnapshot.CommitSignature);
        Assert.Equal(SignatureKind.Ssh, signedSnapshot.CommitSignature.Kind);
        Assert.Contains("-----END SSH SIGNATURE-----", signedSnapshot.CommitSignature.Armored, StringComparison.Ordinal);
        Assert.Null(unsignedSnapshot.CommitSignature);
    }

    [Fact]
    public void Tags_HoldAncestorsOnly_NotLaterOrSideBranchTags()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "1").Commit("one");
        repo.Tag("v1.0.0");
        repo.Write("a.txt", "2").Commit("two");
        repo.AnnotatedTag("v1.1.0", "Release 1.1.0");
        repo.Branch("side").Checkout("side");
        repo.Write("side.txt", "s").Commit("side work");
        repo.Tag("v1.1.1-side");
        repo.Checkout("main");
        var inspected = repo.Write("a.txt", "3").Commit("three");
        repo.Tag("v1.2.0");
        repo.Git("tag", "tree-tag", "HEAD^{tree}");
        repo.Write("a.txt", "4").Commit("four");
        repo.AnnotatedTag("v1.3.0", "Release 1.3.0");

        using var snapshot = source.Open(new SnapshotRequest(repo.Path, inspected));

        // git tag --merged COMMIT lists the tags whose commits are reachable from COMMIT (git-tag(1)); a tag on a tree
        // names no commit, so it is left out here and dropped from git's list for comparison.
        var expected = repo.Git("tag", "--merged", inspected).Split('\n', StringSplitOptions.RemoveEmptyEntries)
            .Where(t => repo.TryGit("rev-parse", "--verify", "-q", t + "^{commit}").Succeeded)
            .Order(StringComparer.Ordinal).ToArray();
        Assert.Equal(expected, snapshot.Tags.Select(t => t.Name));
        Assert.Equal(["v1.0.0", "v1.1.0", "v1.2.0"], snapshot.Tags.Select(t => t.Name));
        Assert.Null(snapshot.Tag);
    }

    [Fact]
    public void Tag_FromRequestOrRef_OtherwiseNull()
    {
        using var repo = TestRepository.Create();
        var sha = repo.Write("a.txt", "1").Commit("one");
        repo.AnnotatedTag("v2.4.0", "Release 2.4.0");
        repo.Tag("candidate");

        using var byRef = source.Open(new SnapshotRequest(repo.Path, "v2.4.0"));
        using var byFullRef = source.Open(new SnapshotRequest(repo.Path, "refs/tags/v2.4.0"));
        using var byRequest = source.Open(new SnapshotRequest(repo.Path, "HEAD", Tag: "v2.4.0"));
        using var bySha = source.Open(new SnapshotRequest(repo.Path, sha));

        Assert.Equal("v2.4.0", byRef.Tag?.Name);
        Assert.Equal("v2.4.0", byFullRef.Tag?.Name);
        Assert.Equal("v2.4.0", byRequest.Tag?.Name);
        Assert.True(byRequest.Tag!.IsAnnotated);
        Assert.Null(bySha.Tag);
        Assert.Equal(["candidate", "v2.4.0"], bySha.Tags.Select(t => t.Name));
    }

    [Fact]
    public void Tag_NamedButMissing_ThrowsInspectionError()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "1").Commit("one");

        var error = Assert.Throws<RepositoryInspectionException>(() => source.Open(new SnapshotRequest(repo.Path, Tag: "v9.9.9")));

        Assert.Contains("Tag 'v9.9.9' was not found", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Worktree_KeepsTagsOfHead()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "1").Commit("one");
        repo.AnnotatedTag("v2.4.0", "Release 2.4.0");

        using var snapshot = source.Open(new SnapshotRequest(repo.Path, Worktree: true, Tag: "v2.4.0"));

        Assert.Equal("v2.4.0", snapshot.Tag?.Name);
        Assert.Equal(["v2.4.0"], snapshot.Tags.Select(t => t.Name));
    }

    private static (string Date, string Tagger, string Contents) ForEachRef(TestRepository repo, string tag)
    {
        var parts = repo.Git("for-each-ref", "--format=%(taggerdate:iso-strict)%00%(taggername) %(taggeremail)%00%(contents)", "refs/tags/" + tag)
            .Split('\0');
        return (parts[0], parts[1], parts[2].EndsWith("\n\n", StringComparison.Ordinal) ? parts[2][..^1] : parts[2]);
    }
}
