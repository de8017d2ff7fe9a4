using Readiness.Core.Secrets;
using Readiness.Testing;

namespace Readiness.Core.Tests.Secrets;

public sealed class SecretScannerTests
{
    public static TheoryData<string, string, string> Shapes()
    {
        var data = new TheoryData<string, string, string>();
        foreach (var (shape, token, lookAlike) in SecretFixtures.Tokens())
        {
            data.Add(shape, token, lookAlike);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Shapes))]
    public void TokenShape_IsFoundAtItsLine(string shape, string token, string lookAlike)
    {
        _ = lookAlike;
        var content = $"# settings\nvalues:\n  token: \"{token}\"\n";

        var hit = Assert.Single(SecretScanner.ScanText("deploy/settings.yml", content));

        Assert.Equal(shape, hit.Kind);
        Assert.Equal(3, hit.Line);
        Assert.False(string.IsNullOrWhiteSpace(hit.Source));
    }

    [Theory]
    [MemberData(nameof(Shapes))]
    public void LookAlike_IsNotFound(string shape, string token, string lookAlike)
    {
        _ = token;
        Assert.DoesNotContain(SecretScanner.ScanText("docs/tokens.md", $"Example: {lookAlike}\n"), h => h.Kind == shape);
    }

    [Theory]
    [InlineData("xxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxx")]
    [InlineData("000000000000000000000000000000000000")]
    [InlineData("aaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaa")]
    public void Placeholders_AreNotFound(string body) =>
        Assert.Empty(SecretScanner.ScanText("README.md", "Set GITHUB_TOKEN to gh" + "p_" + body + "\n"));

    [Fact]
    public void TokenGlued_ToOtherWordCharacters_IsNotFound()
    {
        var (_, token, _) = SecretFixtures.Tokens().First();

        Assert.Empty(SecretScanner.ScanText("a.txt", "x" + token + "\n"));
        Assert.Empty(SecretScanner.ScanText("a.txt", token + "9\n"));
    }

    // Key blocks made by .NET (PKCS#8 per RFC 5208/7468, traditional RSA, encrypted PKCS#8) and by ssh-keygen (OpenSSH).
    [Fact]
    public void PrivateKeyBlocks_AreFound()
    {
        using var keys = new SshKeys();
        var openssh = File.ReadAllText(keys.Create().PrivateKeyPath);
        var blocks = new[] { SecretFixtures.Pkcs8Pem(), SecretFixtures.RsaPem(), SecretFixtures.EncryptedPem(), openssh };

        foreach (var block in blocks)
        {
            var hit = Assert.Single(SecretScanner.ScanText("keys/release.pem", "\n" + block));
            Assert.Equal(2, hit.Line);
            Assert.Equal("private key block", hit.Kind);
        }
    }

    [Fact]
    public void PrivateKeyInsideAJsonString_IsFound()
    {
        var pem = SecretFixtures.Pkcs8Pem().Replace("\n", "\\n", StringComparison.Ordinal);

        var hit = Assert.Single(SecretScanner.ScanText("deploy/account.json", "{\n  \"type\": \"service\",\n  \"private_key\": \"" + pem + "\"\n}\n"));

        Assert.Equal(3, hit.Line);
    }

    [Fact]
    public void PublicKeysCertificatesAndHeaderMentions_AreNotFound()
    {
        using var keys = new SshKeys();
        var header = SecretShapes.ArmorBegin + "PRIVATE KEY" + "-----";
        var content = SecretFixtures.PublicKeyPem() + "\n" + keys.Create().PublicKey + "\n"
            + $"if (line.StartsWith(\"{header}\")) {{ return true; }}\n"
            + $"const string Header = \"{header}\";\n";

        Assert.Empty(SecretScanner.ScanText("src/KeyReader.cs", content));
    }

    // .snk formats from .NET's own CryptoAPI blob export: a key pair is a PRIVATEKEYBLOB ("RSA2" at offset 8), a public
    // key alone is not (wincrypt.h BLOBHEADER/RSAPUBKEY; offsets from memory, confirmed here).
    [Fact]
    public void SnkWithPrivateKey_IsFoundButPublicOnlyIsNot()
    {
        var pair = SecretFixtures.SnkKeyPair();
        var publicOnly = SecretFixtures.SnkPublicOnly();

        Assert.Equal(0x07, pair[0]);
        Assert.Equal("RSA2"u8.ToArray(), pair[8..12]);
        Assert.Equal("RSA1"u8.ToArray(), publicOnly[8..12]);
        Assert.Equal(596, pair.Length); // a 1024-bit key pair, as sn -k writes it (from memory)
        Assert.Equal(148, publicOnly.Length); // PUBLICKEYBLOB without the 12-byte strong-name header of sn -p (160 bytes)
        Assert.True(KeyFiles.IsPrivateKeyBlob(pair));
        Assert.False(KeyFiles.IsPrivateKeyBlob(publicOnly));
    }

    [Fact]
    public void Scan_FindsKeyFilesByFormatAndSkipsBinaryText()
    {
        var (_, token, _) = SecretFixtures.Tokens().First();
        var binaryWithToken = new byte[] { 0x4D, 0x5A, 0, 0 }.Concat(System.Text.Encoding.ASCII.GetBytes(token)).ToArray();
        var files = new InMemoryFileTree()
            .Add("signing/release.pfx", SecretFixtures.Pfx())
            .Add("signing/Bramble.snk", SecretFixtures.SnkKeyPair())
            .Add("signing/Bramble.public.snk", SecretFixtures.SnkPublicOnly())
            .Add("lib/native.dll", binaryWithToken)
            .Add("README.md", "# Bramble.Sketches\n");

        var result = SecretScanner.Scan(files);

        Assert.Equal(["signing/Bramble.snk", "signing/release.pfx"], result.Hits.Select(h => h.Path).Order(StringComparer.Ordinal));
        Assert.Equal(1, result.TextFiles);
        Assert.Equal(4, result.BinaryFiles);
    }

    [Fact]
    public void FilesAboveTheBound_AreListedNotRead()
    {
        var files = new InMemoryFileTree().Add("data/big.csv", new string('a', 2000)).Add("small.txt", "hello");

        var result = SecretScanner.Scan(files, maxBytes: 1000);

        Assert.Equal(["data/big.csv"], result.TooLarge);
        Assert.Equal(1, result.TextFiles);
    }

    // Without a byte-order mark, UTF-16 text of ASCII characters has a NUL in every second byte (Unicode 15.0 §3.10):
    // recognised by that pattern and scanned, both byte orders; binary data with NULs elsewhere stays binary.
    [Fact]
    public void Utf16TextWithoutMark_IsScanned()
    {
        var (_, token, _) = SecretFixtures.Tokens().First();
        var files = new InMemoryFileTree()
            .Add("tools/publish-le.ps1", System.Text.Encoding.Unicode.GetBytes($"$key = '{token}'\r\n"))
            .Add("tools/publish-be.ps1", System.Text.Encoding.BigEndianUnicode.GetBytes($"$key = '{token}'\r\n"))
            .Add("data/blob.bin", [1, 0, 0, 2, 3, 0, 0, 0, 5, 6]);

        var result = SecretScanner.Scan(files);

        Assert.Equal(["tools/publish-be.ps1", "tools/publish-le.ps1"], result.Hits.Select(h => h.Path).Order(StringComparer.Ordinal));
        Assert.Equal(1, result.BinaryFiles);
    }

    // UTF-16 text with a byte-order mark holds NUL bytes but is text; the scan decodes it.
    [Fact]
    public void Utf16Text_IsScanned()
    {
        var (_, token, _) = SecretFixtures.Tokens().First();
        var bytes = System.Text.Encoding.Unicode.GetPreamble().Concat(System.Text.Encoding.Unicode.GetBytes("key=" + token + "\n")).ToArray();

        var result = SecretScanner.Scan(new InMemoryFileTree().Add("settings.txt", bytes));

        Assert.Single(result.Hits);
    }
}
