using System.Text.Json;

using Readiness.Core.Engine;
using Readiness.Core.Reports;
using Readiness.Testing;

namespace Readiness.Rendering.Tests;

public sealed class SarifRendererTests
{
    private static readonly ToolInfo FixedTool = new(ToolInfo.ToolName, "0.1.0+fixture");

    private static SarifRenderer Renderer() => new(CheckCatalog.BuiltIn(), new CheckPages(), FixedTool);

    private static readonly string[] Fixtures = ["demo", "ready", "hostile"];

    private static Report Fixture(string name) => name switch
    {
        "demo" => SampleReports.Demo(),
        "ready" => SampleReports.Ready(),
        _ => SampleReports.Hostile(),
    };

    private static JsonElement Run(Report report)
    {
        using var document = JsonDocument.Parse(SampleReports.Render(Renderer(), report));
        return document.RootElement.GetProperty("runs")[0].Clone();
    }

    [Fact]
    public void EveryFixture_HasNoErrorsFromTheSarifMultitool()
    {
        // Reference validator: the SARIF multitool (npm @microsoft/sarif-multitool 5.7.0), which checks the log
        // against the OASIS SARIF 2.1.0 schema and its own rules.
        using var folder = new TempDirectory();
        var files = Fixtures.Select(name =>
        {
            var file = Path.Combine(folder.Path, name + ".sarif");
            File.WriteAllText(file, SampleReports.Render(new SarifRenderer(CheckCatalog.BuiltIn()), Fixture(name)));
            return file;
        }).ToList();

        var findings = SarifMultitool.Validate(files);

        var errors = findings.Where(f => f.Level == "error").ToList();
        Assert.True(errors.Count == 0, "validator errors:\n" + string.Join('\n', errors));
    }

    [Fact]
    public void SarifMultitool_ReportsAnInvalidLog()
    {
        // Control for the test above: a log that breaks the 2.1.0 schema (no "runs", a wrong version) must give errors,
        // so 0 errors there means the validator looked.
        using var folder = new TempDirectory();
        var file = Path.Combine(folder.Path, "broken.sarif");
        File.WriteAllText(file, "{\"version\":\"2.1.0\",\"runs\":[{\"tool\":{\"driver\":{}},\"results\":[{\"message\":{}}]}]}");

        var findings = SarifMultitool.Validate([file]);

        Assert.Contains(findings, f => f.Level == "error");
    }

