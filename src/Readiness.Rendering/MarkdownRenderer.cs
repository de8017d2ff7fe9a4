using System.Globalization;
using System.Text;

using Readiness.Core.Reports;

namespace Readiness.Rendering;

/// <summary>
/// GitHub-flavoured Markdown for a pull request comment or a file: a hidden marker line (so the service finds and
/// updates its own comment), the verdict, a results table, one section per failure, the manual items as a task list,
/// notes and a footer. Everything that comes from the inspected repository is escaped (<see cref="MarkdownText"/>).
/// </summary>
public sealed class MarkdownRenderer : IReportRenderer
{
    /// <summary>The first line of every Markdown report: an HTML comment, invisible once rendered.</summary>
    public const string Marker = "<!-- readiness-report -->";

    public string Format => "markdown";

    public void Render(Report report, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(output);
        output.Write(Marker);
        output.Write('\n');
        output.Write(RenderBody(report));
    }

    /// <summary>The report without the marker line: the HTML page renders this, with raw HTML disabled.</summary>
    internal static string RenderBody(Report report)
    {
        var md = new MarkdownBuilder();
        md.Line(report.Ready ? "## ✅ Ready" : "## ❌ Not ready");
        md.Blank();
        md.Line(Subject(report.Subject));
        md.Blank();
        var blocking = report.Summary.Blocking;
        md.Line($"**{blocking} blocking** · {ReportFacts.Counts(report.Summary, " · ")}");

        WriteTable(md, report);
        foreach (var result in ReportFacts.Failures(report))
        {
            WriteFailure(md, result);
        }

        WriteManual(md, report);
        if (report.Notes.Count > 0)
        {
            md.Blank();
            md.Line("### Notes");
            md.Blank();
            foreach (var note in report.Notes)
            {
                md.Line("- " + MarkdownText.Item(note));
            }
        }

        md.Blank();
        md.Line("---");
        md.Blank();
        var when = report.GeneratedAt.ToUniversalTime().ToString("yyyy-MM-dd HH:mm:ss", CultureInfo.InvariantCulture);
        md.Line($"_Readiness report \\(schema {Report.Schema}\\), generated {when} UTC._");
        return md.ToString();
    }

    private static string Subject(ReportSubject subject)
    {
        var parts = new List<string>
        {
            "version **" + Value(subject.Version, "unknown") + "**",
            subject.Tag is null ? "no tag" : "tag **" + Value(subject.Tag, "none") + "**",
            "commit **" + Value(ReportFacts.ShortCommit(subject.Commit), "unknown") + "**",
            "checklist **" + Value(subject.Checklist, "unknown") + "**",
            subject.Inspected == InspectionKind.Worktree ? "read from the working tree" : "read from the commit",
        };
        var line = string.Join(" · ", parts);
        return char.ToUpperInvariant(line[0]) + line[1..];
    }

    private static string Value(string? text, string fallback)
    {
        var escaped = MarkdownText.Inline(text);
        return escaped.Length > 0 ? escaped : fallback;
    }

    private static void WriteTable(MarkdownBuilder md, Report report)
    {
        if (report.Results.Count == 0)
        {
            return;
        }

        md.Blank();
        md.Line("| status | severity | check | package | message | where |");
        md.Line("| --- | --- | --- | --- | --- | --- |");
        foreach (var r in report.ByImportance())
        {
            var where = string.Join(", ", r.Evidence.Select(e => MarkdownText.Inline(ReportFacts.Where(e))));
            md.Line($"| {Icon(r.Status)} {r.Status.Name()} | {r.Severity.Name()} | {MarkdownText.Inline(r.Check)} | "
                + $"{MarkdownText.Inline(r.Package)} | {MarkdownText.Inline(r.Message)} | {where} |");
        }
    }

    private static void WriteFailure(MarkdownBuilder md, CheckResult result)
    {
        md.Blank();
        var package = string.IsNullOrEmpty(result.Package) ? string.Empty : " — " + MarkdownText.Inline(result.Package);
        md.Line($"### {MarkdownText.Inline(result.Check)}{package}");
        var title = MarkdownText.Inline(result.Title);
        if (title.Length > 0)
        {
            md.Blank();
            md.Line($"_{title}_ \\({result.Status.Name()}, {result.Severity.Name()}\\)");
        }

        var message = MarkdownText.Paragraph(result.Message);
        if (message.Length > 0)
        {
            md.Blank();
            md.Line(message);
        }

        if (result.Evidence.Count > 0)
        {
            md.Blank();
            foreach (var evidence in result.Evidence)
            {
                md.Line("- " + MarkdownText.Item(ReportFacts.Where(evidence)));
            }
        }

        if (!string.IsNullOrWhiteSpace(result.Hint))
        {
            md.Blank();
            md.Line("**Fix:** " + MarkdownText.Paragraph(result.Hint));
        }

        var standard = MarkdownText.Link(result.Standard.Name, result.Standard.Url);
        if (standard.Length > 0)
        {
            md.Blank();
            md.Line("**Standard:** " + standard);
        }
    }

    private static void WriteManual(MarkdownBuilder md, Report report)
    {
        var items = report.ByImportance()
            .Where(r => r.Status == CheckStatus.Manual || (r.Status == CheckStatus.Pass && ReportFacts.IsManualItem(r)))
            .ToList();
        if (items.Count == 0)
        {
            return;
        }

        md.Blank();
        md.Line("### Manual items");
        md.Blank();
        foreach (var r in items)
        {
            var box = r.Status == CheckStatus.Pass ? "[x]" : "[ ]";
            var text = ReportFacts.IsManualItem(r) || string.IsNullOrWhiteSpace(r.Message) ? r.Title : $"{r.Title}: {r.Message}";
            var severity = r.Severity == Severity.Block ? " **block**" : string.Empty;
            md.Line($"- {box} {MarkdownText.Inline(text)} \\({MarkdownText.Inline(r.Check)}\\){severity}");
        }
    }

    private static string Icon(CheckStatus status) => status switch
    {
        CheckStatus.Fail => "❌",
        CheckStatus.Error => "⛔",
        CheckStatus.Manual => "✋",
        CheckStatus.Skip => "➖",
        _ => "✅",
    };

    /// <summary>Collects lines with LF endings and at most one blank line in a row.</summary>
    private sealed class MarkdownBuilder
    {
        private readonly StringBuilder text = new();
        private bool lastBlank = true;

        public void Line(string line)
        {
            text.Append(line).Append('\n');
            lastBlank = false;
        }

        public void Blank()
        {
            if (!lastBlank)
            {
                text.Append('\n');
                lastBlank = true;
            }
        }

        public override string ToString() => text.ToString();
    }
}
