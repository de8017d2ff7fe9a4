using System.Text;

namespace Readiness.Rendering;

/// <summary>
/// Text from an inspected repository (file names, messages quoting its files) is untrusted. Characters a terminal
/// or a browser would interpret or hide are shown as visible escapes, so that no renderer passes terminal escapes,
/// NULs, bidirectional overrides or invisible characters through (<see cref="SafeText"/> is the public face).
/// </summary>
internal static class UntrustedText
{
    /// <summary>
    /// Shows C0 controls (but LF; tab becomes a space), DEL, C1 controls, zero-width characters, the bidirectional
    /// embeddings, overrides, isolates and marks (Unicode UAX #9), line/paragraph separators and a zero-width no-break
    /// space as <c>\xHH</c> or <c>\uHHHH</c>; drops CR.
    /// </summary>
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
                    if (IsUnsafe(c))
                    {
                        builder.Append(c <= '\u00ff' ? $"\\x{(int)c:X2}" : $"\\u{(int)c:X4}");
                    }
                    else
                    {
                        builder.Append(c);
                    }

                    break;
            }
        }

        return builder.ToString();
    }

    /// <summary>
    /// <see cref="Clean"/>, then every line break folded into one space: for one-line places, where text holding a
    /// line break must never start a line of its own.
    /// </summary>
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
            if (c != '\n' && IsUnsafe(c))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>True for what <see cref="Clean"/> escapes (line feed aside).</summary>
    public static bool IsUnsafe(char c) =>
        char.IsControl(c)
            || c is (>= '\u200b' and <= '\u200f') or (>= '\u202a' and <= '\u202e') or (>= '\u2066' and <= '\u2069')
                or '\u2028' or '\u2029' or '\ufeff' or '\u061c';
}
