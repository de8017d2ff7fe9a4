using System.Globalization;
using System.Text.Json;

using Readiness.Core.Reports;

namespace Readiness.Rendering.Tests;

/// <summary>
/// The JSON output against the contract in cli.md ("JSON report (--format json), schema readiness-report/1"):
/// field names, value types and the status and severity words. cli.md is the reference for every name below.
/// </summary>
public sealed class JsonRendererTests
{
    // cli.md: the top-level fields in the example, plus the two this renderer adds (new fields may be added).
    // schemaVersion added beside schema: the published JSON Schema's MAJOR.MINOR (cli.md lets new fields appear).
    private static readonly string[] RootFields = ["schema", "schemaVersion", "ready", "subject", "summary", "results", "generatedAt", "notes"];

    // cli.md: subject { repository, commit, ref, tag, version, checklist, inspected }.
    private static readonly string[] SubjectFields = ["repository", "commit", "ref", "tag", "version", "checklist", "inspected"];

    // cli.md: summary { pass, fail, skip, manual, error, blocking }.
    private static readonly string[] SummaryFields = ["pass", "fail", "skip", "manual", "error", "blocking"];

    // cli.md: result { check, title, status, severity, package, message, hint, evidence, standard }.
    private static readonly string[] ResultFields = ["check", "title", "status", "severity", "package", "message", "hint", "evidence", "standard"];

    // cli.md: "Statuses: pass, fail, skip, manual, error; severities: block, warn, info."
    private static readonly string[] Statuses = ["pass", "fail", "skip", "manual", "error"];
    private static readonly string[] Severities = ["block", "warn", "info"];

    private static JsonDocument Parse(Report report) =>
        JsonDocument.Parse(SampleReports.Render(new JsonRenderer(), report));

    private static string[] Names(JsonElement element) => element.EnumerateObject().Select(p => p.Name).ToArray();

    private static void AssertStringOrNull(JsonElement element) =>
        Assert.True(element.ValueKind is JsonValueKind.String or JsonValueKind.Null, element.ValueKind.ToString());

    [Fact]
    public void DemoReport_HasTheContractFieldsWithTheirTypes()
    {
        using var json = Parse(SampleReports.Demo());
        var root = json.RootElement;

        Assert.Equal(RootFields, Names(root));
        Assert.Equal("readiness-report/1", root.GetProperty("schema").GetString());
        Assert.Equal(JsonValueKind.False, root.GetProperty("ready").ValueKind);

        var subject = root.GetProperty("subject");
        Assert.Equal(SubjectFields, Names(subject));
        foreach (var name in new[] { "repository", "commit", "ref", "checklist" })
        {
            Assert.Equal(JsonValueKind.String, subject.GetProperty(name).ValueKind);
        }

        AssertStringOrNull(subject.GetProperty("tag"));
        AssertStringOrNull(subject.GetProperty("version"));
        // cli.md: "commit": "40-hex"; "inspected": "commit|worktree".
        Assert.Matches("^[0-9a-f]{40}$", subject.GetProperty("commit").GetString());
        Assert.Contains(subject.GetProperty("inspected").GetString(), new[] { "commit", "worktree" });

        var summary = root.GetProperty("summary");
        Assert.Equal(SummaryFields, Names(summary));
        Assert.All(SummaryFields, name => Assert.True(summary.GetProperty(name).TryGetInt32(out var n) && n >= 0));

        var results = root.GetProperty("results");
        Assert.Equal(JsonValueKind.Array, results.ValueKind);
        Assert.Equal(SampleReports.Demo().Results.Count, results.GetArrayLength());
        foreach (var result in results.EnumerateArray())
        {
            Assert.Equal(ResultFields, Names(result));
            Assert.Equal(JsonValueKind.String, result.GetProperty("check").ValueKind);
            Assert.Equal(JsonValueKind.String, result.GetProperty("title").ValueKind);
            Assert.Contains(result.GetProperty("status").GetString(), Statuses);
            Assert.Contains(result.GetProperty("severity").GetString(), Severities);
            AssertStringOrNull(result.GetProperty("package"));
            Assert.Equal(JsonValueKind.String, result.GetProperty("message").ValueKind);
            AssertStringOrNull(result.GetProperty("hint"));
            foreach (var evidence in result.GetProperty("evidence").EnumerateArray())
            {
                Assert.Equal(["path", "line"], Names(evidence));
                Assert.Equal(JsonValueKind.String, evidence.GetProperty("path").ValueKind);
                Assert.True(evidence.GetProperty("line").ValueKind is JsonValueKind.Number or JsonValueKind.Null);
            }

            var standard = result.GetProperty("standard");
            Assert.Equal(["name", "url"], Names(standard));
            Assert.Equal(JsonValueKind.String, standard.GetProperty("name").ValueKind);
            Assert.Equal(JsonValueKind.String, standard.GetProperty("url").ValueKind);
        }

        Assert.All(root.GetProperty("notes").EnumerateArray(), n => Assert.Equal(JsonValueKind.String, n.ValueKind));
    }

