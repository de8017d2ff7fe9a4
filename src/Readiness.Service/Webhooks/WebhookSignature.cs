using System.Security.Cryptography;
using System.Text;

namespace Readiness.Service.Webhooks;

/// <summary>
/// The forge's delivery signature: <c>X-Hub-Signature-256: sha256=HEX</c>, an HMAC-SHA256 of the raw body keyed with
/// the webhook secret (docs.github.com, "Validating webhook deliveries"), compared in constant time.
/// </summary>
public static class WebhookSignature
{
    public const string Header = "X-Hub-Signature-256";
    private const string Prefix = "sha256=";

    /// <summary>The header value for <paramref name="body"/>.</summary>
    public static string Compute(string secret, ReadOnlySpan<byte> body)
    {
        ArgumentNullException.ThrowIfNull(secret);
        var mac = HMACSHA256.HashData(Encoding.UTF8.GetBytes(secret), body);
        return Prefix + Convert.ToHexStringLower(mac);
    }

    /// <summary>Whether <paramref name="header"/> has the signature's form at all (checked before any body is read).</summary>
    public static bool IsWellFormed(string? header) =>
        header is not null && header.StartsWith(Prefix, StringComparison.Ordinal) && header.Length == Prefix.Length + 64
        && !header.AsSpan(Prefix.Length).ContainsAnyExcept("0123456789abcdefABCDEF");

    /// <summary>Whether <paramref name="header"/> is the right signature of <paramref name="body"/>.</summary>
    public static bool Verify(string secret, ReadOnlySpan<byte> body, string? header)
    {
        ArgumentNullException.ThrowIfNull(secret);
        if (header is null || !header.StartsWith(Prefix, StringComparison.Ordinal) || header.Length != Prefix.Length + 64)
        {
            return false;
        }

        Span<byte> given = stackalloc byte[32];
        if (Convert.FromHexString(header.AsSpan(Prefix.Length), given, out _, out var written) != System.Buffers.OperationStatus.Done
            || written != 32)
        {
            return false;
        }

        Span<byte> expected = stackalloc byte[32];
        HMACSHA256.HashData(Encoding.UTF8.GetBytes(secret), body, expected);
        return CryptographicOperations.FixedTimeEquals(expected, given);
    }
}
