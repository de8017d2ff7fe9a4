using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Git.Tests;

/// <summary>
/// Every verdict is compared with <c>git verify-tag</c> / <c>git verify-commit</c> run directly as the reference
/// (git-config gpg.ssh.allowedSignersFile: an unlisted key has trust "undefined", so verification fails).
/// </summary>
public sealed class GitSignatureVerifierTests(SigningKeysFixture fixture) : IClassFixture<SigningKeysFixture>, IDisposable
{
    private readonly SshKeys keys = fixture.Keys;
    private readonly SshKey allowed = fixture.Allowed;
    private readonly SshKey stranger = fixture.Stranger;
    private readonly TestRepository repo = TestRepository.Create();

    [Fact]
    public void TagSignedByAllowedKey_IsValidWithSignerAndFingerprint()
    {
        repo.Write("a.txt", "a").Commit("one");
        repo.SignedTag("v2.4.0", "Release 2.4.0", allowed.PrivateKeyPath);
        var verifier = new GitSignatureVerifier(repo.GitDirectory);

        var verdict = verifier.VerifyTag("v2.4.0", SshKeys.AllowedSigners(allowed));

        Assert.True(Reference(repo, "verify-tag", "v2.4.0", allowed).Succeeded);
        Assert.True(verdict.Valid);
        Assert.Equal("dev@bramblecote.example", verdict.Signer);

        // ssh-keygen -l -E sha256 -f KEY.pub prints the key's fingerprint (ssh-keygen(1)); git reports the same one.
        Assert.Equal(Fingerprint(allowed), verdict.Fingerprint);
        Assert.StartsWith("SHA256:", verdict.Fingerprint, StringComparison.Ordinal);
        Assert.Contains("Good \"git\" signature", verdict.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void TagSignedByUnlistedKey_IsNotValid()
    {
        repo.Write("a.txt", "a").Commit("one");
        repo.SignedTag("v2.4.0", "Release 2.4.0", stranger.PrivateKeyPath);
        var verifier = new GitSignatureVerifier(repo.GitDirectory);

        var verdict = verifier.VerifyTag("v2.4.0", SshKeys.AllowedSigners(allowed));

        Assert.False(Reference(repo, "verify-tag", "v2.4.0", allowed).Succeeded);
        Assert.False(verdict.Valid);
        Assert.Null(verdict.Signer);
        Assert.Equal(Fingerprint(stranger), verdict.Fingerprint);
    }

    [Fact]
    public void AnnotatedUnsignedTag_IsNotValid()
    {
        repo.Write("a.txt", "a").Commit("one");
        repo.AnnotatedTag("v2.4.0", "Release 2.4.0");
        var verifier = new GitSignatureVerifier(repo.GitDirectory);

        var verdict = verifier.VerifyTag("v2.4.0", SshKeys.AllowedSigners(allowed));

        Assert.False(Reference(repo, "verify-tag", "v2.4.0", allowed).Succeeded);
        Assert.False(verdict.Valid);
        Assert.Null(verdict.Fingerprint);
        Assert.False(string.IsNullOrWhiteSpace(verdict.Detail));
    }

    [Fact]
    public void MissingTag_IsNotValid()
    {
        repo.Write("a.txt", "a").Commit("one");
        var verifier = new GitSignatureVerifier(repo.GitDirectory);

        var verdict = verifier.VerifyTag("v9.9.9", SshKeys.AllowedSigners(allowed));

        Assert.False(Reference(repo, "verify-tag", "v9.9.9", allowed).Succeeded);
        Assert.False(verdict.Valid);
        Assert.Contains("not found", verdict.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void TagAlteredAfterSigning_IsNotValid()
    {
        repo.Write("a.txt", "a").Commit("one");
        repo.SignedTag("v2.4.0", "Release 2.4.0", allowed.PrivateKeyPath);

        // Rewrite the tag object with a different message but the original signature block (git cat-file tag, then
        // git mktag to store the edited object), and point a new tag ref at it.
        var original = repo.Git("cat-file", "tag", "v2.4.0");
        var altered = original.Replace("Release 2.4.0", "Release 2.4.1", StringComparison.Ordinal);
        Assert.NotEqual(original, altered);
        var alteredId = repo.GitWithInput(altered, "mktag").Trim();
        repo.Git("update-ref", "refs/tags/v2.4.0-altered", alteredId);
        var verifier = new GitSignatureVerifier(repo.GitDirectory);

        var good = verifier.VerifyTag("v2.4.0", SshKeys.AllowedSigners(allowed));
        var verdict = verifier.VerifyTag("v2.4.0-altered", SshKeys.AllowedSigners(allowed));

        Assert.True(good.Valid);
        Assert.False(Reference(repo, "verify-tag", "v2.4.0-altered", allowed).Succeeded);
        Assert.False(verdict.Valid);
    }

    [Fact]
    public void Commits_SignedByAllowedKeyValid_UnsignedNotValid()
    {
        var unsigned = repo.Write("a.txt", "a").Commit("unsigned");
        var signed = repo.Write("a.txt", "b").SignedCommit("signed", allowed.PrivateKeyPath);
        var verifier = new GitSignatureVerifier(repo.GitDirectory);

        var good = verifier.VerifyCommit(signed, SshKeys.AllowedSigners(allowed));
        var none = verifier.VerifyCommit(unsigned, SshKeys.AllowedSigners(allowed));

        Assert.True(Reference(repo, "verify-commit", signed, allowed).Succeeded);
        Assert.False(Reference(repo, "verify-commit", unsigned, allowed).Succeeded);
        Assert.True(good.Valid);
        Assert.Equal("dev@bramblecote.example", good.Signer);
        Assert.Equal(Fingerprint(allowed), good.Fingerprint);
        Assert.False(none.Valid);
        Assert.Contains("no signature", none.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void BareRepository_ThroughSnapshot_VerifiesTag()
    {
        repo.Write("a.txt", "a").Commit("one");
        repo.SignedTag("v2.4.0", "Release 2.4.0", allowed.PrivateKeyPath);
        using var bare = repo.CloneBare();

        using var snapshot = new GitSnapshotSource().Open(new SnapshotRequest(bare.Path, "v2.4.0"));
        var verdict = snapshot.Signatures!.VerifyTag("v2.4.0", SshKeys.AllowedSigners(allowed));

        Assert.True(Reference(bare, "verify-tag", "v2.4.0", allowed).Succeeded);
        Assert.True(verdict.Valid);
        Assert.Equal("dev@bramblecote.example", verdict.Signer);
    }

    [Fact]
    public void RepositoryConfigNamingAnotherProgram_IsIgnored()
    {
        repo.Write("a.txt", "a").Commit("one");
        repo.SignedTag("v2.4.0", "Release 2.4.0", stranger.PrivateKeyPath);

        // A hostile repository could name a program that "verifies" anything; the verifier pins git's own helper.
        var fake = Path.Combine(repo.GitDirectory, "always-good.sh");
        File.WriteAllText(fake, "#!/bin/sh\necho 'Good \"git\" signature for dev@bramblecote.example with ED25519 key SHA256:forged'\nexit 0\n");
        if (!OperatingSystem.IsWindows())
        {
            File.SetUnixFileMode(fake, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        }

        repo.Git("config", "gpg.ssh.program", fake);
        var verifier = new GitSignatureVerifier(repo.GitDirectory);

        var verdict = verifier.VerifyTag("v2.4.0", SshKeys.AllowedSigners(allowed));

        Assert.False(verdict.Valid);
        Assert.NotEqual("SHA256:forged", verdict.Fingerprint);
    }

    [Fact]
    public void ParseSigner_ReadsGnupgStatusLines()
    {
        // GnuPG doc/DETAILS: GOODSIG <long_keyid_or_fpr> <username>; VALIDSIG <fingerprint_in_hex> <sig_creation_date> ...
        var output = "[GNUPG:] NEWSIG\n[GNUPG:] GOODSIG 1A2B3C4D5E6F7081 Bramblecote Dev <dev@bramblecote.example>\n"
            + "[GNUPG:] VALIDSIG 0123456789ABCDEF0123456789ABCDEF01234567 2026-11-20 1795000000 0 4 0 22 10 00 0123456789ABCDEF0123456789ABCDEF01234567\n";

        var (signer, fingerprint) = GitSignatureVerifier.ParseSigner(output);

        Assert.Equal("Bramblecote Dev <dev@bramblecote.example>", signer);
        Assert.Equal("0123456789ABCDEF0123456789ABCDEF01234567", fingerprint);
    }

    public void Dispose() => repo.Dispose();

    private GitResult Reference(TestRepository repository, string command, string target, SshKey listed)
    {
        var file = keys.WriteAllowedSigners(listed);
        return repository.TryGit("-c", $"gpg.ssh.allowedSignersFile={file}", command, target);
    }

    /// <summary>The second field of <c>ssh-keygen -l -E sha256 -f KEY.pub</c>: <c>256 SHA256:… comment (ED25519)</c>.</summary>
    private static string Fingerprint(SshKey key)
    {
        var start = new System.Diagnostics.ProcessStartInfo("ssh-keygen") { RedirectStandardOutput = true, UseShellExecute = false };
        foreach (var arg in (string[])["-l", "-E", "sha256", "-f", key.PublicKeyPath])
        {
            start.ArgumentList.Add(arg);
        }

        using var process = System.Diagnostics.Process.Start(start)!;
        var output = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        return output.Split(' ')[1];
    }
}
