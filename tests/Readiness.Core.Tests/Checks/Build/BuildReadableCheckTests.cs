using Readiness.Core.Checks.Build;
using Readiness.Core.Projects;
using Readiness.Core.Projects.MsBuild;
using Readiness.Core.Reports;
using Readiness.Testing;

namespace Readiness.Core.Tests.Checks.Build;

public sealed class BuildReadableCheckTests
{
    private const string Lib = "src/Bramble.Sketches/Bramble.Sketches.csproj";

    [Fact]
    public void EveryProjectRead_Passes()
    {
        var findings = Run((Lib, "<Project Sdk=\"Microsoft.NET.Sdk\"><PropertyGroup><TargetFramework>net10.0</TargetFramework></PropertyGroup></Project>"));

        Assert.Equal(CheckStatus.Pass, Assert.Single(findings).Status);
    }

    [Theory]
    [InlineData("<?xml version=\"1.0\"?>\n<!DOCTYPE Project [ <!ENTITY v \"1\"> ]>\n<Project Sdk=\"Microsoft.NET.Sdk\" />", 2, "DTD")]
    [InlineData("<Project Sdk=\"Microsoft.NET.Sdk\">\n<PropertyGroup>\n<Version>1</Versio>\n</PropertyGroup></Project>", 3, "Malformed XML")]
    public void UnreadableProjectFile_IsAnErrorAtItsLine(string xml, int line, string reason)
    {
        // XML 1.0 §1.2: a fatal error (not well-formed) ends normal processing; MSBuild stops the build (MSB4025).
        var finding = Assert.Single(Run((Lib, xml)));

        Assert.Equal(CheckStatus.Error, finding.Status);
        Assert.Contains(reason, finding.Message, StringComparison.Ordinal);
        Assert.Equal(new Evidence(Lib, line), Assert.Single(finding.Evidence!));
    }

    [Fact]
    public void OversizedImport_IsAnError_EvenWhenTheProjectReads()
    {
        var files = new InMemoryFileTree()
            .Add(Lib, "<Project Sdk=\"Microsoft.NET.Sdk\"><PropertyGroup><TargetFramework>net10.0</TargetFramework></PropertyGroup></Project>")
            .Add("Directory.Build.props", "<Project><!--" + new string('x', 5 * 1024 * 1024) + "--></Project>");
        var findings = CheckHarness.Run(new BuildReadableCheck(), new StaticProjectReader().Read(files), files);

        var finding = Assert.Single(findings);
        Assert.Equal(CheckStatus.Error, finding.Status);
        Assert.Contains("Directory.Build.props", finding.Message, StringComparison.Ordinal);
        Assert.Contains("limit", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ImportOutsideTheRepository_IsNotAnError()
    {
        var findings = Run((Lib, "<Project Sdk=\"Microsoft.NET.Sdk\"><Import Project=\"../../../x.props\" /></Project>"));

        Assert.Equal(CheckStatus.Pass, Assert.Single(findings).Status);
    }

    [Fact]
    public void NoProjectAtAll_Skips()
    {
        var finding = Assert.Single(CheckHarness.Run(new BuildReadableCheck(), new ProjectModel([], [])));

        Assert.Equal(CheckStatus.Skip, finding.Status);
    }

    private static IReadOnlyList<Core.Checks.Finding> Run(params (string Path, string Text)[] files)
    {
        var tree = new InMemoryFileTree(files.Select(f => KeyValuePair.Create(f.Path, f.Text)));
        return CheckHarness.Run(new BuildReadableCheck(), new StaticProjectReader().Read(tree), tree);
    }
}
