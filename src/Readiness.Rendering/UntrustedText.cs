using System.Text;

namespace Readiness.Rendering;

/// <summary>
/// Text from an inspected repository (file names, messages quoting its files) is untrusted. Control characters
/// other than line feed are replaced so that no renderer passes terminal escapes or NULs through.
/// </summary>
internal static class UntrustedText
{
    public const char Replacement = '\uFFFD';

    /// <summary>Replaces C0 controls (but LF; tab becomes a space), DEL and C1 controls; drops CR.</summary>
    public static string Clean(string? text)
    {
        if (string.IsNullOrEmpty(text))
        {
            return string.Empty;
        }

        if (!NeedsCleaning(text))
        {
            return text;
        }

        var builder = new StringBuilder(text.Length);
        foreach (var c in text)
        {
            switch (c)
            {
                case '\n':
                    builder.Append(c);
                    break;
                case '\r':
                    break;
                case '\t':
                    builder.Append(' ');
                    break;
                default:
                    builder.Append(char.IsControl(c) ? Replacement : c);
                    break;
            }
        }

        return builder.ToString();
    }

    /// <summary><see cref="Clean"/>, then every line break folded into one space: for one-line places.</summary>
    public static string OneLine(string? text)
    {
        var clean = Clean(text);
        if (!clean.Contains('\n', StringComparison.Ordinal))
        {
            return clean.Trim();
        }

        return string.Join(' ', clean.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));
    }

    /// <summary><see cref="Clean"/>, split into trimmed non-empty lines.</summary>
    public static IReadOnlyList<string> Lines(string? text) =>
        Clean(text).Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);

    private static bool NeedsCleaning(string text)
    {
        foreach (var c in text)
        {
            if (c != '\n' && char.IsControl(c))
            {
                return true;
            }
        }

        return false;
    }
}
