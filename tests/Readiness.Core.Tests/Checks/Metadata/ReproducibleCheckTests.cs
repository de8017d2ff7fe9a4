using Readiness.Core.Checks.Metadata;
using Readiness.Core.Reports;
using Readiness.Testing;
using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Metadata;

public sealed class ReproducibleCheckTests
{
    private const string Lib = "src/Bramble.Sketches/Bramble.Sketches.csproj";

    [Fact]
    public void CiConditionedDeterminismSourceLinkAndSnupkg_Pass()
    {
        var project = ProjectFixtures.Project(Lib)
            .Property("ContinuousIntegrationBuild", "true", unevaluated: "condition '$(GITHUB_ACTIONS)' == 'true' depends on the environment")
            .Property("PublishRepositoryUrl", "true")
            .Property("IncludeSymbols", "true")
            .Property("SymbolPackageFormat", "snupkg")
            .Build();

        var finding = Single(Run(new ReproducibleCheck(), ProjectFixtures.Model(project)));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("set under a condition", finding.Message, StringComparison.Ordinal);
        Assert.Equal(4, finding.Evidence!.Count);
    }

    [Fact]
    public void NothingSet_FailsListingEachPart()
    {
        var finding = Single(Run(new ReproducibleCheck(), ProjectFixtures.Model(ProjectFixtures.Project(Lib).Build())));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("ContinuousIntegrationBuild is never set", finding.Message, StringComparison.Ordinal);
        Assert.Contains("repository URL is not published", finding.Message, StringComparison.Ordinal);
        Assert.Contains("no symbols package", finding.Message, StringComparison.Ordinal);
        Assert.Equal([Lib], EvidenceText(finding));
    }

    [Fact]
    public void LegacySymbolsPackage_Fails()
    {
        var project = ProjectFixtures.Project(Lib)
            .Property("ContinuousIntegrationBuild", "true")
            .Property("RepositoryUrl", "https://git.example/bramblecote/sketches")
            .Property("IncludeSymbols", "true")
            .Build();

        var finding = Single(Run(new ReproducibleCheck(), ProjectFixtures.Model(project)));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("legacy .symbols.nupkg", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void EmbeddedPdb_CountsAsSymbols()
    {
        var project = ProjectFixtures.Project(Lib)
            .Property("ContinuousIntegrationBuild", "true")
            .Property("RepositoryUrl", "https://git.example/bramblecote/sketches")
            .Property("DebugType", "embedded")
            .Build();

        AssertStatus(CheckStatus.Pass, Single(Run(new ReproducibleCheck(), ProjectFixtures.Model(project))));
    }
}

/// <summary>The check over projects read by the static reader, for the CI-conditioned forms written in practice.</summary>
public sealed class ReproducibleCheckReaderTests
{
    [Theory]
    [InlineData("<PropertyGroup Condition=\"'$(GITHUB_ACTIONS)' == 'true'\">\n    <ContinuousIntegrationBuild>true</ContinuousIntegrationBuild>\n  </PropertyGroup>")]
    [InlineData("<PropertyGroup>\n    <ContinuousIntegrationBuild Condition=\"'$(TF_BUILD)' == 'true'\">true</ContinuousIntegrationBuild>\n  </PropertyGroup>")]
    public void CiConditionedProperty_PassesWithNote(string group)
    {
        var files = new InMemoryFileTree()
            .Add("Directory.Build.props", $"<Project>\n  {group}\n  <PropertyGroup>\n    <PublishRepositoryUrl>true</PublishRepositoryUrl>\n    <IncludeSymbols>true</IncludeSymbols>\n    <SymbolPackageFormat>snupkg</SymbolPackageFormat>\n  </PropertyGroup>\n</Project>\n")
            .Add("src/Bramble.Sketches/Bramble.Sketches.csproj", "<Project Sdk=\"Microsoft.NET.Sdk\">\n  <PropertyGroup>\n    <TargetFramework>net10.0</TargetFramework>\n  </PropertyGroup>\n</Project>\n");
        var model = new Core.Projects.MsBuild.StaticProjectReader().Read(files);

        var finding = Single(Run(new ReproducibleCheck(), model, files));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("Directory.Build.props:", string.Join(" ", EvidenceText(finding)), StringComparison.Ordinal);
    }
}
