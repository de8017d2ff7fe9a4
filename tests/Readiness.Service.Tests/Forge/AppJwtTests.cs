using System.Diagnostics;
using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using Readiness.Service.Forge;
using Readiness.Testing;

namespace Readiness.Service.Tests.Forge;

public sealed class AppJwtTests
{
    private static readonly DateTimeOffset Now = new(2026, 11, 20, 12, 0, 0, TimeSpan.Zero);

    [Fact]
    public void Token_VerifiesWithOpenSsl_AndCarriesTheDocumentedClaims()
    {
        using var folder = new TempDirectory("readiness-jwt-");
        var keyPath = folder.Combine("app.pem");
        OpenSsl(folder.Path, "genrsa", "-out", keyPath, "2048");
        OpenSsl(folder.Path, "rsa", "-in", keyPath, "-pubout", "-out", folder.Combine("app.pub"));
        using var key = RSA.Create();
        key.ImportFromPem(File.ReadAllText(keyPath));

        var jwt = AppJwt.Create("123456", key, Now);
        var parts = jwt.Split('.');
        Assert.Equal(3, parts.Length);

        // RFC 7515 §5.2: the signature is over ASCII(header '.' payload); RS256 is RSASSA-PKCS1-v1_5 with SHA-256
        // (RFC 7518 §3.3), which is what `openssl dgst -sha256 -verify` checks.
        File.WriteAllText(folder.Combine("input"), parts[0] + "." + parts[1], Encoding.ASCII);
        File.WriteAllBytes(folder.Combine("signature"), FromBase64Url(parts[2]));
        var verify = OpenSsl(folder.Path, "dgst", "-sha256", "-verify", folder.Combine("app.pub"), "-signature", folder.Combine("signature"), folder.Combine("input"));
        Assert.Contains("Verified OK", verify, StringComparison.Ordinal);

        using var header = JsonDocument.Parse(FromBase64Url(parts[0]));
        Assert.Equal("RS256", header.RootElement.GetProperty("alg").GetString());
        using var payload = JsonDocument.Parse(FromBase64Url(parts[1]));
        var iat = payload.RootElement.GetProperty("iat").GetInt64();
        var exp = payload.RootElement.GetProperty("exp").GetInt64();

        // The forge's app docs: iat 60 s in the past is recommended; exp at most 10 minutes ahead.
        Assert.Equal(Now.ToUnixTimeSeconds() - 60, iat);
        Assert.True(exp - Now.ToUnixTimeSeconds() <= 600);
        Assert.True(exp > Now.ToUnixTimeSeconds());
        Assert.Equal("123456", payload.RootElement.GetProperty("iss").GetString());
    }

    [Fact]
    public void Base64Url_HasNoPaddingAndUrlAlphabet() =>
        // RFC 4648 §5 alphabet, RFC 7515 §2 no padding: 0xFB 0xFF -> "+/8=" in base64, "-_8" in base64url.
        Assert.Equal("-_8", AppJwt.Base64Url([0xFB, 0xFF]));

    private static byte[] FromBase64Url(string text)
    {
        var s = text.Replace('-', '+').Replace('_', '/');
        return Convert.FromBase64String(s.PadRight(s.Length + ((4 - (s.Length % 4)) % 4), '='));
    }

    private static string OpenSsl(string folder, params string[] args)
    {
        var start = new ProcessStartInfo("openssl") { WorkingDirectory = folder, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in args)
        {
            start.ArgumentList.Add(a);
        }

        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEnd() + process.StandardError.ReadToEnd();
        process.WaitForExit();
        Assert.True(process.ExitCode == 0, $"openssl {string.Join(' ', args)}: {output}");
        return output;
    }
}
