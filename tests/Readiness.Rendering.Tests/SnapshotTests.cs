namespace Readiness.Rendering.Tests;

/// <summary>
/// Every format's output for the demo report, compared with the reviewed files in Expected/. The other test classes
/// check the properties these files must have against outside references; these catch unintended change.
/// </summary>
public sealed class SnapshotTests
{
    [Fact]
    public void DemoReport_Text_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(new TextRenderer(), SampleReports.Demo()), "demo.txt");

    [Fact]
    public void DemoReport_VerboseText_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(new TextRenderer(verbose: true), SampleReports.Demo()), "demo.verbose.txt");

    [Fact]
    public void DemoReport_ColouredText_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(new TextRenderer(color: true), SampleReports.Demo()), "demo.color.txt");

    [Fact]
    public void ReadyReport_Text_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(new TextRenderer(), SampleReports.Ready()), "ready.txt");

    [Fact]
    public void DemoReport_Markdown_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(new MarkdownRenderer(), SampleReports.Demo()), "demo.md");

    [Fact]
    public void ReadyReport_Markdown_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(new MarkdownRenderer(), SampleReports.Ready()), "ready.md");

    [Fact]
    public void HostileReport_Markdown_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(new MarkdownRenderer(), SampleReports.Hostile()), "hostile.md");

    [Fact]
    public void DemoReport_Html_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(new HtmlRenderer(), SampleReports.Demo()), "demo.html");

    [Fact]
    public void HostileReport_Html_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(new HtmlRenderer(), SampleReports.Hostile()), "hostile.html");

    [Fact]
    public void DemoReport_Json_MatchesExpectedFile() =>
        ExpectedFile.Match(SampleReports.Render(new JsonRenderer(), SampleReports.Demo()), "demo.json");
}
