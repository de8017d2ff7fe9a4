using System.Text;

namespace Readiness.Rendering;

/// <summary>
/// Makes untrusted text inert in Markdown: every character that can open a CommonMark/GFM construct, or one of the
/// extensions the HTML page enables, is backslash-escaped (CommonMark 0.31.2 §2.4: any ASCII punctuation character may
/// be backslash-escaped), so a file name such as <c>](javascript:x)</c> or <c>&lt;script&gt;</c> stays literal text.
/// </summary>
internal static class MarkdownText
{
    /// <summary>
    /// Escaped wherever they appear: links and images <c>[ ] ( ) !</c>, raw HTML, autolinks and block quotes
    /// <c>&lt; &gt;</c>, entities <c>&amp;</c>, emphasis and code <c>* _ `</c>, GFM tables <c>|</c>, and the constructs
    /// of the extensions (strikethrough and subscript <c>~</c>, superscript and footnotes <c>^</c>, inserted <c>+</c>,
    /// marked and setext underlines <c>=</c>, citations <c>"</c>, mathematics <c>$</c>, attributes <c>{ }</c>).
    /// </summary>
    private const string AlwaysEscaped = "\\`*_{}[]()<>!|~^+=\"$&";

    /// <summary>Escaped only at the start of a line: ATX headings, list and thematic-break markers, definition lists.</summary>
    private const string LineStartEscaped = "#-:";

    /// <summary>One line of inert text inside a line: table cells, heading text, emphasis.</summary>
    public static string Inline(string? text) => EscapeLine(UntrustedText.OneLine(text), lineStart: false);

    /// <summary>
    /// One line of inert text that begins a block, such as a list item's text (<c>- # x</c> would be a heading
    /// inside the item, <c>- 1. x</c> a nested list): the line-start constructs are escaped too.
    /// </summary>
    public static string Item(string? text) => EscapeLine(UntrustedText.OneLine(text), lineStart: true);

    /// <summary>
    /// Inert text that keeps its line breaks (as CommonMark hard line breaks: a backslash before the line ending),
    /// for a paragraph of its own. Blank lines are dropped so the text stays one paragraph.
    /// </summary>
    public static string Paragraph(string? text) =>
        string.Join("\\\n", UntrustedText.Lines(text).Select(line => EscapeLine(line, lineStart: true)));

    /// <summary>A link when the target is an absolute http(s) URL, otherwise the plain escaped name.</summary>
    public static string Link(string? name, string? url)
    {
        var label = Inline(name);
        if (!ReportFacts.IsWebUrl(url))
        {
            return label;
        }

        var target = new Uri(url!).AbsoluteUri.Replace("(", "%28", StringComparison.Ordinal).Replace(")", "%29", StringComparison.Ordinal);
        return $"[{(label.Length > 0 ? label : Inline(target))}]({target})";
    }

    private static string EscapeLine(string line, bool lineStart)
    {
        var builder = new StringBuilder(line.Length + 8);
        for (var i = 0; i < line.Length; i++)
        {
            var c = line[i];
            if (AlwaysEscaped.Contains(c, StringComparison.Ordinal)
                || (lineStart && i == 0 && LineStartEscaped.Contains(c, StringComparison.Ordinal))
                || (c == ':' && (Next(line, i) == ':' || Previous(line, i) == ':'))
                || StartsBareLink(line, i)
                || (lineStart && c == '.' && IsOrderedListMarker(line, i)))
            {
                builder.Append('\\');
            }

            builder.Append(c);
        }

        return builder.ToString();
    }

    /// <summary>
    /// GFM extended autolinks (GFM 0.29 §6.9: <c>www.</c>, <c>http://</c>, <c>https://</c>, <c>ftp://</c>, and the
    /// <c>mailto:</c>/<c>tel:</c> forms Markdig adds) are escaped at their colon or first dot. Markdig scans the raw
    /// source for them and would swallow the backslashes of later escapes into the link; GFM renderers that link
    /// them after parsing still do so, and they are only ever web or mail links.
    /// </summary>
    private static bool StartsBareLink(string line, int i) =>
        (line[i] == ':' && (line.AsSpan(i).StartsWith("://", StringComparison.Ordinal)
            || EndsWithWord(line, i, "mailto") || EndsWithWord(line, i, "tel")))
        || (line[i] == '.' && EndsWithWord(line, i, "www"));

    private static bool EndsWithWord(string line, int end, string word) =>
        end >= word.Length
        && line.AsSpan(end - word.Length, word.Length).Equals(word, StringComparison.OrdinalIgnoreCase)
        && (end == word.Length || !char.IsLetterOrDigit(line[end - word.Length - 1]));

    private static char Next(string line, int i) => i + 1 < line.Length ? line[i + 1] : '\0';

    private static char Previous(string line, int i) => i > 0 ? line[i - 1] : '\0';

    /// <summary>CommonMark §5.2: an ordered list marker is 1–9 digits then <c>.</c> or <c>)</c> at the start of a line.</summary>
    private static bool IsOrderedListMarker(string line, int i) =>
        i is > 0 and <= 9 && line.AsSpan(0, i).IndexOfAnyExceptInRange('0', '9') < 0;
}
