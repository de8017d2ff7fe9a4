using System.Globalization;
using System.Text;

using Readiness.Core.Reports;

namespace Readiness.Rendering;

/// <summary>
/// GitHub-flavoured Markdown for a pull request comment or a file: a hidden marker line (so the service finds and
/// updates its own comment), the verdict sentence, one table per weight (blocking, warnings, information, not judged,
/// passed), the manual items as a task list, one detail section per failure, notes and a footer. Everything that comes from the inspected repository is escaped (<see cref="MarkdownText"/>).
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
        md.Line($"## Release check: {ReportWording.Verdict(report.Ready)}");
        md.Blank();
        md.Line($"**{MarkdownText.Inline(ReportWording.Sentence(report))}**");
        md.Blank();
        md.Line(Subject(report.Subject));

        var anchors = new AnchorNames();
        var detailed = new Dictionary<CheckResult, string>(ReferenceEqualityComparer.Instance);
        foreach (var failure in ReportFacts.Failures(report))
        {
            detailed[failure] = anchors.Next(DetailHeading(failure));
        }

        var judged = report.ByImportance().Where(r => !ReportFacts.IsManualItem(r)).ToList();
        WriteGroup(md, "Blocking failures", judged.Where(r => r.IsBlocking), detailed);
        WriteGroup(md, "Warnings", judged.Where(r => !r.IsBlocking && IsFinding(r) && r.Severity != Severity.Info), detailed);
        WriteGroup(md, "Information", judged.Where(r => !r.IsBlocking && IsFinding(r) && r.Severity == Severity.Info), detailed);
        WriteManual(md, report);
        WriteGroup(md, "Not judged", judged.Where(r => r.Status == CheckStatus.Skip), detailed);
        WriteGroup(md, "Passed", judged.Where(r => r.Status == CheckStatus.Pass), detailed);

        if (detailed.Count > 0)
        {
            md.Blank();
            md.Line("### Details");
            foreach (var result in ReportFacts.Failures(report))
            {
                WriteFailure(md, result);
            }
        }

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

    /// <summary>The heading of a failure's detail section; its anchor is what the group tables link to.</summary>
    internal static string DetailHeading(CheckResult result) =>
        string.IsNullOrEmpty(result.Package) ? UntrustedText.OneLine(result.Check) : $"{UntrustedText.OneLine(result.Check)} — {UntrustedText.OneLine(result.Package)}";

    private static bool IsFinding(CheckResult result) => result.Status is CheckStatus.Fail or CheckStatus.Error;

    private static string Subject(ReportSubject subject)
    {
        var parts = new List<string>
        {
            "version " + Value(subject.Version, "unknown"),
            subject.Tag is null ? "no tag" : "tag " + Value(subject.Tag, "none"),
            "commit " + Value(ReportFacts.ShortCommit(subject.Commit), "unknown"),
            "checklist " + Value(subject.Checklist, "unknown"),
            subject.Inspected == InspectionKind.Worktree ? "read from the working tree" : "read from the commit",
        };
        var line = string.Join(", ", parts);
        return char.ToUpperInvariant(line[0]) + line[1..];
    }

    private static string Value(string? text, string fallback)
    {
        var escaped = MarkdownText.Inline(text);
        return escaped.Length > 0 ? escaped : fallback;
    }

    /// <summary>
    /// One table per weight (blocking, warnings, information, not judged, passed), so the section says how much a
    /// row matters and the rows need no status column; a failure's check links to its detail section.
    /// </summary>
    private static void WriteGroup(MarkdownBuilder md, string title, IEnumerable<CheckResult> results, Dictionary<CheckResult, string> detailed)
    {
        var rows = results.ToList();
        if (rows.Count == 0)
        {
            return;
        }

        md.Blank();
        md.Line($"### {title} ({rows.Count.ToString(CultureInfo.InvariantCulture)})");
        md.Blank();
        md.Line("| check | package | finding | where |");
        md.Line("| --- | --- | --- | --- |");
        foreach (var r in rows)
        {
            var where = string.Join(", ", r.Evidence.Select(e => MarkdownText.Inline(ReportFacts.Where(e))));
            var check = detailed.TryGetValue(r, out var anchor) ? $"[{MarkdownText.Inline(r.Check)}](#{anchor})" : MarkdownText.Inline(r.Check);
            var finding = r.Status == CheckStatus.Error ? "**could not judge:** " + MarkdownText.Inline(r.Message) : MarkdownText.Inline(r.Message);
            md.Line($"| {check} | {MarkdownText.Inline(r.Package)} | {finding} | {where} |");
        }
    }

    private static void WriteFailure(MarkdownBuilder md, CheckResult result)
    {
        md.Blank();
        md.Line($"#### {MarkdownText.Inline(DetailHeading(result))}");
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
        md.Line($"### To confirm ({items.Count.ToString(CultureInfo.InvariantCulture)})");
        md.Blank();
        foreach (var r in items)
        {
            var box = r.Status == CheckStatus.Pass ? "[x]" : "[ ]";
            var text = ReportFacts.IsManualItem(r) || string.IsNullOrWhiteSpace(r.Message) ? r.Title : $"{r.Title}: {r.Message}";
            var severity = r.Severity == Severity.Block ? " **block**" : string.Empty;
            md.Line($"- {box} {MarkdownText.Inline(text)} \\({MarkdownText.Inline(r.Check)}\\){severity}");
        }

        md.Blank();
        md.Line("_Confirm an item by ticking its box in the pull request's description (ticks in this comment do not count), or with `readiness check --confirm ID`._");
    }

    /// <summary>
    /// GitHub's heading anchors as Markdig makes them for the HTML page (<c>LinkHelper.UrilizeAsGfm</c>, the same
    /// function its <c>AutoIdentifierOptions.GitHub</c> uses), repeats numbered <c>-1</c>, <c>-2</c>.
    /// </summary>
    private sealed class AnchorNames
    {
        private readonly Dictionary<string, int> seen = new(StringComparer.Ordinal);

        public string Next(string heading)
        {
            var name = Markdig.Helpers.LinkHelper.UrilizeAsGfm(heading);
            if (seen.TryGetValue(name, out var count))
            {
                seen[name] = count + 1;
                return $"{name}-{count}";
            }

            seen[name] = 1;
            return name;
        }
    }

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
