namespace Readiness.Core.Secrets;

/// <summary>Binary key containers recognised by name and format.</summary>
public static class KeyFiles
{
    /// <summary>The kind a <c>.snk</c> holding the private key is reported as.</summary>
    public const string StrongNameKeyPair = "strong-name key pair (.snk with the private key)";

    /// <summary>
    /// What a key file holds, or null when it is not a private-key container.
    /// <c>.pfx</c>/<c>.p12</c>: PKCS#12 (RFC 7292), the format for a certificate together with its private key.
    /// <c>.snk</c>: a strong-name key pair is a CryptoAPI PRIVATEKEYBLOB: BLOBHEADER with bType 0x07, then RSAPUBKEY
    /// whose magic at offset 8 is "RSA2" (a public key alone says "RSA1"); BLOBHEADER and RSAPUBKEY structures as
    /// documented for CryptoAPI (wincrypt.h), the offsets from memory and confirmed against .NET's ExportCspBlob in the tests.
    /// </summary>
    public static string? Describe(string path, Func<byte[]?> read)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(read);
        var extension = Path.GetExtension(path).ToLowerInvariant();
        switch (extension)
        {
            case ".pfx" or ".p12":
                return "PKCS#12 file (.pfx/.p12), the container of a certificate and its private key";
            case ".snk":
                var bytes = read();
                return bytes is not null && IsPrivateKeyBlob(bytes) ? StrongNameKeyPair : null;
            default:
                return null;
        }
    }

    /// <summary>True for a CryptoAPI PRIVATEKEYBLOB holding an RSA private key ("RSA2" at offset 8).</summary>
    public static bool IsPrivateKeyBlob(ReadOnlySpan<byte> bytes) =>
        bytes.Length >= 12 && bytes[0] == 0x07 && bytes.Slice(8, 4).SequenceEqual("RSA2"u8);
}
