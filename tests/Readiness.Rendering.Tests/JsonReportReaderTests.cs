using Readiness.Core.Reports;

namespace Readiness.Rendering.Tests;

public sealed class JsonReportReaderTests
{
    [Fact]
    public void DemoReport_RoundTripsWithoutLoss()
    {
        var report = SampleReports.Demo();

        var read = JsonReportReader.Parse(JsonRenderer.ToJson(report));

        ReportAssert.Equal(report, read);
        Assert.Equal(JsonRenderer.ToJson(report), JsonRenderer.ToJson(read));
    }

    [Fact]
    public void HostileReport_RoundTripsWithoutLoss()
    {
        // Control characters, markup and quotes in every string field.
        var report = SampleReports.Hostile() with
        {
            GeneratedAt = new DateTimeOffset(2026, 11, 20, 23, 59, 59, 999, TimeSpan.FromHours(-5)).AddTicks(1234),
            Notes = ["tab\there", "quote \" and backslash \\", "Zürich — ✓ 🦊", "nul\0char", ""],
        };

        var read = JsonReportReader.Parse(JsonRenderer.ToJson(report));

        ReportAssert.Equal(report, read);
    }

    [Fact]
    public void NullsAndWorktree_RoundTrip()
    {
        var result = new CheckResult("signing.commit", "Signed commit", CheckStatus.Error, Severity.Info, null, string.Empty, null, [new Evidence("a.txt"), new Evidence("b.txt", 1)], new StandardReference(string.Empty, string.Empty));
        var report = new Report(SampleReports.Subject with { Tag = null, Version = null, Inspected = InspectionKind.Worktree }, true, ReportSummary.From([result], 0), [result], SampleReports.GeneratedAt, []);

        ReportAssert.Equal(report, JsonReportReader.Parse(JsonRenderer.ToJson(report)));
    }

    [Fact]
    public void Read_FromTextReader()
    {
        var report = SampleReports.Demo();

        var read = JsonReportReader.Read(new StringReader(SampleReports.Render(new JsonRenderer(), report)));

        ReportAssert.Equal(report, read);
    }

    [Fact]
    public void CliExample_IsRead()
    {
        // cli.md's example with its placeholders filled in ("…", "40-hex", "commit|worktree") and without the
        // fields this renderer adds: a consumer's minimal report must be accepted.
        const string json = """
            {
              "schema": "readiness-report/1",
              "ready": false,
              "subject": { "repository": "https://git.example/bramblecote/bramble-sketches", "commit": "3f9c2a7d5e8b41c6a0f2d9e7b5c3a1f8e6d4b2c0", "ref": "v2.4.0", "tag": "v2.4.0",
                           "version": "2.4.0", "checklist": "host-plugin", "inspected": "commit" },
              "summary": { "pass": 12, "fail": 3, "skip": 2, "manual": 1, "error": 0, "blocking": 2 },
              "results": [
                { "check": "changelog.has-entry", "title": "The changelog has an entry", "status": "fail", "severity": "block",
                  "package": "Bramble.Sketches", "message": "No 2.4.0 section.", "hint": "Add one.",
                  "evidence": [ { "path": "CHANGELOG.md", "line": 7 } ],
                  "standard": { "name": "Keep a Changelog 1.1.0", "url": "https://keepachangelog.com/en/1.1.0/" } }
              ]
            }
            """;

        var report = JsonReportReader.Parse(json);

        Assert.False(report.Ready);
        Assert.Equal(new ReportSummary(12, 3, 2, 1, 0, 2), report.Summary);
        Assert.Equal("host-plugin", report.Subject.Checklist);
        var result = Assert.Single(report.Results);
        Assert.Equal(CheckStatus.Fail, result.Status);
        Assert.Equal(Severity.Block, result.Severity);
        Assert.Equal([new Evidence("CHANGELOG.md", 7)], result.Evidence);
        Assert.Empty(report.Notes);
    }

    [Fact]
    public void UnknownFields_AreIgnored()
    {
        // cli.md: "new fields may be added".
        var json = JsonRenderer.ToJson(SampleReports.Demo())
            .Replace("\"ready\": false,", "\"ready\": false, \"durationMs\": 812, \"extra\": { \"nested\": [1, 2] },", StringComparison.Ordinal)
            .Replace("\"hint\": null,", "\"hint\": null, \"fixable\": true,", StringComparison.Ordinal);

        ReportAssert.Equal(SampleReports.Demo(), JsonReportReader.Parse(json));
    }

    [Theory]
    [InlineData("\"schema\": \"readiness-report/1\"", "\"schema\": \"readiness-report/2\"", "$.schema")]
    [InlineData("\"status\": \"pass\"", "\"status\": \"passed\"", "$.results[0].status")]
    [InlineData("\"severity\": \"block\"", "\"severity\": \"Block\"", "$.results[0].severity")]
    [InlineData("\"inspected\": \"commit\"", "\"inspected\": \"tree\"", "$.subject.inspected")]
    [InlineData("\"pass\": 11", "\"pass\": \"11\"", "$.summary.pass")]
    [InlineData("\"pass\": 11", "\"pass\": -1", "$.summary.pass")]
    [InlineData("\"ready\": false", "\"ready\": \"no\"", "$.ready")]
    [InlineData("\"line\": 4", "\"line\": 4.5", "$.results[2].evidence[0].line")]
    [InlineData("\"checklist\": \"host-plugin\",", "", "$.subject.checklist")]
    [InlineData("\"generatedAt\": \"2026-11-20T12:30:00+00:00\"", "\"generatedAt\": \"yesterday\"", "$.generatedAt")]
    public void ContractViolation_ThrowsNamingThePath(string find, string replace, string path)
    {
        var json = JsonRenderer.ToJson(SampleReports.Demo());
        Assert.Contains(find, json, StringComparison.Ordinal);
        var broken = ReplaceFirst(json, find, replace);

        var error = Assert.Throws<ReportFormatException>(() => JsonReportReader.Parse(broken));

        Assert.StartsWith(path, error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("")]
    [InlineData("not json")]
    [InlineData("[]")]
    [InlineData("{\"schema\": \"readiness-report/1\"")]
    public void NotAReport_ThrowsFormatException(string json) =>
        Assert.Throws<ReportFormatException>(() => JsonReportReader.Parse(json));

    [Fact]
    public void DeeplyNestedInput_IsRefused()
    {
        var json = "{\"schema\": \"readiness-report/1\", \"x\": " + new string('[', 100) + new string(']', 100) + "}";

        Assert.Throws<ReportFormatException>(() => JsonReportReader.Parse(json));
    }

    [Fact]
    public void OversizedInput_IsRefusedBeforeParsing()
    {
        var huge = new string(' ', JsonReportReader.MaxChars + 1);

        Assert.Throws<ReportFormatException>(() => JsonReportReader.Read(new StringReader(huge)));
        Assert.Throws<ReportFormatException>(() => JsonReportReader.Parse(huge));
    }

    private static string ReplaceFirst(string text, string find, string replace)
    {
        var i = text.IndexOf(find, StringComparison.Ordinal);
        return text[..i] + replace + text[(i + find.Length)..];
    }
}
