using System.Text.Json;
using System.Xml;
using System.Xml.Linq;
using Readiness.Testing;

namespace Readiness.Cli.Tests;

public sealed class JunitOutputTests
{
    [Fact]
    public async Task NotReadyRelease_JunitFile_CountsEqualTheJsonReport()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Delete("CHANGELOG.md").Commit("Drop the changelog");
        repo.AnnotatedTag("v1.2.1", "1.2.1\n");
        var junit = Path.Combine(repo.Path, "out", "readiness.xml");

        var (exit, output, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "junit", "--output", junit);
        var (_, json, _) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");

        Assert.True(exit == 1, output + error);
        using var reader = XmlReader.Create(junit, new XmlReaderSettings { DtdProcessing = DtdProcessing.Prohibit });
        var suite = XDocument.Load(reader).Root!.Element("testsuite")!;
        using var report = JsonDocument.Parse(json);
        var summary = report.RootElement.GetProperty("summary");
        Assert.Equal(report.RootElement.GetProperty("results").GetArrayLength(), suite.Elements("testcase").Count());
        Assert.Equal(summary.GetProperty("fail").GetInt32(), suite.Elements("testcase").Count(c => c.Element("failure") is not null));
        Assert.Equal(summary.GetProperty("error").GetInt32(), suite.Elements("testcase").Count(c => c.Element("error") is not null));
        Assert.Contains(suite.Elements("testcase"), c => c.Attribute("classname")!.Value == "changelog.present" && c.Element("failure") is not null);
    }

    [Fact]
    public async Task OneRun_WritesSarifJunitAndJson_FromTheSameInspection()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Delete("CHANGELOG.md").Commit("Drop the changelog");
        repo.AnnotatedTag("v1.2.1", "1.2.1\n");
        var folder = Path.Combine(repo.Path, "out");

        var (exit, output, error) = await CliHarness.RunAsync(
            repo.Path, "check", "--offline", "--output", "sarif=out/r.sarif", "--output", "junit=out/r.xml", "--output", "out/r.json");

        Assert.True(exit == 1, output + error);
        Assert.Contains("Report written to", output, StringComparison.Ordinal);
        using var json = JsonDocument.Parse(await File.ReadAllTextAsync(Path.Combine(folder, "r.json")));
        using var sarif = JsonDocument.Parse(await File.ReadAllTextAsync(Path.Combine(folder, "r.sarif")));
        var suite = XDocument.Load(Path.Combine(folder, "r.xml")).Root!.Element("testsuite")!;
        var summary = json.RootElement.GetProperty("summary");

        // The three files describe one inspection: same commit, same counts.
        var commit = json.RootElement.GetProperty("subject").GetProperty("commit").GetString();
        Assert.Equal(commit, sarif.RootElement.GetProperty("runs")[0].GetProperty("properties").GetProperty("commit").GetString());
        Assert.Equal(commit, suite.Element("properties")!.Elements("property").Single(p => p.Attribute("name")!.Value == "commit").Attribute("value")!.Value);
        Assert.Equal(summary.GetProperty("fail").GetInt32().ToString(System.Globalization.CultureInfo.InvariantCulture), suite.Attribute("failures")!.Value);
        Assert.Equal(
            summary.GetProperty("fail").GetInt32() + summary.GetProperty("error").GetInt32() + summary.GetProperty("manual").GetInt32(),
            sarif.RootElement.GetProperty("runs")[0].GetProperty("results").GetArrayLength());
    }

    [Fact]
    public async Task FormatAndOutput_StillWriteOneFile_AndABadOutputIsAUsageError()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        var (exit, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json", "--output", "r.txt");
        Assert.Equal(0, exit);
        using var json = JsonDocument.Parse(await File.ReadAllTextAsync(Path.Combine(repo.Path, "r.txt")));
        Assert.Contains("Report written to", output, StringComparison.Ordinal);

        var (badExit, _, badError) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--output", "sarif=");
        Assert.Equal(2, badExit);
        Assert.Contains("--output sarif=", badError, StringComparison.Ordinal);
    }
}
