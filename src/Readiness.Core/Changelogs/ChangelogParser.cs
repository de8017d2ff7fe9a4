using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;

using Markdig;
using Markdig.Syntax;
using Markdig.Syntax.Inlines;

using NuGet.Versioning;

namespace Readiness.Core.Changelogs;

/// <summary>
/// Reads a Markdown changelog into release sections, with Markdig (CommonMark: headings inside code blocks are not
/// headings; ATX and setext headings both count).
/// </summary>
/// <remarks>
/// Release headings accepted (Keep a Changelog 1.1.0 is the reference; https://keepachangelog.com/en/1.1.0/):
/// <list type="bullet">
/// <item><c>## [Unreleased]</c> or <c>## Unreleased</c> (any case);</item>
/// <item><c>## [1.1.1] - 2023-03-05</c> (the example file's form), <c>## 1.1.1 - 2023-03-05</c> (its yanked example's form),
/// a bracketed version that is an inline link (<c>## [1.1.1](https://...) - 2023-03-05</c>);</item>
/// <item>a trailing <c>[YANKED]</c> (any case), as in <c>## 0.0.5 - 2014-12-13 [YANKED]</c>;</item>
/// <item>tolerated beyond the standard (common practice, no published source): a <c>v</c> before the version,
/// an en or em dash instead of <c>-</c>, the date in parentheses (<c>## v1.1.1 (2023-03-05)</c>), and a version
/// with no date at all (read as undated).</item>
/// </list>
/// The version must parse as a NuGet version; any other text after the version makes the heading a non-release
/// heading. Release headings are read at the shallowest level (1 to 3) where one occurs: level 2 in Keep a Changelog.
/// A date is read only when it is exactly <c>YYYY-MM-DD</c> and a real calendar date; otherwise the text is kept.
/// </remarks>
public static partial class ChangelogParser
{
    private static readonly MarkdownPipeline Pipeline = new MarkdownPipelineBuilder().Build();

    private static readonly string[] PlainDates = ["d MMM yyyy", "d MMMM yyyy", "MMM d, yyyy", "MMMM d, yyyy", "yyyy/MM/dd", "yyyy.MM.dd"];

    /// <summary>
    /// A plain-text changelog (.txt, .rst, no extension) as Markdown: a line that is only a version, optionally after
    /// "Version"/"Release" and followed by a date (<c>1.2.3 (2026-01-31)</c>, <c>Version 1.2.3</c>,
    /// <c>12.1.1 - 3 Dec 2025</c>), becomes a level-2 heading; every other line stays as it is.
    /// </summary>
    public static string PlainTextAsMarkdown(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var lines = text.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            var line = lines[i].TrimEnd('\r').Trim();
            if (line.Length > 0 && line.Length < 200 && (VersionHeading().IsMatch(line) || UnreleasedHeading().IsMatch(line)))
            {
                lines[i] = "## " + line;
            }
            else if (line.Length > 0 && line.All(c => c is '=' or '-' or '~' or '^' or '*'))
            {
                lines[i] = string.Empty; // an reStructuredText underline
            }
        }

