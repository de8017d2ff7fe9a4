using System.Security.Cryptography;
using System.Security.Cryptography.X509Certificates;
using Readiness.Core.Secrets;

namespace Readiness.Core.Tests.Secrets;

/// <summary>
/// Credential-shaped strings and real key files made at run time, so that this repository never holds a string that
/// looks like a real secret. Random parts come from a seeded generator: stable across runs, valid for nothing.
/// </summary>
internal static class SecretFixtures
{
    private const string Base62 = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789";
    private const string LowerAlnum = "abcdefghijklmnopqrstuvwxyz0123456789";
    private const string UpperAlnum = "ABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789";

    public static string Random(string alphabet, int length, int seed)
    {
        var random = new Random(seed);
        return new string(Enumerable.Range(0, length).Select(_ => alphabet[random.Next(alphabet.Length)]).ToArray());
    }

    /// <summary>(shape id, a matching token, a look-alike that must not match).</summary>
    public static IEnumerable<(string Shape, string Token, string LookAlike)> Tokens()
    {
        yield return ("GitHub token", "gh" + "p_" + Random(Base62, 36, 1), "gh" + "p_" + Random(Base62, 35, 1));
        yield return ("GitHub token", "gh" + "s_" + Random(Base62, 36, 2), "gh" + "x_" + Random(Base62, 36, 2));
        yield return ("GitHub fine-grained personal access token", "github" + "_pat_" + Random(Base62, 22, 3) + "_" + Random(Base62, 59, 4),
            "github" + "_pat_" + Random(Base62, 22, 3) + "-" + Random(Base62, 59, 4));
        yield return ("GitLab personal access token", "gl" + "pat-" + Random(Base62, 20, 5), "gl" + "pat-" + Random(Base62, 12, 5));
        yield return ("npm access token", "np" + "m_" + Random(Base62, 36, 6), "np" + "m_" + Random(Base62, 36, 6) + "Q");
        yield return ("NuGet API key", "oy" + "2" + Random(LowerAlnum, 43, 7), "oy" + "2" + Random(LowerAlnum, 42, 7));
        yield return ("AWS access key id", "AK" + "IA" + Random(UpperAlnum, 16, 8), "AK" + "IA" + "IOSFODNN7" + "EXAMPLE");
        yield return ("Slack token", "xo" + "xb-" + Random(Base62, 12, 9) + "-" + Random(Base62, 24, 10), "xo" + "xq-" + Random(Base62, 24, 10));
        yield return ("Azure Storage account key", "Account" + "Key=" + Convert.ToBase64String(RandomBytes(64, 11)),
            "Account" + "Key=" + Convert.ToBase64String(RandomBytes(32, 11)));
    }

    public static byte[] RandomBytes(int count, int seed)
    {
        var bytes = new byte[count];
        new Random(seed).NextBytes(bytes);
        return bytes;
    }

    /// <summary>An RSA private key in PKCS#8 PEM (RFC 7468 "PRIVATE KEY"), made by .NET.</summary>
    public static string Pkcs8Pem()
    {
        using var rsa = RSA.Create(2048);
        return rsa.ExportPkcs8PrivateKeyPem();
    }

    /// <summary>An RSA private key in the traditional OpenSSL form ("RSA PRIVATE KEY").</summary>
    public static string RsaPem()
    {
        using var rsa = RSA.Create(2048);
        return rsa.ExportRSAPrivateKeyPem();
    }

    /// <summary>An encrypted PKCS#8 private key ("ENCRYPTED PRIVATE KEY").</summary>
    public static string EncryptedPem()
    {
        using var ec = ECDsa.Create(ECCurve.NamedCurves.nistP256);
        return ec.ExportEncryptedPkcs8PrivateKeyPem("fixture-only".AsSpan(), new PbeParameters(PbeEncryptionAlgorithm.Aes256Cbc, HashAlgorithmName.SHA256, 1000));
    }

    public static string PublicKeyPem()
    {
        using var rsa = RSA.Create(2048);
        return rsa.ExportSubjectPublicKeyInfoPem();
    }

    /// <summary>A strong-name key pair as CryptoAPI writes it (PRIVATEKEYBLOB): what a .snk with the private key holds.</summary>
    public static byte[] SnkKeyPair()
    {
        using var rsa = new RSACryptoServiceProvider(1024);
        return rsa.ExportCspBlob(includePrivateParameters: true);
    }

    /// <summary>The public half only (PUBLICKEYBLOB).</summary>
    public static byte[] SnkPublicOnly()
    {
        using var rsa = new RSACryptoServiceProvider(1024);
        return rsa.ExportCspBlob(includePrivateParameters: false);
    }

    /// <summary>A self-signed certificate with its private key, exported as PKCS#12.</summary>
    public static byte[] Pfx()
    {
        using var rsa = RSA.Create(2048);
        var request = new CertificateRequest("CN=Bramblecote Release Signing", rsa, HashAlgorithmName.SHA256, RSASignaturePadding.Pkcs1);
        using var cert = request.CreateSelfSigned(DateTimeOffset.UtcNow.AddDays(-1), DateTimeOffset.UtcNow.AddDays(30));
        return cert.Export(X509ContentType.Pfx, "fixture-only");
    }

    /// <summary>Asserts that no part of <paramref name="secret"/> longer than its well-known prefix appears in <paramref name="text"/>.</summary>
    public static void AssertNotLeaked(string secret, string? text)
    {
        if (text is null)
        {
            return;
        }

        // Any 12-character window of the secret would identify it.
        for (var i = 0; i + 12 <= secret.Length; i++)
        {
            Assert.DoesNotContain(secret.Substring(i, 12), text, StringComparison.Ordinal);
        }
    }

    public static IEnumerable<string> Hits(string path, string content) =>
        SecretScanner.ScanText(path, content).Select(h => $"{h.Kind}@{h.Line}");
}
