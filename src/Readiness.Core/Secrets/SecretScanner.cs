using Readiness.Core.Snapshots;

namespace Readiness.Core.Secrets;

/// <summary>
/// Scans every tracked file for credentials: key files by name and format, then text files (no NUL byte in the
/// first 8,000 bytes, git's own binary test in xdiff-interface.c) for the <see cref="SecretShapes"/>, and
/// nuget.config files for stored credentials. Text in UTF-16 without a byte-order mark is recognised by its NUL
/// pattern and scanned. Files above <see cref="FileLimits.ScanMaxBytes"/> are listed, not read: the check then
/// cannot pass.
/// </summary>
public static class SecretScanner
{
    public const int BinaryProbeBytes = 8000;

    public static SecretScanResult Scan(IFileTree files, long maxBytes = FileLimits.ScanMaxBytes)
    {
        ArgumentNullException.ThrowIfNull(files);
        var hits = new List<SecretHit>();
        var tooLarge = new List<string>();
        var notes = new List<string>();
        int text = 0, binary = 0;
        foreach (var path in files.Paths)
        {
            var size = files.SizeOf(path) ?? 0;
            if (KeyFiles.Describe(path, () => size <= maxBytes ? files.ReadBytes(path, maxBytes) : null) is { } keyFile)
            {
                hits.Add(new SecretHit(path, null, keyFile, "the file's name and format"));
                binary++;
                continue;
            }

            // Each file is read whole, one at a time, so that a secret cannot hide in a file merely for its size; only
            // beyond the bound is a file listed as not scanned.
            var limit = maxBytes;
            if (size > limit)
            {
                tooLarge.Add(path);
                continue;
            }

            var bytes = files.ReadBytes(path, limit);
            if (bytes is null)
            {
                continue;
            }

            var utf16 = Utf16WithoutMark(bytes);
            if (utf16 is null && IsBinary(bytes))
            {
                binary++;
                continue;
            }

            text++;
            var content = utf16 is null ? FileTreeExtensions.Decode(bytes) : utf16.GetString(bytes);
            hits.AddRange(ScanText(path, content));
            if (NuGetConfigCredentials.IsNuGetConfig(path))
            {
                hits.AddRange(NuGetConfigCredentials.Find(path, content, notes));
            }
        }

        return new SecretScanResult(hits, text, binary, tooLarge, notes);
    }

    /// <summary>A NUL byte among the first 8,000 bytes marks a binary file (git: xdiff-interface.c, buffer_is_binary).</summary>
    public static bool IsBinary(ReadOnlySpan<byte> bytes) =>
        bytes[..Math.Min(bytes.Length, BinaryProbeBytes)].Contains((byte)0)
        && !(bytes.Length >= 2 && ((bytes[0] == 0xFF && bytes[1] == 0xFE) || (bytes[0] == 0xFE && bytes[1] == 0xFF)));

    /// <summary>
    /// UTF-16 text without a byte-order mark, told from binary as the Unicode standard's guidance for unmarked UTF-16
    /// suggests (Unicode 15.0 §3.10, D98): mostly-ASCII text has a NUL in every second byte, on one side only.
    /// Returns the encoding (little- or big-endian), or null when the probe does not look like that.
    /// </summary>
    public static System.Text.Encoding? Utf16WithoutMark(ReadOnlySpan<byte> bytes)
    {
        var probe = bytes[..Math.Min(bytes.Length, BinaryProbeBytes)];
        if (probe.Length < 4 || probe.Length % 2 != 0 || !probe.Contains((byte)0))
        {
            return null;
        }

        int evenNul = 0, oddNul = 0;
        for (var i = 0; i < probe.Length; i++)
        {
            if (probe[i] == 0)
            {
                if (i % 2 == 0)
                {
                    evenNul++;
                }
                else
                {
                    oddNul++;
                }
            }
        }

        var half = probe.Length / 2;
        return oddNul * 10 >= half * 9 && evenNul == 0 ? System.Text.Encoding.Unicode
            : evenNul * 10 >= half * 9 && oddNul == 0 ? System.Text.Encoding.BigEndianUnicode
            : null;
    }

    /// <summary>The texts every shape matches in <paramref name="content"/> (whole match and body), placeholders left out.</summary>
    public static IEnumerable<string> MatchedValues(string content)
    {
        ArgumentNullException.ThrowIfNull(content);
        foreach (var (_, match) in Matches(content))
        {
            yield return match.Value;
            var body = match.Groups["body"];
            if (body.Success && body.Length >= 16)
            {
                yield return body.Value;
            }
        }
    }

    /// <summary>Every shape match in one text, with its line; placeholders are left out.</summary>
    public static IEnumerable<SecretHit> ScanText(string path, string content)
    {
        ArgumentNullException.ThrowIfNull(content);
        foreach (var (shape, match) in Matches(content))
        {
            var line = content.AsSpan(0, match.Index).Count('\n') + 1;
            yield return new SecretHit(path, line, shape.Name, shape.Source);
        }
    }

    /// <summary>Each shape's matches whose body looks random (a private key block always counts): placeholders are left out.</summary>
    private static IEnumerable<(SecretShape Shape, System.Text.RegularExpressions.Match Match)> Matches(string content)
    {
        foreach (var shape in SecretShapes.All)
        {
            if (!shape.Prefixes.Any(p => content.Contains(p, StringComparison.Ordinal)))
            {
                continue;
            }

            foreach (var match in shape.Pattern.Matches(content).Cast<System.Text.RegularExpressions.Match>())
            {
                var body = match.Groups["body"];
                if (!body.Success || shape.Id == "private-key" || SecretShape.LooksRandom(body.Value))
                {
                    yield return (shape, match);
                }
            }
        }
    }
}
