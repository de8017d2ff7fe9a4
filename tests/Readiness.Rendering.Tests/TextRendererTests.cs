using System.Text.RegularExpressions;

using Readiness.Core.Reports;

namespace Readiness.Rendering.Tests;

public sealed partial class TextRendererTests
{
    private const char Escape = '\u001b';

    /// <summary>ECMA-48 SGR control sequence: CSI (ESC [), numeric parameters separated by ';', final byte 'm'.</summary>
    [GeneratedRegex("\u001b\\[[0-9;]*m")]
    private static partial Regex SgrSequence();

    private static string[] Lines(string text) => text.TrimEnd('\n').Split('\n');

    [Fact]
    public void NoColorEnvironment_OutputHasNoEscapeCharacters()
    {
        var env = new System.Collections.Hashtable { ["NO_COLOR"] = "1", ["TERM"] = "xterm-256color" };
        var renderer = new TextRenderer(color: ConsoleColorPolicy.ShouldUseColor(isTerminal: true, env));

        var text = SampleReports.Render(renderer, SampleReports.Demo());

        Assert.DoesNotContain(Escape, text);
        Assert.StartsWith("NOT READY  version 2.4.0, tag v2.4.0, commit 3f9c2a7, checklist host-plugin\n", text, StringComparison.Ordinal);
    }

    [Fact]
    public void ColorEnabled_VerdictAndStatusesArePaintedWithSgrOnly()
    {
        var text = SampleReports.Render(new TextRenderer(color: true), SampleReports.Demo());

        Assert.StartsWith("\u001b[1;31mNOT READY\u001b[0m", text, StringComparison.Ordinal);
        Assert.Contains("\u001b[1;31mfail\u001b[0m", text, StringComparison.Ordinal);
        Assert.Contains("\u001b[35merror\u001b[0m", text, StringComparison.Ordinal);
        // Every escape character starts an SGR sequence: colour never brings cursor moves or title changes.
        Assert.Equal(text.Count(c => c == Escape), SgrSequence().Matches(text).Count);
        // With the SGR sequences removed, the coloured output is the plain output.
        Assert.Equal(SampleReports.Render(new TextRenderer(), SampleReports.Demo()), SgrSequence().Replace(text, string.Empty));
    }

    [Fact]
    public void ReadyReport_ColorsTheVerdictGreen() =>
        Assert.StartsWith("\u001b[1;32mREADY\u001b[0m  ", SampleReports.Render(new TextRenderer(color: true), SampleReports.Ready()), StringComparison.Ordinal);

    [Fact]
    public void DemoReport_FailuresComeBeforeSkipsManualItemsAndPasses()
    {
        var lines = Lines(SampleReports.Render(new TextRenderer(verbose: true), SampleReports.Demo()));
        int Last(string status) => Array.FindLastIndex(lines, l => l.StartsWith(status + " ", StringComparison.Ordinal));
        int First(string status) => Array.FindIndex(lines, l => l.StartsWith(status + " ", StringComparison.Ordinal));

        Assert.True(First("fail") > 0);
        Assert.True(Last("fail") < First("error"));
        Assert.True(Last("error") < First("manual"));
        Assert.True(Last("manual") < First("skip"));
        Assert.True(Last("skip") < First("pass"));
        // Blocking failures before warnings (Report.ByImportance).
        Assert.True(Array.FindLastIndex(lines, l => l.StartsWith("fail   block ", StringComparison.Ordinal))
            < Array.FindIndex(lines, l => l.StartsWith("fail   warn ", StringComparison.Ordinal)));
        Assert.Equal(11, lines.Count(l => l.StartsWith("pass ", StringComparison.Ordinal)));
    }

    [Fact]
    public void DemoReport_FailureShowsEvidenceFixAndStandard()
    {
        var lines = Lines(SampleReports.Render(new TextRenderer(), SampleReports.Demo()));
        var head = Array.IndexOf(lines, "fail   block changelog.has-entry  Bramble.Sketches");

        Assert.True(head >= 0);
        Assert.Equal("    CHANGELOG.md has no section for 2.4.0; the new entries still sit under Unreleased.", lines[head + 1]);
        Assert.Equal("    at CHANGELOG.md:7", lines[head + 2]);
        Assert.Equal("    fix: Move the entries under a heading \"## [2.4.0] - 2026-11-20\".", lines[head + 3]);
        Assert.Equal("    see: Keep a Changelog 1.1.0 https://keepachangelog.com/en/1.1.0/", lines[head + 4]);
        Assert.Contains("    at Directory.Build.props:4", lines);
    }

    [Fact]
    public void NotVerbose_CountsPassesOnOneLine()
    {
        var lines = Lines(SampleReports.Render(new TextRenderer(), SampleReports.Demo()));

        Assert.Contains("11 passed", lines);
        Assert.DoesNotContain(lines, l => l.StartsWith("pass ", StringComparison.Ordinal));
    }

