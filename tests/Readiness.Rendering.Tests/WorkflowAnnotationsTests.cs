using Readiness.Core.Checks;
using Readiness.Core.Reports;

namespace Readiness.Rendering.Tests;

public sealed class WorkflowAnnotationsTests
{
    // Reference for every expectation here: the runner toolkit's escaping (actions/toolkit packages/core/src/command.ts,
    // escapeData: % CR LF; escapeProperty: also : and ,) and the workflow-command syntax ::level key=value,...::message.
    [Fact]
    public void DemoReport_OneLinePerFailureOrError_WithFileLineAndLevel()
    {
        var report = SampleReports.Demo();
        var lines = Render(report);

        Assert.Equal(report.Summary.Fail + report.Summary.Error, lines.Length);
        Assert.Contains("::error file=CHANGELOG.md,line=7,title=changelog.has-entry (Bramble.Sketches)::CHANGELOG.md has no section for 2.4.0; the new entries still sit under Unreleased.%0AFix: Move the entries under a heading \"## [2.4.0] - 2026-11-20\".%0AStandard: Keep a Changelog 1.1.0 https://keepachangelog.com/en/1.1.0/", lines);
        Assert.Contains(lines, l => l.StartsWith("::warning file=src/Bramble.Sketches/Bramble.Sketches.csproj,line=5,title=matrix.supported-targets", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("::warning title=signing.tag::", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("::warning file=LICENSE,title=license.agrees::", StringComparison.Ordinal));
    }

    [Fact]
    public void Escaping_FollowsTheWorkflowCommandRules()
    {
        Assert.Equal("100%25 done%0D%0Anext: a, b", WorkflowAnnotations.EscapeData("100% done\r\nnext: a, b"));
        Assert.Equal("a%3Ab%2Cc%25d%0Ae", WorkflowAnnotations.EscapeProperty("a:b,c%d\ne"));
    }

    [Fact]
    public void HostileText_CannotStartAnotherCommandOrEndTheProperties()
    {
        var result = new CheckResult(
            CheckIds.SecretsNoneCommitted, "t", CheckStatus.Fail, Severity.Block, null,
            "first\n::error file=x::forged\u001b[2J 50%0A",
            null,
            [new Evidence("a,line=1::b:c.txt", 3)],
            new StandardReference("n", "javascript:alert(1)"));

        var line = WorkflowAnnotations.Line(result);

        Assert.Equal("::error file=a%2Cline=1%3A%3Ab%3Ac.txt,line=3,title=secrets.none-committed::first%0A::error file=x::forged\\u001B[2J 50%250A", line);
        Assert.DoesNotContain(line, c => char.IsControl(c));
    }

    private static string[] Render(Report report)
    {
        using var writer = new StringWriter();
        new WorkflowAnnotations().Render(report, writer);
        return writer.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);
    }
}
