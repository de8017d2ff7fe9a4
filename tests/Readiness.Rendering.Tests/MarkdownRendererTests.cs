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

    /// <summary>Each group table under its level-3 heading, with its data rows.</summary>
    private static List<(string Heading, List<TableRow> Rows)> Groups(MarkdownDocument document) =>
        document.Descendants<Table>()
            .Select(t => (Text(((HeadingBlock)document[document.IndexOf(t) - 1]).Inline), t.OfType<TableRow>().Where(r => !r.IsHeader).ToList()))
            .ToList();

    private static IEnumerable<CheckResult> Judged(Report report) =>
        report.ByImportance().Where(r => !r.Check.StartsWith("manual.", StringComparison.Ordinal));

    [Fact]
    public void DemoReport_OneTablePerWeight_EveryJudgedResultInExactlyOneRow()
    {
        var report = SampleReports.Demo();
        var document = Parse(report);
        var tables = document.Descendants<Table>().ToList();

        Assert.All(tables, t => Assert.Equal(["check", "package", "finding", "where"], t.OfType<TableRow>().Single(r => r.IsHeader).Cast<TableCell>().Select(CellText)));
        Assert.All(tables.SelectMany(t => t.OfType<TableRow>()), r => Assert.Equal(4, r.Count));
        var groups = Groups(document);
        Assert.Equal(["Blocking failures (5)", "Warnings (3)", "Not judged (3)", "Passed (10)"], groups.Select(g => g.Heading));
        Assert.Equal(Judged(report).Count(), groups.Sum(g => g.Rows.Count));
        var first = groups[0].Rows[0].Cast<TableCell>().Select(CellText).ToList();
        Assert.Equal(["changelog.has-entry", "Bramble.Sketches"], first.Take(2));
        Assert.Equal("CHANGELOG.md:7", first[3]);
        // No status column and no pictographs: the section says how much a row matters.
        Assert.DoesNotContain("❌", SampleReports.Render(new MarkdownRenderer(), report), StringComparison.Ordinal);
    }

    [Fact]
    public void DemoReport_RowsInEachGroupFollowReportImportance_AndBlockingRowsAreTheBlockingResults()
    {
        var report = SampleReports.Demo();
        var groups = Groups(Parse(report));
        var order = Judged(report).Select(r => r.Check + "|" + r.Package).ToList();

        foreach (var (_, rows) in groups)
        {
            var keys = rows.Select(r => CellText((TableCell)r[0]) + "|" + CellText((TableCell)r[1])).ToList();
            var positions = keys.Select(k => order.IndexOf(k)).ToList();
            Assert.Equal(positions.Order(), positions);
        }

        Assert.Equal(
            report.Results.Where(r => r.IsBlocking).Select(r => r.Check + "|" + r.Package).Order(StringComparer.Ordinal),
            groups[0].Rows.Select(r => CellText((TableCell)r[0]) + "|" + CellText((TableCell)r[1])).Order(StringComparer.Ordinal));
    }

    [Fact]
    public void DemoReport_FailureRowsLinkToTheirDetailSection_AndTheSentenceIsTheSharedWording()
    {
        var report = SampleReports.Demo();
        var document = Parse(report);
        var anchors = document.Descendants<LinkInline>().Where(l => l.Url!.StartsWith('#')).ToList();

        Assert.Equal(report.Results.Count(r => r.Status is CheckStatus.Fail or CheckStatus.Error), anchors.Count);
        Assert.Equal(anchors.Count, anchors.Select(a => a.Url).Distinct().Count());
        Assert.Contains(document.Descendants<ParagraphBlock>(), p => Text(p.Inline) == ReportWording.Sentence(report));
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
        var document = Parse(report);
        var details = document.Descendants<HeadingBlock>().Where(h => h.Level == 4).Select(h => Text(h.Inline)).ToList();

        var expected = report.ByImportance()
            .Where(r => r.Status is CheckStatus.Fail or CheckStatus.Error)
            .Select(r => r.Package is null ? r.Check : $"{r.Check} — {r.Package}");
        Assert.Equal(expected, details);
        Assert.Equal(
            ["Blocking failures (5)", "Warnings (3)", "To confirm (2)", "Not judged (3)", "Passed (10)", "Details", "Notes"],
            document.Descendants<HeadingBlock>().Where(h => h.Level == 3).Select(h => Text(h.Inline)));
    }

    [Fact]
    public void DemoReport_FailureSectionLinksItsStandard()
    {
        var document = Parse(SampleReports.Demo());
        var links = document.Descendants<LinkInline>().ToList();

        var changelog = Assert.Single(links, l => l.Url == "https://keepachangelog.com/en/1.1.0/");
        Assert.Equal("Keep a Changelog 1.1.0", Text(changelog));
        Assert.Contains(links, l => l.Url == "https://semver.org/spec/v2.0.0.html");
        Assert.All(links, l => Assert.True(l.Url!.StartsWith("https://", StringComparison.Ordinal) || l.Url.StartsWith('#'), l.Url));
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
            l.Url!.StartsWith("https://", StringComparison.Ordinal) || l.Url.StartsWith("http://", StringComparison.Ordinal) || l.Url.StartsWith('#'), l.Url));
        Assert.DoesNotContain(document.Descendants<ListBlock>(), l => l.IsOrdered);
        Assert.DoesNotContain(document.Descendants<Block>(), b => b.GetAttributes().Properties?.Count > 0);
        Assert.DoesNotContain(document.Descendants<Inline>(), i => i.GetAttributes().Properties?.Count > 0);
    }

    [Fact]
    public void HostileText_ReadsBackAsTheSameLiteralText()
    {
        var report = SampleReports.Hostile();
        var document = Parse(report);
        var rows = Groups(document).SelectMany(g => g.Rows).ToList();

        Assert.Equal(Judged(report).Count(), rows.Count);
        Assert.All(rows, r => Assert.Equal(4, r.Count));
        var expected = Judged(report).Select(result => string.Join("\n", result.Check, result.Package ?? string.Empty,
            (result.Status == CheckStatus.Error ? "could not judge: " : string.Empty) + Flatten(result.Message),
            string.Join(", ", result.Evidence.Select(e => e.ToString().Replace("\u001b", "\\x1B", StringComparison.Ordinal).Replace("\u0007", "\\x07", StringComparison.Ordinal))))).Order(StringComparer.Ordinal);
        Assert.Equal(expected, rows.Select(r => string.Join("\n", r.Cast<TableCell>().Select(CellText))).Order(StringComparer.Ordinal));

        var secrets = report.Results[0];
        var paragraphs = document.Descendants<ParagraphBlock>().Select(p => Text(p.Inline)).ToList();
        // Line breaks survive as hard breaks; "---" and "1." stay text instead of a rule and a list.
        Assert.Contains(secrets.Message, paragraphs);
        Assert.Contains("Fix: " + secrets.Hint, paragraphs);
        Assert.Contains("Standard: Click <me>", paragraphs);
        Assert.Contains(paragraphs, p => p.StartsWith("Version 1.0.0 | x, tag v1<script>, commit 3f9c2a7, checklist check**list**", StringComparison.Ordinal));
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
        Assert.Equal(["changelog.links", "a|b", "one | two three | four", "x|y.md:2"], cells);
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
