using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Git.Tests;

/// <summary>
/// The commit signature read from the raw object, against two outside references: LibGit2Sharp's
/// <c>Commit.ExtractSignature</c> (libgit2's reading of the same header, in the JIT-compiled test process) and
/// git itself (<c>git cat-file commit</c>, <c>git verify-commit</c>).
/// </summary>
public sealed class CommitSignatureReaderTests : IClassFixture<SigningKeysFixture>
{
    private readonly SigningKeysFixture keys;

    public CommitSignatureReaderTests(SigningKeysFixture keys) => this.keys = keys;

    [Fact]
    public void SignedCommit_GivesTheSameSignatureAsLibgit2()
    {
        using var repo = TestRepository.Create();
        repo.Write("README.md", "# Bramble.Sketches\n");
        var sha = repo.SignedCommit("Release 2.4.0", keys.Allowed.PrivateKeyPath);

        var signature = CommitSignatureReader.Read(repo.GitDirectory, sha);

        using var libgit2 = new LibGit2Sharp.Repository(repo.Path);
        var expected = LibGit2Sharp.Commit.ExtractSignature(libgit2, new LibGit2Sharp.ObjectId(sha)).Signature;
        Assert.NotNull(signature);
        Assert.Equal(SignatureKind.Ssh, signature.Kind);
        Assert.Equal(expected, signature.Armored); // libgit2 git_commit_extract_signature
        // gitformat-signature(5): an SSH signature is armoured between these markers.
        Assert.StartsWith("-----BEGIN SSH SIGNATURE-----\n", signature.Armored, StringComparison.Ordinal);
        Assert.EndsWith("\n-----END SSH SIGNATURE-----", signature.Armored, StringComparison.Ordinal);
    }

    [Fact]
    public void UnsignedCommit_HasNoSignature_AsLibgit2Says()
    {
        using var repo = TestRepository.Create();
        repo.Write("README.md", "# Bramble.Sketches\n");
        var sha = repo.Commit("Plain");

        Assert.Null(CommitSignatureReader.Read(repo.GitDirectory, sha));
        using var libgit2 = new LibGit2Sharp.Repository(repo.Path);
        // libgit2 reports a commit without gpgsig header as not found.
        Assert.Throws<LibGit2Sharp.NotFoundException>(() => LibGit2Sharp.Commit.ExtractSignature(libgit2, new LibGit2Sharp.ObjectId(sha)));
    }

    [Fact]
    public void SignedOrNot_AgreesWithGit()
    {
        using var repo = TestRepository.Create();
        repo.Write("README.md", "# Bramble.Sketches\n");
        var plain = repo.Commit("Plain");
        repo.Write("NOTES.md", "notes\n");
        var signed = repo.SignedCommit("Release 2.4.0", keys.Allowed.PrivateKeyPath);
        using var folder = new TempDirectory();
        var signers = folder.Combine("allowed_signers");
        File.WriteAllText(signers, SshKeys.AllowedSigners(keys.Allowed));

        foreach (var sha in new[] { plain, signed })
        {
            // git-log(1) %G?: "N" for no signature; "G" for a good one by an allowed signer.
            var git = repo.Git("-c", $"gpg.ssh.allowedSignersFile={signers}", "show", "-s", "--format=%G?", sha).Trim();
            var read = CommitSignatureReader.Read(repo.GitDirectory, sha);
            Assert.Equal(sha == signed ? "G" : "N", git);
            Assert.Equal(git != "N", read is not null);
        }
    }

    [Fact]
    public void HeaderSignature_ReadsOnlyTheHeader_AndTheSha256Name()
    {
        // git's commit object format: headers, an empty line, the message. A message that quotes a header is not one.
        const string raw = "tree 4b825dc642cb6eb9a060e54bf8d69288fbee4904\n"
            + "author Rowan Bramblecote <rowan@bramblecote.example> 1764000000 +0000\n"
            + "committer Rowan Bramblecote <rowan@bramblecote.example> 1764000000 +0000\n"
            + "gpgsig-sha256 -----BEGIN PGP SIGNATURE-----\n \n iQEzBAABCAAdFiEE\n -----END PGP SIGNATURE-----\n"
            + "\n"
            + "Release\n\ngpgsig not a header\n";

        Assert.Equal("-----BEGIN PGP SIGNATURE-----\n\niQEzBAABCAAdFiEE\n-----END PGP SIGNATURE-----", CommitSignatureReader.HeaderSignature(raw));
        Assert.Null(CommitSignatureReader.HeaderSignature(raw.Replace("gpgsig-sha256 ", "x-other ", StringComparison.Ordinal)));
    }
}
