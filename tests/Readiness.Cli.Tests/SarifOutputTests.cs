using System.Text.Json;
using Readiness.Testing;

namespace Readiness.Cli.Tests;

public sealed class SarifOutputTests
{
    [Fact]
    public async Task DemoRepository_SarifReport_HasNoValidatorErrors_AndLocatesTheFindings()
    {
        using var folder = new TempDirectory();
        var (demoExit, demoOut, demoError) = await CliHarness.RunAsync(folder.Path, "demo", "--keep", "demo");
        Assert.True(demoExit == 0, demoOut + demoError);
        var repository = Path.Combine(folder.Path, "demo", "bramble-sketches");
        var sarif = Path.Combine(folder.Path, "readiness.sarif");

        var (exit, output, error) = await CliHarness.RunAsync(
            folder.Path, "check", repository, "--ref", "v2.4.0", "--offline", "--format", "sarif", "--output", sarif);

        Assert.True(exit == 1, output + error);
        Assert.Contains("Report written to", output, StringComparison.Ordinal);

        // Reference validator: the SARIF multitool (npm @microsoft/sarif-multitool), SARIF 2.1.0 schema and rules.
        var errors = SarifMultitool.Validate([sarif]).Where(f => f.Level == "error").ToList();
        Assert.True(errors.Count == 0, string.Join('\n', errors));

        using var log = JsonDocument.Parse(await File.ReadAllTextAsync(sarif));
        var run = log.RootElement.GetProperty("runs")[0];
        var results = run.GetProperty("results").EnumerateArray().ToList();
        Assert.Contains(results, r => r.GetProperty("ruleId").GetString() == "changelog.has-entry"
            && r.GetProperty("locations")[0].GetProperty("physicalLocation").GetProperty("artifactLocation").GetProperty("uri").GetString() == "CHANGELOG.md");
        var rules = run.GetProperty("tool").GetProperty("driver").GetProperty("rules").EnumerateArray();
        Assert.All(rules.Where(r => !r.GetProperty("id").GetString()!.StartsWith("manual.", StringComparison.Ordinal)), r =>
            Assert.EndsWith("/" + r.GetProperty("id").GetString() + ".md", r.GetProperty("helpUri").GetString(), StringComparison.Ordinal));
    }

    [Fact]
    public async Task DocsUrlVariable_ChangesTheHelpLinks_AndABadOneIsAUsageError()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        var env = new Dictionary<string, string> { ["READINESS_DOCS_URL"] = "https://docs.bramblecote.example/readiness/checks" };
        var (exit, output, error) = await CliHarness.RunWithInputAsync(repo.Path, string.Empty, env, "check", "--offline", "--format", "sarif");
        Assert.True(exit == 0, output + error);
        using var log = JsonDocument.Parse(output);
        var rule = log.RootElement.GetProperty("runs")[0].GetProperty("tool").GetProperty("driver").GetProperty("rules")[0];
        Assert.StartsWith("https://docs.bramblecote.example/readiness/checks/", rule.GetProperty("helpUri").GetString(), StringComparison.Ordinal);

        env["READINESS_DOCS_URL"] = "docs/checks";
        var (badExit, _, badError) = await CliHarness.RunWithInputAsync(repo.Path, string.Empty, env, "check", "--offline", "--format", "sarif");
        Assert.Equal(2, badExit);
        Assert.Contains("READINESS_DOCS_URL", badError, StringComparison.Ordinal);
    }
}
