using Readiness.Cli.Commands;
using Readiness.Core.Configuration;

namespace Readiness.Cli.Tests;

public sealed class ReportTargetsTests
{
    private static readonly string[] Formats = ["text", "markdown", "html", "json", "sarif", "junit"];

    [Fact]
    public void FormatAndOneOutput_WriteThatFormatToTheFile_AsBefore() =>
        Assert.Equal([new ReportTarget("json", "r.out")], ReportTargets.Plan("json", ["r.out"], Formats, "markdown"));

    [Fact]
    public void NoOption_WritesTheDefaultToStandardOutput() =>
        Assert.Equal([new ReportTarget("markdown", null)], ReportTargets.Plan(null, [], Formats, "markdown"));

    [Fact]
    public void NamedOutputs_EachTakeTheirFormat_AndFormatGoesToStandardOutput()
    {
        var plan = ReportTargets.Plan("markdown", ["sarif=out/r.sarif", "JUNIT=out/r.xml", "json=r.json"], Formats, "text");

        Assert.Equal(
            [new ReportTarget("markdown", null), new ReportTarget("sarif", "out/r.sarif"), new ReportTarget("junit", "out/r.xml"), new ReportTarget("json", "r.json")],
            plan);
    }

    [Fact]
    public void PlainOutputsWithoutFormat_TakeTheFormatTheirExtensionNames() =>
        Assert.Equal(
            [new ReportTarget("sarif", "a.sarif"), new ReportTarget("junit", "b.xml"), new ReportTarget("text", "c.log"), new ReportTarget("text", "weird=name.txt")],
            ReportTargets.Plan(null, ["a.sarif", "b.xml", "c.log", "weird=name.txt"], Formats, "markdown"));

    [Theory]
    [InlineData("sarif=")]
    [InlineData("")]
    public void EmptyFile_IsAUsageError(string output) =>
        Assert.Throws<ConfigurationException>(() => ReportTargets.Plan(null, [output], Formats, "text"));

    [Fact]
    public void SameFileTwice_IsAUsageError() =>
        Assert.Throws<ConfigurationException>(() => ReportTargets.Plan(null, ["sarif=r.out", "json=./r.out"], Formats, "text"));
}
