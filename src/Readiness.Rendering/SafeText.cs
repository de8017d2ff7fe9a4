using System.Net;

namespace Readiness.Rendering;

/// <summary>
/// The one way untrusted text (file names, values and messages that quote an inspected repository) reaches each
/// output. Every function first shows control characters, line breaks inside one-line places, bidirectional
/// overrides and isolates and zero-width characters as visible escapes (<c>\x1B</c>, <c>\n</c>, <c>\u202E</c>),
/// then applies the output's own quoting.
/// </summary>
public static class SafeText
{
    /// <summary>One line for a terminal or a log: nothing in it is interpreted by a terminal.</summary>
    public static string Terminal(string? text) => UntrustedText.OneLine(text);

    /// <summary>One line of inert Markdown (CommonMark): escapes, then Markdown's own punctuation escaped.</summary>
    public static string Markdown(string? text) => MarkdownText.Inline(text);

    /// <summary>One line of HTML text or attribute content: escapes, then HTML-encoded.</summary>
    public static string Html(string? text) => WebUtility.HtmlEncode(UntrustedText.OneLine(text));

    /// <summary>A JSON string's content (before JSON's own escaping): escapes applied, line breaks kept as data.</summary>
    public static string Json(string? text) => UntrustedText.Clean(text);
}