        return string.Join('\n', lines);
    }

    [GeneratedRegex(@"^\[?unreleased\]?$", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex UnreleasedHeading();

    [GeneratedRegex(
        @"^(?:version\s+|release\s+)?(?:\[(?<version>[vV]?[0-9][^\]\s]*)\]|(?<version>[vV]?[0-9][^\s\[\]()]*))"
        + @"(?:\s+[-\u2013\u2014]\s*(?<date>.*?)|\s*\((?<date>[^)]*)\))?"
        + @"(?:\s*\[(?<yanked>yanked)\])?\s*$",
        RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex VersionHeading();

    [GeneratedRegex(@"^[0-9]{4}-[0-9]{2}-[0-9]{2}$", RegexOptions.CultureInvariant)]
    private static partial Regex IsoDate();

    /// <summary>Parses <paramref name="text"/>; throws <see cref="InvalidDataException"/> when Markdig refuses it.</summary>
    public static ChangelogDocument Parse(string text) =>
        TryParse(text, out var document, out var error) ? document! : throw new InvalidDataException(error);

    /// <summary>
    /// Parses <paramref name="text"/>, or says why not: Markdig refuses input nested deeper than its depth limit
    /// (thousands of '&gt;', '[' or list levels) with an <see cref="ArgumentException"/> (seen with Markdig 1.6.0).
    /// </summary>
    public static bool TryParse(string text, out ChangelogDocument? changelog, out string? error)
    {
        ArgumentNullException.ThrowIfNull(text);
        MarkdownDocument document;
        try
        {
            document = Markdown.Parse(text.TrimStart('\uFEFF'), Pipeline);
        }
        catch (ArgumentException e)
        {
            (changelog, error) = (null, $"Markdown could not be parsed: {e.Message}");
            return false;
        }

        changelog = FromDocument(document);
        error = null;
        return true;
    }

    private static ChangelogDocument FromDocument(MarkdownDocument document)
    {
        var links = new List<ChangelogLink>();
        var blocks = new List<Block>();
        foreach (var block in document)
        {
            if (block is LinkReferenceDefinitionGroup group)
            {
                links.AddRange(group.OfType<LinkReferenceDefinition>()
                    .Select(d => new ChangelogLink(d.Label ?? string.Empty, d.Url ?? string.Empty, d.Line + 1)));
            }
            else
            {
                blocks.Add(block);
            }
        }

        links.Sort((a, b) => a.Line.CompareTo(b.Line));
        var level = blocks.OfType<HeadingBlock>()
            .Where(h => h.Level <= 3 && Read(h) is not null)
            .Select(h => (int?)h.Level)
            .Min();
        return new ChangelogDocument(level is { } l ? Sections(blocks, l) : [], links, level);
    }

    private static List<ChangelogSection> Sections(List<Block> blocks, int level)
    {
        var sections = new List<ChangelogSection>();
        Builder? current = null;
        foreach (var block in blocks)
        {
            if (block is HeadingBlock heading && heading.Level <= level)
            {
                if (current is not null)
                {
                    sections.Add(current.Build());
                }

                current = heading.Level == level && Read(heading) is { } read ? new Builder(read, heading.Line + 1) : null;
                continue;
            }

            if (current is null)
            {
                continue;
            }

            switch (block)
            {
                case HeadingBlock sub:
                    current.ChangeTypes.Add(Flatten(sub).Text.Trim());
                    break;
                case ListBlock list:
                    current.Entries += list.Count;
                    break;
                case ParagraphBlock:
                    current.Paragraphs++;
                    break;
            }
        }

        if (current is not null)
        {
            sections.Add(current.Build());
        }

        return sections;
    }

    private static HeadingRead? Read(HeadingBlock heading)
    {
        var (text, link, linkLine) = Flatten(heading);
        text = text.Trim();
        if (UnreleasedHeading().IsMatch(text))
        {
            return new HeadingRead(text, null, null, null, false, link, linkLine);
        }

        var match = VersionHeading().Match(text);
        if (!match.Success || !NuGetVersion.TryParse(match.Groups["version"].Value.TrimStart('v', 'V'), out _))
        {
            return null;
        }

        var dateText = match.Groups["date"].Success ? match.Groups["date"].Value.Trim() : null;
        DateOnly? date = null;
        if (dateText is { Length: > 0 } && IsoDate().IsMatch(dateText)
            && DateOnly.TryParseExact(dateText, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out var parsed))
        {
            date = parsed;
        }
        else if (dateText is { Length: > 0 }
            && DateOnly.TryParseExact(dateText, PlainDates, CultureInfo.InvariantCulture, DateTimeStyles.AllowWhiteSpaces, out var plain))
        {
            // A plain-text changelog's spelled-out date ("3 Dec 2025"): the day is known, only the form is not ISO.
            date = plain;
        }

        return new HeadingRead(
            text,
            match.Groups["version"].Value,
            dateText is { Length: > 0 } ? dateText : null,
            date,
            match.Groups["yanked"].Success,
            link,
            linkLine);
    }

    /// <summary>The heading's text with links written as <c>[text]</c>, and the first resolved link's target.</summary>
    private static (string Text, string? Link, int? LinkLine) Flatten(HeadingBlock heading)
    {
        var text = new StringBuilder();
        string? link = null;
        int? linkLine = null;
        if (heading.Inline is { } inline)
        {
            Append(inline, text, ref link, ref linkLine);
        }

        return (text.ToString(), link, linkLine);
    }

    private static void Append(Inline inline, StringBuilder text, ref string? link, ref int? linkLine)
    {
        switch (inline)
        {
            case LiteralInline literal:
                text.Append(literal.Content.ToString());
                break;
            case CodeInline code:
                text.Append(code.Content);
                break;
            case AutolinkInline auto:
                text.Append(auto.Url);
                break;
            case LineBreakInline:
                text.Append(' ');
                break;
            case LinkInline { IsImage: false } anchor:
                if (link is null && !string.IsNullOrEmpty(anchor.Url))
                {
                    link = anchor.Url;
                    linkLine = anchor.Reference is { } reference ? reference.Line + 1 : null;
                }

                text.Append('[');
                AppendChildren(anchor, text, ref link, ref linkLine);
                text.Append(']');
                break;
            case ContainerInline container:
                AppendChildren(container, text, ref link, ref linkLine);
                break;
        }
    }

    private static void AppendChildren(ContainerInline container, StringBuilder text, ref string? link, ref int? linkLine)
    {
        foreach (var child in container)
        {
            Append(child, text, ref link, ref linkLine);
        }
    }

    private sealed record HeadingRead(
        string Heading, string? Version, string? DateText, DateOnly? Date, bool Yanked, string? Link, int? LinkLine);

    private sealed class Builder(HeadingRead read, int line)
    {
        public int Entries { get; set; }

        public int Paragraphs { get; set; }

        public List<string> ChangeTypes { get; } = [];

        public ChangelogSection Build() => new(
            read.Heading, read.Version, read.DateText, read.Date, read.Yanked, line, Entries, Paragraphs,
            ChangeTypes.ToArray(), read.Link, read.LinkLine);
    }
}
