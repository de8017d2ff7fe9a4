using System.Globalization;
using System.Text;
using System.Xml;

namespace Readiness.Rendering;

/// <summary>
/// Writes characters a format cannot carry as visible <c>\uXXXX</c> text instead of dropping them, so a control
/// character in a repository's file name stays recognisable and never reaches a log or a parser raw.
/// </summary>
internal static class VisibleControls
{
    /// <summary>
    /// Only characters of the XML 1.0 <c>Char</c> production (https://www.w3.org/TR/xml/#charsets: tab, LF, CR and
    /// U+0020 upwards without surrogates, U+FFFE and U+FFFF) stay; well-formed surrogate pairs stay too.
    /// </summary>
    public static string ForXml(string? text)
    {
        if (string.IsNullOrEmpty(text))
        {
            return string.Empty;
        }

        var builder = new StringBuilder(text.Length);
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (i + 1 < text.Length && XmlConvert.IsXmlSurrogatePair(text[i + 1], c))
            {
                builder.Append(c).Append(text[i + 1]);
                i++;
            }
            else if (XmlConvert.IsXmlChar(c))
            {
                builder.Append(c);
            }
            else
            {
                Escape(builder, c);
            }
        }

        return builder.ToString();
    }

    /// <summary>Every control character (C0, DEL, C1) but those in <paramref name="kept"/> becomes <c>\uXXXX</c>.</summary>
    public static string ForLog(string? text, string kept = "")
    {
        if (string.IsNullOrEmpty(text))
        {
            return string.Empty;
        }

        var builder = new StringBuilder(text.Length);
        foreach (var c in text)
        {
            if (char.IsControl(c) && !kept.Contains(c, StringComparison.Ordinal))
            {
                Escape(builder, c);
            }
            else
            {
                builder.Append(c);
            }
        }

        return builder.ToString();
    }

    private static void Escape(StringBuilder builder, char c) =>
        builder.Append("\\u").Append(((int)c).ToString("X4", CultureInfo.InvariantCulture));
}
