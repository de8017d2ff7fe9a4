using System.Text.Json;
using System.Xml;
using System.Xml.Linq;

using Readiness.Core.Reports;

namespace Readiness.Rendering.Tests;

public sealed class JunitRendererTests
{
    public static TheoryData<string> Fixtures => new() { "demo", "ready", "hostile" };

    private static Report Fixture(string name) => name switch
    {
        "demo" => SampleReports.Demo(),
        "ready" => SampleReports.Ready(),
        _ => SampleReports.Hostile(),
    };

    /// <summary>Parsed by System.Xml as an XML 1.0 parser does: well-formedness and character checks on, no DTD.</summary>
    private static XDocument Parse(string xml)
    {
        var settings = new XmlReaderSettings { DtdProcessing = DtdProcessing.Prohibit, CheckCharacters = true };
        using var reader = XmlReader.Create(new StringReader(xml), settings);
        return XDocument.Load(reader, LoadOptions.SetLineInfo);
    }

    private static int Count(XElement element, string attribute) => int.Parse(element.Attribute(attribute)!.Value, System.Globalization.CultureInfo.InvariantCulture);

    [Theory]
    [MemberData(nameof(Fixtures))]
    public void Counts_EqualTheJsonReportsCounts(string fixture)
    {
        var report = Fixture(fixture);
        var xml = Parse(SampleReports.Render(new JunitRenderer(), report));
        using var json = JsonDocument.Parse(SampleReports.Render(new JsonRenderer(), report));
        var summary = json.RootElement.GetProperty("summary");
        var results = json.RootElement.GetProperty("results").GetArrayLength();

        var suite = xml.Root!.Element("testsuite")!;
        var cases = suite.Elements("testcase").ToList();
        Assert.Equal(results, cases.Count);
        Assert.Equal(results, Count(suite, "tests"));
        Assert.Equal(summary.GetProperty("fail").GetInt32(), Count(suite, "failures"));
        Assert.Equal(summary.GetProperty("fail").GetInt32(), cases.Count(c => c.Element("failure") is not null));
        Assert.Equal(summary.GetProperty("error").GetInt32(), Count(suite, "errors"));
        Assert.Equal(summary.GetProperty("error").GetInt32(), cases.Count(c => c.Element("error") is not null));
        var skipped = summary.GetProperty("skip").GetInt32() + summary.GetProperty("manual").GetInt32();
        Assert.Equal(skipped, Count(suite, "skipped"));
        Assert.Equal(skipped, cases.Count(c => c.Element("skipped") is not null));
        Assert.Equal(Count(suite, "tests"), Count(xml.Root, "tests"));
        Assert.Equal(Count(suite, "failures"), Count(xml.Root, "failures"));
    }

    [Fact]
    public void Failure_CarriesMessageLocationAndFix()
    {
        var xml = Parse(SampleReports.Render(new JunitRenderer(), SampleReports.Demo()));

        var entry = xml.Descendants("testcase").Single(c => c.Attribute("classname")!.Value == "changelog.has-entry");
        Assert.Equal("changelog.has-entry (Bramble.Sketches)", entry.Attribute("name")!.Value);
        Assert.Equal("CHANGELOG.md", entry.Attribute("file")!.Value);
        Assert.Equal("7", entry.Attribute("line")!.Value);
        var failure = entry.Element("failure")!;
        Assert.Equal("block", failure.Attribute("type")!.Value);
        Assert.StartsWith("CHANGELOG.md has no section for 2.4.0", failure.Attribute("message")!.Value, StringComparison.Ordinal);
        Assert.Contains("at CHANGELOG.md:7", failure.Value, StringComparison.Ordinal);
        Assert.Contains("Fix: Move the entries", failure.Value, StringComparison.Ordinal);
        var properties = xml.Descendants("property").ToDictionary(p => p.Attribute("name")!.Value, p => p.Attribute("value")!.Value);
        Assert.Equal(SampleReports.Commit, properties["commit"]);
        Assert.Equal("host-plugin", properties["checklist"]);
    }

    [Fact]
    public void HostileText_IsWellFormedXml_WithControlCharactersEscapedVisibly()
    {
        var output = SampleReports.Render(new JunitRenderer(), SampleReports.Hostile());
        var xml = Parse(output);

        // XML 1.0 §2.2 (https://www.w3.org/TR/xml/#charsets): U+001B and U+0007 are not Chars; they appear as text.
        var file = xml.Descendants("testcase").Select(c => c.Element("failure")?.Value).First(v => v is not null)!;
        Assert.Contains("evil\\u001B]0;pwned\\u0007\\u001B[2J.txt", file, StringComparison.Ordinal);
        Assert.DoesNotContain(output, c => char.IsControl(c) && c != '\n');
        Assert.Contains("<script>x</script>.md", xml.Descendants("failure").First().Value, StringComparison.Ordinal);
    }

    [Fact]
    public void DemoReport_Junit_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(new JunitRenderer(new ToolInfo(ToolInfo.ToolName, "0.1.0+fixture")), SampleReports.Demo()), "demo.junit.xml");
}
