using Readiness.Core.Reports;

namespace Readiness.Rendering;

/// <summary>
/// The report for a terminal: a verdict line, failures in full (message, evidence, fix, standard), skips and manual
/// items one line each, passes counted, then the summary and what blocks. Lines fit 100 columns where words allow.
/// </summary>
/// <param name="color">Add ANSI colour (decide with <see cref="ConsoleColorPolicy"/>).</param>
/// <param name="verbose">List every pass instead of only counting them.</param>
public sealed class TextRenderer(bool color = false, bool verbose = false) : IReportRenderer
{
    public const int Width = 100;
    private const string Indent = "    ";

    public string Format => "text";

    public bool Color => color;

    public bool Verbose => verbose;

    public void Render(Report report, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(output);
        var style = new AnsiStyle(color);
        var lines = new List<string>();

        var verdict = report.Ready ? style.Paint("READY", AnsiStyle.BoldGreen) : style.Paint("NOT READY", AnsiStyle.BoldRed);
        lines.Add(verdict + "  " + ReportFacts.Subject(report.Subject, ", "));

        foreach (var result in ReportFacts.Failures(report))
        {
            lines.Add(string.Empty);
            WriteFailure(lines, style, result);
        }

        var compact = report.ByImportance().Where(r => r.Status is CheckStatus.Skip or CheckStatus.Manual).ToList();
        if (compact.Count > 0)
        {
            lines.Add(string.Empty);
            foreach (var result in compact)
            {
                WriteCompact(lines, style, result);
            }
        }

        var passes = report.ByImportance().Where(r => r.Status == CheckStatus.Pass).ToList();
        lines.Add(string.Empty);
        lines.Add(style.Paint($"{passes.Count} passed", AnsiStyle.Green));
        if (verbose)
        {
            foreach (var result in passes)
            {
                WriteCompact(lines, style, result);
            }
        }

        lines.Add(string.Empty);
        lines.Add($"summary: {ReportWording.Counts(report.Summary)}");
        if (!report.Ready)
        {
            var blockers = ReportFacts.Blocking(report).ToList();
            if (blockers.Count > 0)
            {
                lines.Add(style.Paint("blocked by:", AnsiStyle.Red));
                foreach (var result in blockers)
                {
                    lines.Add(Indent + Label(result));
                }
            }
        }

        if (report.Notes.Count > 0)
        {
            lines.Add(string.Empty);
            lines.Add("notes:");
            foreach (var note in report.Notes)
            {
                foreach (var line in UntrustedText.Lines(note))
                {
                    AddWrapped(lines, line, "  - ", "  - ", Indent);
                }
            }
        }

        // The verdict again at the end, where a long report leaves the reader.
        lines.Add(string.Empty);
        lines.Add(style.Paint(ReportWording.Sentence(report), report.Ready ? AnsiStyle.BoldGreen : AnsiStyle.BoldRed));

        foreach (var line in lines)
        {
            output.Write(line);
            output.Write('\n');
        }
    }

    private static void WriteFailure(List<string> lines, AnsiStyle style, CheckResult result)
    {
        lines.Add(Head(style, result));
        foreach (var line in UntrustedText.Lines(result.Message))
        {
            AddWrapped(lines, line, Indent, Indent, Indent);
        }

        foreach (var evidence in result.Evidence)
        {
            AddWrapped(lines, UntrustedText.OneLine(ReportFacts.Where(evidence)), Indent + "at ", Indent + style.Paint("at", AnsiStyle.Dim) + " ", Indent + "   ");
        }

        if (!string.IsNullOrWhiteSpace(result.Hint))
        {
            AddWrapped(lines, UntrustedText.OneLine(result.Hint), Indent + "fix: ", Indent + style.Paint("fix:", AnsiStyle.Cyan) + " ", Indent + "     ");
        }

        var see = UntrustedText.OneLine(result.Standard.Name);
        if (!string.IsNullOrEmpty(result.Standard.Url))
        {
            see += " " + UntrustedText.OneLine(result.Standard.Url);
        }

        if (see.Length > 0)
        {
            AddWrapped(lines, see, Indent + "see: ", Indent + style.Paint("see:", AnsiStyle.Dim) + " ", Indent + "     ");
        }
    }

