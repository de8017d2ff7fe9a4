using Readiness.Core.Snapshots;

namespace Readiness.Core.Secrets;

/// <summary>
/// Scans every tracked file for credentials: key files by name and format, then text files (no NUL byte in the
/// first 8,000 bytes, git's own binary test in xdiff-interface.c) for the <see cref="SecretShapes"/>, and
/// nuget.config files for stored credentials. Files above <see cref="FileLimits.ScanMaxBytes"/> are listed, not read.
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

            if (size > maxBytes)
            {
                tooLarge.Add(path);
                continue;
            }

            var bytes = files.ReadBytes(path, maxBytes);
            if (bytes is null)
            {
                continue;
            }

            if (IsBinary(bytes))
            {
                binary++;
                continue;
            }

            text++;
            var content = FileTreeExtensions.Decode(bytes);
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

    /// <summary>Every shape match in one text, with its line; placeholders are left out.</summary>
    public static IEnumerable<SecretHit> ScanText(string path, string content)
    {
        ArgumentNullException.ThrowIfNull(content);
        foreach (var shape in SecretShapes.All)
        {
            if (!shape.Prefixes.Any(p => content.Contains(p, StringComparison.Ordinal)))
            {
                continue;
            }

            foreach (var match in shape.Pattern.Matches(content).Cast<System.Text.RegularExpressions.Match>())
            {
                var body = match.Groups["body"];
                if (body.Success && shape.Id != "private-key" && !SecretShape.LooksRandom(body.Value))
                {
                    continue;
                }

                var line = content.AsSpan(0, match.Index).Count('\n') + 1;
                yield return new SecretHit(path, line, shape.Name, shape.Source);
            }
        }
    }
}
