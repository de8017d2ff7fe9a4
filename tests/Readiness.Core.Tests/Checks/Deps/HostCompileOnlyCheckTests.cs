using Readiness.Core.Checks.Deps;
using Readiness.Core.Reports;
using Readiness.Testing;

using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Deps;

public sealed class HostCompileOnlyCheckTests
{
    private const string Plugin = "src/Bramble.Sketches.Lanternfly3/Bramble.Sketches.Lanternfly3.csproj";
    private const string HostConfig = "host-packages: [\"Lanternfly.Host.*\"]\n";

    private static ProjectFixtures.Builder PluginProject() =>
        ProjectFixtures.Project(Plugin).Property("TargetFrameworks", "net8.0;net10.0");

    [Fact]
    public void PrivateAssetsAll_Passes()
    {
        var plugin = PluginProject()
            .Reference("Lanternfly.Host.Abstractions", "3.1.0", ("PrivateAssets", "all"))
            .Reference("Lanternfly.Host.Runtime", "3.1.0", ("ExcludeAssets", "runtime"))
            .Build();

        var finding = Single(Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(plugin), config: HostConfig));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("Lanternfly.Host.Abstractions (private", finding.Message, StringComparison.Ordinal);
        Assert.Contains("Lanternfly.Host.Runtime (runtime assets excluded)", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ReferenceWithoutAssetMetadata_FailsAtItsLine()
    {
        var builder = PluginProject().Reference("Lanternfly.Host.Abstractions", "3.1.0", ("PrivateAssets", "all"));
        var at = builder.Next();
        var plugin = builder.ReferenceAt(at, "Lanternfly.Host.Runtime", "3.1.0", null).Build();

        var finding = Single(Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(plugin), config: HostConfig));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Equal("Bramble.Sketches.Lanternfly3", finding.Package);
        Assert.Equal([at.ToString()], EvidenceText(finding));
        Assert.Contains("Lanternfly.Host.Runtime", finding.Message, StringComparison.Ordinal);
        Assert.Contains("PrivateAssets=\"all\"", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void ExcludeAssetsWithoutRuntime_Fails()
    {
        var plugin = PluginProject().Reference("Lanternfly.Host.Runtime", "3.1.0", ("ExcludeAssets", "build;analyzers")).Build();

        var finding = Single(Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(plugin), config: HostConfig));

        AssertStatus(CheckStatus.Fail, finding);
    }

    [Fact]
    public void MetadataOnCentralPackageVersion_FailsWithHintNamingTheIgnoredLine()
    {
        var builder = PluginProject();
        builder.Central("Directory.Packages.props", "Lanternfly.Host.Runtime", "3.1.0", out var central, ("PrivateAssets", "all"));
        var reference = builder.Next();
        var plugin = builder.ReferenceAt(reference, "Lanternfly.Host.Runtime", "3.1.0", central).Build();

        var finding = Single(Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(plugin), config: HostConfig));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains(central.ToString(), EvidenceText(finding));
        Assert.Contains($"PackageVersion Lanternfly.Host.Runtime at {central} has no effect", finding.Hint, StringComparison.Ordinal);
        Assert.Contains($"Move PrivateAssets to the PackageReference at {reference}", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void ReferenceInheritedFromDirectoryBuildProps_FailsWithHintNamingThatFile()
    {
        var builder = PluginProject();
        var inherited = builder.Next("Directory.Build.props");
        var plugin = builder.ReferenceAt(inherited, "Lanternfly.Host.Runtime", "3.1.0", null).Build();
        var plain = ProjectFixtures.Project("src/Bramble.Sketches/Bramble.Sketches.csproj")
            .ReferenceAt(inherited, "Lanternfly.Host.Runtime", "3.1.0", null).Build();

        var findings = Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(plugin, plain), config: HostConfig);

        Assert.Equal(2, findings.Count);
        Assert.All(findings, f => AssertStatus(CheckStatus.Fail, f));
        Assert.All(findings, f => Assert.Contains("Directory.Build.props adds Lanternfly.Host.Runtime to every project below it", f.Hint, StringComparison.Ordinal));
        Assert.All(findings, f => Assert.Equal([inherited.ToString()], EvidenceText(f)));
    }

    [Fact]
    public void HostPatternsFromChecklistWith_AreUsed()
    {
        var plugin = PluginProject().Reference("Lanternfly.Host.Runtime", "3.1.0").Build();

        var finding = Single(Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(plugin), with: HostConfig));

        AssertStatus(CheckStatus.Fail, finding);
    }

    [Fact]
    public void TargetConditionedReference_IsJudgedAndNamesItsTarget()
    {
        var plugin = PluginProject()
            .ReferenceFor("net8.0", "Lanternfly.Host.Runtime", "3.1.0", ("PrivateAssets", "all"))
            .ReferenceFor("net10.0", "Lanternfly.Host.Runtime", "3.2.0")
            .Build();

        var finding = Single(Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(plugin), config: HostConfig));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("for net10.0", finding.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("for net8.0", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UnexpandedAssetMetadata_IsSkippedNotGuessed()
    {
        var plugin = PluginProject().Reference("Lanternfly.Host.Runtime", "3.1.0", ("PrivateAssets", "$(HostPrivate)")).Build();

        var finding = Single(Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(plugin), config: HostConfig));

        AssertStatus(CheckStatus.Skip, finding);
        Assert.Contains("$(HostPrivate)", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void TestProjects_AreNotJudged()
    {
        var tests = ProjectFixtures.Project("tests/Bramble.Sketches.Tests/Bramble.Sketches.Tests.csproj")
            .Reference("Microsoft.NET.Test.Sdk", "18.0.1")
            .Reference("Lanternfly.Host.Runtime", "3.1.0")
            .Build();

        var finding = Single(Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(tests), config: HostConfig));

        AssertStatus(CheckStatus.Skip, finding);
    }

    [Fact]
    public void NoHostPackagesConfigured_Skips()
    {
        var plugin = PluginProject().Reference("Lanternfly.Host.Runtime", "3.1.0").Build();

        var finding = Single(Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(plugin)));

        AssertStatus(CheckStatus.Skip, finding);
        Assert.Contains("host-packages", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void RoslynComponentWithPublicCodeAnalysisReference_Fails()
    {
        var generator = ProjectFixtures.Project("src/Bramble.Sketches.Generators/Bramble.Sketches.Generators.csproj")
            .Property("IsRoslynComponent", "true")
            .Reference("Microsoft.CodeAnalysis.CSharp", "4.14.0")
            .Reference("Microsoft.CodeAnalysis.Analyzers", "3.11.0", ("PrivateAssets", "all"))
            .Build();

        var finding = Single(Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(generator)));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("Microsoft.CodeAnalysis.CSharp", finding.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("Microsoft.CodeAnalysis.Analyzers", finding.Message, StringComparison.Ordinal);
        Assert.Contains("IsRoslynComponent", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void RoslynComponentNeedsPrivateNotJustRuntimeExcluded()
    {
        var analyzer = ProjectFixtures.Project("src/Bramble.Analyzers/Bramble.Analyzers.csproj")
            .Pack("$(OutputPath)/Bramble.Analyzers.dll", null, "analyzers/dotnet/cs")
            .Reference("Microsoft.CodeAnalysis.CSharp", "4.14.0", ("ExcludeAssets", "runtime"))
            .Build();

        var finding = Single(Run(new HostCompileOnlyCheck(), ProjectFixtures.Model(analyzer)));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("analyzers/", finding.Message, StringComparison.Ordinal);
    }
}