    private static void WriteCompact(List<string> lines, AnsiStyle style, CheckResult result)
    {
        var text = result.Status is CheckStatus.Manual or CheckStatus.Pass ? result.Title : result.Message;
        var package = string.IsNullOrEmpty(result.Package) ? string.Empty : UntrustedText.OneLine(result.Package) + ": ";
        var plainHead = $"{result.Status.Name(),-6} {result.Severity.Name(),-5} {UntrustedText.OneLine(result.Check)}  ";
        var paintedHead = $"{PaintStatus(style, result.Status, result.Severity)}{Pad(result.Status.Name(), 6)} {PaintSeverity(style, result.Severity)}{Pad(result.Severity.Name(), 5)} {UntrustedText.OneLine(result.Check)}  ";
        var indent = new string(' ', 13);
        AddWrapped(lines, package + UntrustedText.OneLine(text), plainHead, paintedHead, indent);
        if (result.Status == CheckStatus.Manual && !string.IsNullOrWhiteSpace(result.Hint))
        {
            AddWrapped(lines, UntrustedText.OneLine(result.Hint), indent, indent, indent);
        }
    }

    private static string Head(AnsiStyle style, CheckResult result)
    {
        var head = $"{PaintStatus(style, result.Status, result.Severity)}{Pad(result.Status.Name(), 6)} {PaintSeverity(style, result.Severity)}{Pad(result.Severity.Name(), 5)} {style.Paint(UntrustedText.OneLine(result.Check), AnsiStyle.Bold)}";
        return string.IsNullOrEmpty(result.Package) ? head : head + "  " + UntrustedText.OneLine(result.Package);
    }

    private static string Label(CheckResult result) =>
        string.IsNullOrEmpty(result.Package)
            ? UntrustedText.OneLine(result.Check)
            : $"{UntrustedText.OneLine(result.Check)}  {UntrustedText.OneLine(result.Package)}";

    /// <summary>Only what blocks is red: a failed warning is yellow, a failed information check plain.</summary>
    private static string PaintStatus(AnsiStyle style, CheckStatus status, Severity severity) => style.Paint(status.Name(), status switch
    {
        CheckStatus.Fail when severity == Severity.Block => AnsiStyle.BoldRed,
        CheckStatus.Fail when severity == Severity.Warn => AnsiStyle.Yellow,
        CheckStatus.Fail => AnsiStyle.Cyan,
        CheckStatus.Error => AnsiStyle.Magenta,
        CheckStatus.Manual => AnsiStyle.Yellow,
        CheckStatus.Skip => AnsiStyle.Dim,
        _ => AnsiStyle.Green,
    });

    private static string PaintSeverity(AnsiStyle style, Severity severity) =>
        severity == Severity.Block ? style.Paint(severity.Name(), AnsiStyle.Bold) : severity.Name();

    private static string Pad(string word, int width) => new(' ', Math.Max(0, width - word.Length));

    /// <summary>Wraps on the plain prefix's width, then writes the painted prefix in its place.</summary>
    private static void AddWrapped(List<string> lines, string text, string plainPrefix, string paintedPrefix, string indent)
    {
        var first = true;
        foreach (var line in TextWrap.Wrap(text, Width, plainPrefix, indent))
        {
            if (first && line.StartsWith(plainPrefix, StringComparison.Ordinal))
            {
                lines.Add(paintedPrefix + line[plainPrefix.Length..]);
            }
            else
            {
                lines.Add(first && line == plainPrefix.TrimEnd() ? paintedPrefix.TrimEnd() : line);
            }

            first = false;
        }
    }
}
