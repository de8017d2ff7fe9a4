using Readiness.Core.Checks.Secrets;
using Readiness.Core.Reports;
using Readiness.Core.Tests.Secrets;
using Readiness.Testing;
using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Secrets;

public sealed class NoneCommittedCheckTests
{
    [Fact]
    public void EveryShape_FailsWithFileAndLineAndNeverTheSecret()
    {
        var files = new InMemoryFileTree().Add("README.md", "# Bramble.Sketches\n");
        var secrets = new List<string>();
        var i = 0;
        foreach (var (_, token, _) in SecretFixtures.Tokens())
        {
            files.Add($"config/file{i++}.env", $"# line one\nSECRET={token}\n");
            secrets.Add(token);
        }

        var pem = SecretFixtures.Pkcs8Pem();
        files.Add("keys/release.key", pem);
        secrets.Add(pem.Split('\n')[1]);
        var password = SecretFixtures.Random("abcdefghijkLMNOP0123456789", 20, 77);
        files.Add("nuget.config", $"<configuration>\n<packageSourceCredentials>\n<feed>\n<add key=\"ClearTextPassword\" value=\"{password}\" />\n</feed>\n</packageSourceCredentials>\n</configuration>\n");
        secrets.Add(password);

        var all = Run(new NoneCommittedCheck(), files: files);
        var findings = all.Where(f => f.Status == CheckStatus.Fail).ToList();

        Assert.Equal(i + 2, findings.Count);
        Assert.Equal("The other 1 tracked files hold no secret.", Assert.Single(all, f => f.Status == CheckStatus.Pass).Message);
        Assert.Contains(findings, f => EvidenceText(f).SequenceEqual(["config/file0.env:2"]));
        Assert.Contains(findings, f => EvidenceText(f).SequenceEqual(["keys/release.key:1"]));
        Assert.Contains(findings, f => EvidenceText(f).SequenceEqual(["nuget.config:4"]));
        foreach (var finding in findings)
        {
            Assert.Contains("rotate", finding.Hint, StringComparison.Ordinal);
            Assert.Contains("organisation's security policy", finding.Hint, StringComparison.Ordinal);
            foreach (var secret in secrets)
            {
                SecretFixtures.AssertNotLeaked(secret, finding.Message);
                SecretFixtures.AssertNotLeaked(secret, finding.Hint);
                SecretFixtures.AssertNotLeaked(secret, string.Join(" ", EvidenceText(finding)));
            }
        }
    }

    [Fact]
    public void CommittedPfx_FailsNamingTheFile()
    {
        var files = new InMemoryFileTree().Add("signing/release.pfx", SecretFixtures.Pfx());

        var finding = Assert.Single(Run(new NoneCommittedCheck(), files: files));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Equal(["signing/release.pfx"], EvidenceText(finding));
        Assert.Contains("PKCS#12", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void CleanTree_PassesWithCounts()
    {
        var files = new InMemoryFileTree()
            .Add("README.md", "Set the token in the CI secret store (never commit gh" + "p_ tokens).\n")
            .Add("docs/aws.md", "Example key id: AK" + "IA" + "IOSFODNN7" + "EXAMPLE\n")
            .Add("logo.png", new byte[] { 0x89, 0x50, 0x4E, 0x47, 0, 0, 0 });

        var finding = Single(Run(new NoneCommittedCheck(), files: files));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("3 tracked files (2 scanned as text, 1 binary", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NuGetConfigThatIsNotXml_IsAnError_NeverAPass()
    {
        // nuget.config reference: the file is XML; one that does not parse cannot be checked for credentials.
        var files = new InMemoryFileTree().Add("nuget.config", "<configuration>\n<<packageSourceCredentials><feed><add key=\"ClearTextPassword\" value=\"x\" />\n");

        var finding = Assert.Single(Run(new NoneCommittedCheck(), files: files));

        Assert.Equal(CheckStatus.Error, finding.Status);
        Assert.Contains("nuget.config", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NuGetConfigWithAUtf8ByteOrderMark_IsScanned()
    {
        byte[] bom = [0xEF, 0xBB, 0xBF];
        var files = new InMemoryFileTree().Add("nuget.config", [.. bom, .. System.Text.Encoding.UTF8.GetBytes(
            "<configuration><packageSourceCredentials><feed><add key=\"Username\" value=\"dev\" /><add key=\"ClearTextPassword\" value=\"s3cr3t-value\" /></feed></packageSourceCredentials></configuration>")]);

        var finding = Assert.Single(Run(new NoneCommittedCheck(), files: files));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.DoesNotContain("s3cr3t-value", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void StrongNameKeyPair_IsInformation_UnlessConfiguredPrivate()
    {
        // .NET library guidance (strong naming): an open-source library should commit its .snk so anyone can build it.
        // The key pair's format (PRIVATEKEYBLOB, "RSA2") is confirmed against .NET's own ExportCspBlob in SecretScannerTests.
        var files = new InMemoryFileTree().Add("README.md", "# Bramble.Sketches\n").Add("signing/Bramble.snk", SecretFixtures.SnkKeyPair());

        var open = Run(new NoneCommittedCheck(), files: files);
        Assert.DoesNotContain(open, f => f.Status == CheckStatus.Fail);
        Assert.Contains(open, f => f.Status == CheckStatus.Pass && f.Message.StartsWith("signing/Bramble.snk is a strong-name key pair", StringComparison.Ordinal));

        var kept = Run(new NoneCommittedCheck(), files: files, with: "strong-name-key-private: true\n");
        Assert.Contains(kept, f => f.Status == CheckStatus.Fail && EvidenceText(f).SequenceEqual(["signing/Bramble.snk"]));
    }
}
