using System.Text;

namespace Readiness.Core.Snapshots;

public static class FileTreeExtensions
{
    /// <summary>
    /// Reads a file as text: UTF-8 (with or without BOM), or UTF-16 when it has a UTF-16 BOM. Null when missing.
    /// </summary>
    public static string? ReadText(this IFileTree tree, string path, long maxBytes = FileLimits.DefaultMaxBytes)
    {
        ArgumentNullException.ThrowIfNull(tree);
        var bytes = tree.ReadBytes(path, maxBytes);
        return bytes is null ? null : Decode(bytes);
    }

    public static string Decode(ReadOnlySpan<byte> bytes)
    {
        // The UTF-8 byte-order mark EF BB BF (Unicode 15.0 §23.8). Not written as "\xEF\xBB\xBF"u8: in a C# string
        // \xEF is the character U+00EF, which a u8 literal encodes as two bytes.
        if (bytes.StartsWith((ReadOnlySpan<byte>)[0xEF, 0xBB, 0xBF]))
        {
            return Encoding.UTF8.GetString(bytes[3..]);
        }

        if (bytes.Length >= 2 && bytes[0] == 0xFF && bytes[1] == 0xFE)
        {
            return Encoding.Unicode.GetString(bytes[2..]);
        }

        if (bytes.Length >= 2 && bytes[0] == 0xFE && bytes[1] == 0xFF)
        {
            return Encoding.BigEndianUnicode.GetString(bytes[2..]);
        }

        return Encoding.UTF8.GetString(bytes);
    }

    /// <summary>Paths directly in <paramref name="folder"/> ("" for the root).</summary>
    public static IEnumerable<string> FilesIn(this IFileTree tree, string folder)
    {
        ArgumentNullException.ThrowIfNull(tree);
        var prefix = folder.Length == 0 ? string.Empty : folder.TrimEnd('/') + "/";
        return tree.Paths.Where(p => p.StartsWith(prefix, StringComparison.Ordinal) && p.IndexOf('/', prefix.Length) < 0);
    }
}
