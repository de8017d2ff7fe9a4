namespace Readiness.Core.Snapshots;

/// <summary>A signature found on a tag or commit. Its presence says nothing of its validity.</summary>
public sealed record SignatureBlock(SignatureKind Kind, string Armored)
{
    private static readonly (string Marker, SignatureKind Kind)[] Markers =
    [
        // git gpg-interface.c; https://git-scm.com/docs/gitformat-signature
        ("-----BEGIN PGP SIGNATURE-----", SignatureKind.Pgp),
        ("-----BEGIN PGP MESSAGE-----", SignatureKind.Pgp),
        ("-----BEGIN SSH SIGNATURE-----", SignatureKind.Ssh),
        ("-----BEGIN SIGNED MESSAGE-----", SignatureKind.X509),
    ];

    /// <summary>Splits an annotated tag's message into its text and the trailing signature block, if any.</summary>
    public static (string Message, SignatureBlock? Signature) SplitTagMessage(string message)
    {
        ArgumentNullException.ThrowIfNull(message);
        var best = -1;
        var kind = SignatureKind.Pgp;
        foreach (var (marker, k) in Markers)
        {
            var at = message.IndexOf(marker, StringComparison.Ordinal);
            if (at >= 0 && (at == 0 || message[at - 1] == '\n') && (best < 0 || at < best))
            {
                best = at;
                kind = k;
            }
        }

        return best < 0 ? (message, null) : (message[..best], new SignatureBlock(kind, message[best..]));
    }

    public static SignatureBlock? FromArmored(string? armored)
    {
        if (string.IsNullOrWhiteSpace(armored))
        {
            return null;
        }

        foreach (var (marker, k) in Markers)
        {
            if (armored.Contains(marker, StringComparison.Ordinal))
            {
                return new SignatureBlock(k, armored);
            }
        }

        return new SignatureBlock(SignatureKind.Pgp, armored);
    }
}
