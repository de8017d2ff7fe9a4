using System.Text;

using Markdig;
using Markdig.Extensions.Tables;
using Markdig.Extensions.TaskLists;
using Markdig.Renderers.Html;
using Markdig.Syntax;
using Markdig.Syntax.Inlines;

using Readiness.Core.Reports;

namespace Readiness.Rendering.Tests;

/// <summary>
/// The Markdown is read back with Markdig, a CommonMark/GFM reference implementation, with every advanced extension
/// and raw HTML enabled, so that any construct the escaping failed to neutralise shows up as a node.
/// </summary>
public sealed class MarkdownRendererTests
{
    private static readonly MarkdownPipeline Reference = new MarkdownPipelineBuilder().UseAdvancedExtensions().Build();

    private static MarkdownDocument Parse(Report report) =>
        Markdown.Parse(SampleReports.Render(new MarkdownRenderer(), report), Reference);

    /// <summary>The text a reader sees in an inline container: literals, code, and line breaks as '\n'.</summary>
    private static string Text(ContainerInline? container)
    {
        var text = new StringBuilder();
        foreach (var inline in container?.Descendants<Inline>() ?? [])
        {
            switch (inline)
            {
                case LiteralInline literal:
                    text.Append(literal.Content.ToString());
                    break;
                case CodeInline code:
                    text.Append(code.Content);
                    break;
                case LineBreakInline:
                    text.Append('\n');
                    break;
            }
        }

        return text.ToString();
    }

    private static string CellText(TableCell cell) =>
        string.Join(' ', cell.Descendants<ParagraphBlock>().Select(p => Text(p.Inline)));

    [Fact]
    public void FirstLine_IsTheHiddenMarkerComment()
    {
        var markdown = SampleReports.Render(new MarkdownRenderer(), SampleReports.Demo());
        var document = Markdown.Parse(markdown, Reference);

        Assert.StartsWith("<!-- readiness-report -->\n", markdown, StringComparison.Ordinal);
        // CommonMark 0.31.2 §4.6: a line starting with "<!--" opens an HTML block of type 2 (a comment), which
        // renderers that allow HTML pass through and browsers do not display.
        var marker = Assert.IsType<HtmlBlock>(document[0]);
        Assert.Equal(HtmlBlockType.Comment, marker.Type);
    }

    [Fact]
    public void DemoReport_TableHasAHeaderAndOneRowPerResult()
    {
        var report = SampleReports.Demo();
        var table = Assert.Single(Parse(report).Descendants<Table>());
        var rows = table.OfType<TableRow>().ToList();

        Assert.Single(rows, r => r.IsHeader);
        Assert.Equal(report.Results.Count + 1, rows.Count);
        Assert.All(rows, r => Assert.Equal(6, r.Count));
        Assert.Equal(["status", "severity", "check", "package", "message", "where"], rows[0].Cast<TableCell>().Select(CellText));
        var first = rows[1].Cast<TableCell>().Select(CellText).ToList();
        Assert.Equal(["❌ fail", "block", "changelog.has-entry", "Bramble.Sketches"], first.Take(4));
        Assert.Equal("CHANGELOG.md:7", first[5]);
    }

    [Fact]
    public void DemoReport_TableRowsFollowReportImportance()
    {
        var report = SampleReports.Demo();
        var rows = Assert.Single(Parse(report).Descendants<Table>()).OfType<TableRow>().Skip(1);

        var checks = rows.Select(r => CellText((TableCell)r[2]) + "|" + CellText((TableCell)r[3]));
        Assert.Equal(report.ByImportance().Select(r => r.Check + "|" + r.Package), checks);
    }

    [Fact]
    public void DemoReport_ManualItemsAreTaskListItems()
    {
        var tasks = Parse(SampleReports.Demo()).Descendants<TaskList>().ToList();

        Assert.Equal(2, tasks.Count);
        var open = Assert.Single(tasks, t => !t.Checked);
        var done = Assert.Single(tasks, t => t.Checked);
        Assert.StartsWith("The library was called 1,000 times", Text(open.Parent).Trim(), StringComparison.Ordinal);
        Assert.Contains("(manual.memory-stable)", Text(open.Parent), StringComparison.Ordinal);
        Assert.Contains("(manual.host-smoke-test)", Text(done.Parent), StringComparison.Ordinal);
    }

    [Fact]
    public void DemoReport_HasOneSectionPerFailureOrError()
    {
        var report = SampleReports.Demo();
        var headings = Parse(report).Descendants<HeadingBlock>().Where(h => h.Level == 3).Select(h => Text(h.Inline)).ToList();

        var expected = report.ByImportance()
            .Where(r => r.Status is CheckStatus.Fail or CheckStatus.Error)
            .Select(r => r.Package is null ? r.Check : $"{r.Check} — {r.Package}");
        Assert.Equal([.. expected, "Manual items", "Notes"], headings);
    }

    [Fact]
    public void DemoReport_FailureSectionLinksItsStandard()
    {
        var document = Parse(SampleReports.Demo());
        var links = document.Descendants<LinkInline>().ToList();

        var changelog = Assert.Single(links, l => l.Url == "https://keepachangelog.com/en/1.1.0/");
        Assert.Equal("Keep a Changelog 1.1.0", Text(changelog));
        Assert.Contains(links, l => l.Url == "https://semver.org/spec/v2.0.0.html");
        Assert.All(links, l => Assert.StartsWith("https://", l.Url, StringComparison.Ordinal));
        Assert.Contains(document.Descendants<ParagraphBlock>(), p => Text(p.Inline) == "Fix: Move the entries under a heading \"## [2.4.0] - 2026-11-20\".");
    }