    [Fact]
    public void DemoReport_Sarif_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(Renderer(), SampleReports.Demo()), "demo.sarif");

    [Fact]
    public void Log_NamesVersionAndSchemaOfSarif210()
    {
        using var document = JsonDocument.Parse(SampleReports.Render(Renderer(), SampleReports.Demo()));

        // SARIF 2.1.0 §3.13.2 (version "2.1.0") and §3.13.3 ($schema).
        Assert.Equal("2.1.0", document.RootElement.GetProperty("version").GetString());
        Assert.Equal(SarifRenderer.SchemaUri, document.RootElement.GetProperty("$schema").GetString());
    }

    [Fact]
    public void Rules_OnePerCheck_WithDescriptionsPageAndChecklistLevel()
    {
        var report = SampleReports.Demo();
        var rules = Run(report).GetProperty("tool").GetProperty("driver").GetProperty("rules").EnumerateArray().ToList();

        var ids = rules.Select(r => r.GetProperty("id").GetString()).ToList();
        Assert.Equal(report.Results.Select(r => r.Check).Distinct().Order(StringComparer.Ordinal), ids.Order(StringComparer.Ordinal));
        var tag = rules.Single(r => r.GetProperty("id").GetString() == "version.matches-tag");
        var descriptor = CheckCatalog.BuiltIn().Find("version.matches-tag")!.Descriptor;
        Assert.Equal(descriptor.Title + ".", tag.GetProperty("shortDescription").GetProperty("text").GetString());
        Assert.Equal(descriptor.Why, tag.GetProperty("fullDescription").GetProperty("text").GetString());
        Assert.Equal(CheckPages.DefaultBase + "version.matches-tag.md", tag.GetProperty("helpUri").GetString());
        Assert.True(Uri.IsWellFormedUriString(tag.GetProperty("helpUri").GetString(), UriKind.Absolute));

        // §3.27.10 levels: block → error, warn → warning (the checklist's severity, not the check's default).
        Assert.Equal("error", tag.GetProperty("defaultConfiguration").GetProperty("level").GetString());
        var signing = rules.Single(r => r.GetProperty("id").GetString() == "signing.tag");
        Assert.Equal("warning", signing.GetProperty("defaultConfiguration").GetProperty("level").GetString());
    }

    [Fact]
    public void Results_OnePerFailureErrorAndUnconfirmedManualItem_WithLocationAndFix()
    {
        var report = SampleReports.Demo();
        var results = Run(report).GetProperty("results").EnumerateArray().ToList();

        Assert.Equal(report.Summary.Fail + report.Summary.Error + report.Summary.Manual, results.Count);
        var host = results.Single(r => r.GetProperty("ruleId").GetString() == "deps.host-compile-only");
        Assert.Equal("fail", host.GetProperty("kind").GetString());
        Assert.Equal("error", host.GetProperty("level").GetString());
        var text = host.GetProperty("message").GetProperty("text").GetString()!;
        Assert.Contains("Lanternfly.Host.Runtime is referenced", text, StringComparison.Ordinal);
        Assert.Contains("Fix: Add PrivateAssets=\"all\"", text, StringComparison.Ordinal);
        var physical = host.GetProperty("locations")[0].GetProperty("physicalLocation");
        Assert.Equal("src/Bramble.Sketches.Lanternfly3/Bramble.Sketches.Lanternfly3.csproj", physical.GetProperty("artifactLocation").GetProperty("uri").GetString());
        Assert.Equal("SRCROOT", physical.GetProperty("artifactLocation").GetProperty("uriBaseId").GetString());
        Assert.Equal(12, physical.GetProperty("region").GetProperty("startLine").GetInt32());

        // §3.27.9: a result other than "fail" has level "none"; a manual item needs a person's review.
        var manual = results.Single(r => r.GetProperty("ruleId").GetString() == "manual.memory-stable");
        Assert.Equal("review", manual.GetProperty("kind").GetString());
        Assert.Equal("none", manual.GetProperty("level").GetString());

        // A path without a line has no region; a finding without evidence has no location.
        var secret = results.Single(r => r.GetProperty("ruleId").GetString() == "secrets.none-committed");
        Assert.False(secret.GetProperty("locations")[0].GetProperty("physicalLocation").TryGetProperty("region", out _));
        var signing = results.Single(r => r.GetProperty("ruleId").GetString() == "signing.tag");
        Assert.False(signing.TryGetProperty("locations", out _));
    }

    [Fact]
    public void Run_CarriesToolVersionCommitAndChecklist()
    {
        var run = Run(SampleReports.Demo());

        var driver = run.GetProperty("tool").GetProperty("driver");
        Assert.Equal("Readiness", driver.GetProperty("name").GetString());
        Assert.Equal("0.1.0+fixture", driver.GetProperty("version").GetString());
        Assert.Equal("0.1.0", driver.GetProperty("semanticVersion").GetString());
        var properties = run.GetProperty("properties");
        Assert.Equal("0.1.0+fixture", properties.GetProperty("toolVersion").GetString());
        Assert.Equal(SampleReports.Commit, properties.GetProperty("commit").GetString());
        Assert.Equal("host-plugin", properties.GetProperty("checklist").GetString());
        var provenance = run.GetProperty("versionControlProvenance")[0];
        Assert.Equal(SampleReports.Commit, provenance.GetProperty("revisionId").GetString());
        Assert.Equal("https://git.example/bramblecote/bramble-sketches", provenance.GetProperty("repositoryUri").GetString());
    }

    [Fact]
    public void HostileReport_PathsBecomeRelativeUriReferences_AndNoRawControlCharacterIsWritten()
    {
        var output = SampleReports.Render(Renderer(), SampleReports.Hostile());
        using var document = JsonDocument.Parse(output);
        var uris = document.RootElement.GetProperty("runs")[0].GetProperty("results").EnumerateArray()
            .SelectMany(r => new[] { "locations", "relatedLocations" }.SelectMany(p => r.TryGetProperty(p, out var l) ? l.EnumerateArray() : default))
            .Select(l => l.GetProperty("physicalLocation").GetProperty("artifactLocation").GetProperty("uri").GetString()!)
            .ToList();

        Assert.Equal(3, uris.Count);
        foreach (var uri in uris)
        {
            // RFC 3986: a relative reference with no scheme; System.Uri is the reference parser.
            Assert.True(Uri.IsWellFormedUriString(uri, UriKind.Relative), uri);
        }

        Assert.Contains("%5D%28javascript%3Aalert%281%29%29", uris);
        Assert.DoesNotContain(output, c => char.IsControl(c) && c != '\n');
    }
}