    [Fact]
    public void DemoReport_ChangelogResultMatchesTheCliExample()
    {
        using var json = Parse(SampleReports.Demo());

        var changelog = json.RootElement.GetProperty("results").EnumerateArray().Single(r => r.GetProperty("check").GetString() == "changelog.has-entry");

        // The values of cli.md's example result.
        Assert.Equal("fail", changelog.GetProperty("status").GetString());
        Assert.Equal("block", changelog.GetProperty("severity").GetString());
        Assert.Equal("Bramble.Sketches", changelog.GetProperty("package").GetString());
        var evidence = Assert.Single(changelog.GetProperty("evidence").EnumerateArray());
        Assert.Equal("CHANGELOG.md", evidence.GetProperty("path").GetString());
        Assert.Equal(7, evidence.GetProperty("line").GetInt32());
        Assert.Equal("Keep a Changelog 1.1.0", changelog.GetProperty("standard").GetProperty("name").GetString());
        Assert.Equal("https://keepachangelog.com/en/1.1.0/", changelog.GetProperty("standard").GetProperty("url").GetString());
    }

    [Fact]
    public void DemoReport_SummaryCountsAgreeWithTheResults()
    {
        using var json = Parse(SampleReports.Demo());
        var root = json.RootElement;
        var statuses = root.GetProperty("results").EnumerateArray().Select(r => r.GetProperty("status").GetString()).ToList();

        foreach (var status in Statuses)
        {
            Assert.Equal(statuses.Count(s => s == status), root.GetProperty("summary").GetProperty(status).GetInt32());
        }

        // checks.md: ready when no block check failed and no block manual item is unconfirmed.
        var blocking = root.GetProperty("results").EnumerateArray().Count(r =>
            r.GetProperty("severity").GetString() == "block" && r.GetProperty("status").GetString() is "fail" or "error" or "manual");
        Assert.Equal(blocking, root.GetProperty("summary").GetProperty("blocking").GetInt32());
        Assert.Equal(blocking == 0, root.GetProperty("ready").GetBoolean());
    }

    [Fact]
    public void GeneratedAt_IsIso8601WithOffset()
    {
        using var json = Parse(SampleReports.Demo() with { GeneratedAt = new DateTimeOffset(2026, 11, 20, 14, 30, 5, TimeSpan.FromHours(2)) });

        var text = json.RootElement.GetProperty("generatedAt").GetString();

        // ISO 8601 extended format, calendar date, time and UTC offset (RFC 3339 §5.6 profile).
        Assert.Equal("2026-11-20T14:30:05+02:00", text);
        Assert.Equal(
            new DateTimeOffset(2026, 11, 20, 12, 30, 5, TimeSpan.Zero),
            DateTimeOffset.ParseExact(text!, "yyyy-MM-dd'T'HH:mm:ssK", CultureInfo.InvariantCulture));
    }

    [Fact]
    public void AbsentValues_AreWrittenAsNull()
    {
        var result = new CheckResult("signing.tag", "Signed tag", CheckStatus.Skip, Severity.Info, null, "No tag.", null, [new Evidence("README.md")], new StandardReference("git", "https://git-scm.com/docs/gitformat-signature"));
        var report = new Report(SampleReports.Subject with { Tag = null, Version = null, Inspected = InspectionKind.Worktree }, true, ReportSummary.From([result], 0), [result], SampleReports.GeneratedAt, []);
        using var json = Parse(report);

        var subject = json.RootElement.GetProperty("subject");
        Assert.Equal(JsonValueKind.Null, subject.GetProperty("tag").ValueKind);
        Assert.Equal(JsonValueKind.Null, subject.GetProperty("version").ValueKind);
        Assert.Equal("worktree", subject.GetProperty("inspected").GetString());
        var r = json.RootElement.GetProperty("results")[0];
        Assert.Equal(JsonValueKind.Null, r.GetProperty("package").ValueKind);
        Assert.Equal(JsonValueKind.Null, r.GetProperty("hint").ValueKind);
        Assert.Equal(JsonValueKind.Null, r.GetProperty("evidence")[0].GetProperty("line").ValueKind);
        Assert.Equal(JsonValueKind.True, json.RootElement.GetProperty("ready").ValueKind);
    }

    [Fact]
    public void Output_IsIndentedWithLineFeedsAndKeepsNonAsciiReadable()
    {
        var text = SampleReports.Render(new JsonRenderer(), SampleReports.Hostile() with { Notes = ["Zürich — ✓"] });

        Assert.StartsWith("{\n  \"schema\": \"readiness-report/1\",\n", text, StringComparison.Ordinal);
        Assert.DoesNotContain("\r", text, StringComparison.Ordinal);
        Assert.Contains("\"Zürich — ✓\"", text, StringComparison.Ordinal);
        // HTML-sensitive characters stay escaped, so the JSON can be embedded in a page safely (RFC 8259 §7 allows
        // any character to be escaped).
        Assert.DoesNotContain("<script", text, StringComparison.Ordinal);
        Assert.Contains("\\u003Cscript\\u003E", text, StringComparison.Ordinal);
    }
}