    [Fact]
    public void HostileText_ProducesNoHtmlLinkImageOrAttributeNode()
    {
        var document = Parse(SampleReports.Hostile());

        Assert.Single(document.Descendants<HtmlBlock>()); // the marker comment only
        Assert.Empty(document.Descendants<HtmlInline>());
        Assert.Empty(document.Descendants<AutolinkInline>());
        Assert.DoesNotContain(document.Descendants<LinkInline>(), l => l.IsImage);
        // Bare addresses may be autolinked by GFM renderers; nothing but http(s) may ever become a link.
        Assert.All(document.Descendants<LinkInline>(), l => Assert.True(
            l.Url!.StartsWith("https://", StringComparison.Ordinal) || l.Url.StartsWith("http://", StringComparison.Ordinal), l.Url));
        Assert.DoesNotContain(document.Descendants<ListBlock>(), l => l.IsOrdered);
        Assert.DoesNotContain(document.Descendants<Block>(), b => b.GetAttributes().Properties?.Count > 0);
        Assert.DoesNotContain(document.Descendants<Inline>(), i => i.GetAttributes().Properties?.Count > 0);
    }

    [Fact]
    public void HostileText_ReadsBackAsTheSameLiteralText()
    {
        var report = SampleReports.Hostile();
        var document = Parse(report);
        var rows = Assert.Single(document.Descendants<Table>()).OfType<TableRow>().Skip(1).ToList();

        Assert.Equal(report.Results.Count, rows.Count);
        Assert.All(rows, r => Assert.Equal(6, r.Count));
        foreach (var (row, result) in rows.Zip(report.ByImportance()))
        {
            var cells = row.Cast<TableCell>().Select(CellText).ToList();
            Assert.Equal(result.Check, cells[2]);
            Assert.Equal(result.Package ?? string.Empty, cells[3]);
            Assert.Equal(Flatten(result.Message), cells[4]);
            Assert.Equal(string.Join(", ", result.Evidence.Select(e => e.ToString().Replace("\u001b", "\\x1B", StringComparison.Ordinal).Replace("\u0007", "\\x07", StringComparison.Ordinal))), cells[5]);
        }

        var secrets = report.Results[0];
        var paragraphs = document.Descendants<ParagraphBlock>().Select(p => Text(p.Inline)).ToList();
        // Line breaks survive as hard breaks; "---" and "1." stay text instead of a rule and a list.
        Assert.Contains(secrets.Message, paragraphs);
        Assert.Contains("Fix: " + secrets.Hint, paragraphs);
        Assert.Contains("Standard: Click <me>", paragraphs);
        Assert.Contains(paragraphs, p => p.StartsWith("Version 1.0.0 | x · tag v1<script> · commit 3f9c2a7 · checklist check**list**", StringComparison.Ordinal));
        var manual = Assert.Single(document.Descendants<TaskList>());
        Assert.Equal($"{report.Results[1].Title} ({report.Results[1].Check}) block", Text(manual.Parent).Trim());
        var note = document.Descendants<ListItemBlock>().Last();
        Assert.Equal(report.Notes[0], Text(note.Descendants<ParagraphBlock>().Single().Inline));
    }

    [Fact]
    public void PipeAndNewlineInACell_DoNotAddColumnsOrRows()
    {
        var result = new CheckResult("changelog.links", "Links", CheckStatus.Fail, Severity.Info, "a|b", "one | two\nthree | four", null, [new Evidence("x|y.md", 2)], new StandardReference("s", "https://git.example/bramblecote/s"));
        var report = new Report(SampleReports.Subject, true, ReportSummary.From([result], 0), [result], SampleReports.GeneratedAt, []);

        var rows = Assert.Single(Parse(report).Descendants<Table>()).OfType<TableRow>().ToList();

        Assert.Equal(2, rows.Count);
        var cells = rows[1].Cast<TableCell>().Select(CellText).ToList();
        Assert.Equal(["❌ fail", "info", "changelog.links", "a|b", "one | two three | four", "x|y.md:2"], cells);
    }

    [Fact]
    public void ManualItemConfirmedByAPerson_IsTicked()
    {
        var report = SampleReports.Demo();

        var ticked = Parse(report).Descendants<TaskList>().Where(t => t.Checked).Select(t => Text(t.Parent)).ToList();

        // The engine turns a confirmed manual item into a pass of manual.<id> (ChecklistEngine).
        var confirmed = report.Results.Where(r => r.Check.StartsWith("manual.", StringComparison.Ordinal) && r.Status == CheckStatus.Pass);
        Assert.Equal(confirmed.Select(r => $"{r.Title} ({r.Check})"), ticked.Select(t => t.Trim()));
    }

    [Fact]
    public void Footer_NamesSchemaAndTime()
    {
        var markdown = SampleReports.Render(new MarkdownRenderer(), SampleReports.Demo());

        Assert.EndsWith("\n---\n\n_Readiness report \\(schema readiness-report/1\\), generated 2026-11-20 12:30:00 UTC._\n", markdown, StringComparison.Ordinal);
    }

    private static string Flatten(string text) =>
        string.Join(' ', text.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));
}
