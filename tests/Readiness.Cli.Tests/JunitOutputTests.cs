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
}