    [Fact]
    public void NotReady_SummaryAndBlockingListAgreeWithTheReport()
    {
        var report = SampleReports.Demo();
        var lines = Lines(SampleReports.Render(new TextRenderer(), report));

        Assert.Contains("summary: 6 blocking; 7 fail, 1 error, 1 manual, 3 skip, 11 pass", lines);
        var start = Array.IndexOf(lines, "blocked by:");
        var blockers = lines.Skip(start + 1).TakeWhile(l => l.Length > 0).ToList();
        // ReportSummary.Blocking counts blocking failures plus unconfirmed blocking manual items (checks.md).
        Assert.Equal(report.Summary.Blocking, blockers.Count);
        Assert.Contains("    secrets.none-committed", blockers);
        Assert.Contains("    manual.memory-stable", blockers);
        Assert.Contains("    version.matches-tag  Bramble.Sketches.Lanternfly3", blockers);
    }

    [Fact]
    public void ReadyReport_HasNoBlockingList()
    {
        var text = SampleReports.Render(new TextRenderer(), SampleReports.Ready());

        Assert.StartsWith("READY  version 2.4.0, tag v2.4.0, commit 3f9c2a7, checklist host-plugin, working tree\n", text, StringComparison.Ordinal);
        Assert.DoesNotContain("blocked by", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Notes_ComeLastUnderNotes()
    {
        var lines = Lines(SampleReports.Render(new TextRenderer(), SampleReports.Demo()));

        Assert.Equal("notes:", lines[^5]);
        Assert.Equal("  - Registry checks were skipped: --offline.", lines[^4]);
        Assert.Equal("  - Bramble.Sketches.Tests is a test project: not checked.", lines[^3]);
        // The verdict closes the report, worded as everywhere else.
        Assert.Equal(string.Empty, lines[^2]);
        Assert.Equal("NOT READY: 2.4.0 — 6 blocking; 7 fail, 1 error, 1 manual, 3 skip, 11 pass", lines[^1]);
    }

    [Theory]
    [InlineData(false, false)]
    [InlineData(false, true)]
    [InlineData(true, true)]
    public void Lines_FitHundredColumnsUnlessOneWordIsLonger_AndHaveNoTrailingWhitespace(bool color, bool verbose)
    {
        var text = SampleReports.Render(new TextRenderer(color, verbose), SampleReports.Demo());

        Assert.EndsWith("\n", text, StringComparison.Ordinal);
        Assert.DoesNotContain("\r", text, StringComparison.Ordinal);
        foreach (var line in Lines(SgrSequence().Replace(text, string.Empty)))
        {
            Assert.Equal(line.TrimEnd(), line);
            if (line.Length > TextRenderer.Width)
            {
                // Only a single unbreakable word (a long URL) may overflow, alone on its line.
                Assert.DoesNotContain(' ', line.Trim());
            }
        }
    }

    [Fact]
    public void HostileControlCharacters_NeverReachTheTerminal()
    {
        var plain = SampleReports.Render(new TextRenderer(), SampleReports.Hostile());
        var colored = SampleReports.Render(new TextRenderer(color: true), SampleReports.Hostile());

        Assert.DoesNotContain(Escape, plain);
        Assert.DoesNotContain('\u0007', plain);
        // Shown as visible escapes (\xHH), so the reader sees what the name really holds.
        Assert.Contains("at evil\\x1B]0;pwned\\x07\\x1B[2J.txt", plain, StringComparison.Ordinal);
        Assert.Equal(colored.Count(c => c == Escape), SgrSequence().Matches(colored).Count);
    }

    [Fact]
    public void MultiLineMessage_KeepsItsIndentOnEveryLine()
    {
        var lines = Lines(SampleReports.Render(new TextRenderer(), SampleReports.Hostile()));
        var head = Array.FindIndex(lines, l => l.StartsWith("fail   block secrets.none-committed", StringComparison.Ordinal));

        Assert.Equal("    second line # not a heading", lines[head + 2]);
        Assert.Equal("    ---", lines[head + 3]);
    }

    [Fact]
    public void NullArguments_Throw()
    {
        var renderer = new TextRenderer();
        Assert.Throws<ArgumentNullException>(() => renderer.Render(null!, TextWriter.Null));
        Assert.Throws<ArgumentNullException>(() => renderer.Render(SampleReports.Ready(), null!));
    }

    [Fact]
    public void EmptyReport_StillRendersVerdictAndSummary()
    {
        var report = new Report(SampleReports.Subject with { Tag = null, Version = null }, true, new ReportSummary(0, 0, 0, 0, 0, 0), [], SampleReports.GeneratedAt, []);

        var lines = Lines(SampleReports.Render(new TextRenderer(), report));

        Assert.Equal("READY  version unknown, no tag, commit 3f9c2a7, checklist host-plugin", lines[0]);
        Assert.Contains("summary: 0 blocking; 0 fail, 0 error, 0 manual, 0 skip, 0 pass", lines);
    }
}
