using Readiness.Core.Checks;
using Readiness.Core.Checks.Signing;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;
using Readiness.Testing;
using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Signing;

public sealed class SigningChecksTests
{
    // A stand-in public key blob (random bytes, base64) and its OpenSSH-style fingerprint computed by the code under
    // test; the real-key comparison with ssh-keygen -l is in AllowedSignersTests.
    private static readonly string KeyBlob = Convert.ToBase64String(Enumerable.Range(0, 51).Select(i => (byte)(i * 7)).ToArray());
    private static readonly string Fingerprint = AllowedSigners.Fingerprint(KeyBlob)!;
    private static readonly string AllowedFile =
        "# maintainers\nops@bramblecote.example ssh-ed25519 AAAAC3NzaC1lZDI1NTE5AAAAIBbbbbbbbbbbbbbbbbbbbbbbbbbbbbbbbbbbbbbbbbb\n"
        + $"dev@bramblecote.example namespaces=\"git\" ssh-ed25519 {KeyBlob}\n";

    private static readonly SignatureBlock Ssh = new(SignatureKind.Ssh, SignatureKindArmor("SSH"));

    private static string SignatureKindArmor(string kind) =>
        "-----BEGIN " + kind + " SIGNATURE-----\nU1NIU0lHAAAAAQ==\n-----END " + kind + " SIGNATURE-----\n";

    private static TagInfo SignedTag(SignatureBlock? signature = null) =>
        TestSnapshots.Tag("v2.4.0") with { Signature = signature ?? Ssh };

    private static CheckContext Context(TagInfo? tag, ISignatureVerifier? verifier, string? config, SignatureBlock? commitSignature = null, InspectionKind kind = InspectionKind.Commit)
    {
        var files = new InMemoryFileTree().Add(".github/allowed_signers", AllowedFile);
        var snapshot = TestSnapshots.Snapshot(files, tag) with { Signatures = verifier, CommitSignature = commitSignature, Inspected = kind };
        return TestSnapshots.Context(snapshot, config: config is null ? null : Config(config));
    }

    private const string WithSigners = "allowed-signers: .github/allowed_signers\n";

    [Fact]
    public void LightweightTag_Fails()
    {
        var finding = Assert.Single(new SigningTagCheck().Run(Context(TestSnapshots.Tag("v2.4.0", annotated: false), null, null)));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("lightweight", finding.Message, StringComparison.Ordinal);
        Assert.Contains("git tag -s v2.4.0", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void AnnotatedUnsignedTag_Fails()
    {
        var finding = Assert.Single(new SigningTagCheck().Run(Context(TestSnapshots.Tag("v2.4.0"), null, null)));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("annotated by Dev <dev@bramblecote.example> but not signed", finding.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(SignatureKind.Ssh, "an SSH")]
    [InlineData(SignatureKind.Pgp, "a PGP")]
    [InlineData(SignatureKind.X509, "an X.509")]
    public void SignedTagWithoutAllowedSigners_PassesUnverified(SignatureKind kind, string words)
    {
        var finding = Assert.Single(new SigningTagCheck().Run(Context(SignedTag(new SignatureBlock(kind, "x")), null, null)));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains($"carries {words} signature (not verified", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void VerifiedTag_PassesNamingSignerKeyAndAllowedSignersLine()
    {
        var verifier = new FakeSignatureVerifier(new SignatureVerification(true, "dev@bramblecote.example", Fingerprint, "Good \"git\" signature"));

        var finding = Assert.Single(new SigningTagCheck().Run(Context(SignedTag(), verifier, WithSigners)));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains($"signed by dev@bramblecote.example with key {Fingerprint}", finding.Message, StringComparison.Ordinal);
        Assert.Equal([".github/allowed_signers:3"], EvidenceText(finding));
        var call = Assert.Single(verifier.Calls);
        Assert.Equal(("tag", "v2.4.0", AllowedFile), call);
    }

    [Fact]
    public void RejectedTag_FailsWithGitsWords()
    {
        var verifier = new FakeSignatureVerifier(new SignatureVerification(false, null, "SHA256:unlisted", "No principal matched."));

        var finding = Assert.Single(new SigningTagCheck().Run(Context(SignedTag(), verifier, WithSigners)));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("No principal matched.", finding.Message, StringComparison.Ordinal);
        Assert.Contains("organisation's security policy", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void AllowedSignersMissingAtCommit_FailsAtTheConfigLine()
    {
        var verifier = new FakeSignatureVerifier(new SignatureVerification(true, null, null, "ok"));

        var finding = Assert.Single(new SigningTagCheck().Run(Context(SignedTag(), verifier, "tag-pattern: v{version}\nallowed-signers: signers.txt\n")));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Equal([".readiness.yml:2"], EvidenceText(finding));
        Assert.Empty(verifier.Calls);
    }

    [Fact]
    public void NoVerifier_SkipsWithReason()
    {
        var finding = Assert.Single(new SigningTagCheck().Run(Context(SignedTag(), null, WithSigners)));

        AssertStatus(CheckStatus.Skip, finding);
        Assert.Contains("no signature verifier", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void WorktreeInspection_Skips()
    {
        AssertStatus(CheckStatus.Skip, Assert.Single(new SigningTagCheck().Run(Context(SignedTag(), null, WithSigners, kind: InspectionKind.Worktree))));
        AssertStatus(CheckStatus.Skip, Assert.Single(new SigningCommitCheck().Run(Context(SignedTag(), null, WithSigners, Ssh, InspectionKind.Worktree))));
    }

    [Fact]
    public void NoTag_Skips() =>
        AssertStatus(CheckStatus.Skip, Assert.Single(new SigningTagCheck().Run(Context(null, null, null))));

    [Fact]
    public void UnsignedCommit_Fails()
    {
        var finding = Assert.Single(new SigningCommitCheck().Run(Context(SignedTag(), null, null)));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains(TestSnapshots.Commit[..12], finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void SignedCommit_IsVerifiedAsTheInspectedCommit()
    {
        var verifier = new FakeSignatureVerifier(new SignatureVerification(true, "dev@bramblecote.example", Fingerprint, "Good"));

        var finding = Assert.Single(new SigningCommitCheck().Run(Context(SignedTag(), verifier, WithSigners, Ssh)));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Equal(("commit", TestSnapshots.Commit, AllowedFile), Assert.Single(verifier.Calls));
    }
}
