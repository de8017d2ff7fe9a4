using System.Security.Cryptography;

using Readiness.Core.Reports;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Checks.Signing;

/// <summary>
/// The <c>allowed-signers</c> file as read from the inspected commit, and the line that lists a given key.
/// Format: <c>principals [options] keytype base64-key [comment]</c> (ssh-keygen(1), ALLOWED SIGNERS).
/// </summary>
public sealed record AllowedSigners(string Path, string Content)
{
    /// <summary>The file the configuration names, read from the snapshot; null when none is configured.</summary>
    /// <returns>The file, or a finding explaining why it cannot be used.</returns>
    public static (AllowedSigners? File, Finding? Problem) Load(CheckContext context, string? package)
    {
        ArgumentNullException.ThrowIfNull(context);
        var configured = context.Parameters.String("allowed-signers");
        if (string.IsNullOrWhiteSpace(configured))
        {
            return (null, null);
        }

        var mark = context.Parameters.Node("allowed-signers")!.Mark;
        var path = RepoPath.TryNormalize(configured);
        var text = path is null ? null : context.Snapshot.Files.ReadText(path, 1024 * 1024);
        if (text is null)
        {
            return (null, Finding.Fail(
                $"allowed-signers names {configured} ({mark}), which does not exist at this commit.",
                "Commit the allowed-signers file (one line per signer: principal, key type, public key) or fix the path.",
                package,
                new Evidence(mark.File, mark.Line)));
        }

        return (new AllowedSigners(path!, text), null);
    }

    /// <summary>The 1-based line whose key has the OpenSSH fingerprint <paramref name="fingerprint"/> (<c>SHA256:…</c>).</summary>
    public int? LineOf(string? fingerprint)
    {
        if (string.IsNullOrEmpty(fingerprint))
        {
            return null;
        }

        var lines = Content.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            foreach (var word in lines[i].Split([' ', '\t'], StringSplitOptions.RemoveEmptyEntries))
            {
                if (word.Length >= 16 && Fingerprint(word) is { } f && string.Equals(f, fingerprint, StringComparison.Ordinal))
                {
                    return i + 1;
                }
            }
        }

        return null;
    }

    /// <summary>
    /// The OpenSSH SHA-256 fingerprint of a base64 public key blob: <c>SHA256:</c> + unpadded base64 of the blob's
    /// SHA-256 (the form <c>ssh-keygen -l</c> prints since OpenSSH 6.8), or null when the word is not base64.
    /// </summary>
    public static string? Fingerprint(string base64Key)
    {
        ArgumentNullException.ThrowIfNull(base64Key);
        var buffer = new byte[base64Key.Length];
        if (!Convert.TryFromBase64String(base64Key, buffer, out var written) || written < 16)
        {
            return null;
        }

        return "SHA256:" + Convert.ToBase64String(SHA256.HashData(buffer.AsSpan(0, written))).TrimEnd('=');
    }
}
