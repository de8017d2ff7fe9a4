using Readiness.Core.Checks.Deps;
using Readiness.Core.Reports;
using Readiness.Testing;

using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Deps;

public sealed class PackableReferencesCheckTests
{
    private const string Plugin = "src/Bramble.Sketches.Lanternfly3/Bramble.Sketches.Lanternfly3.csproj";
    private const string Lib = "src/Bramble.Sketches/Bramble.Sketches.csproj";
    private const string Internal = "src/Bramble.Internal/Bramble.Internal.csproj";

    [Fact]
    public void ReferenceToPackableProject_Passes()
    {
        var lib = ProjectFixtures.Project(Lib).Build();
        var plugin = ProjectFixtures.Project(Plugin).ProjectReference(Lib).Build();

        var finding = Single(Run(new PackableReferencesCheck(), ProjectFixtures.Model(plugin, lib)));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("Bramble.Sketches", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ReferenceToNonPackableProject_FailsNamingBothLines()
    {
        var builder = ProjectFixtures.Project(Internal);
        var isPackableAt = builder.Next();
        var internalProject = builder.Property("IsPackable", "false", isPackableAt).Build();
        var pluginBuilder = ProjectFixtures.Project(Plugin);
        var referenceAt = pluginBuilder.Next();
        var plugin = pluginBuilder.ProjectReference(Internal).Build();

        var finding = Single(Run(new PackableReferencesCheck(), ProjectFixtures.Model(plugin, internalProject)));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains($"{Plugin}:{referenceAt.Line + 1}", EvidenceText(finding));
        Assert.Contains(isPackableAt.ToString(), EvidenceText(finding));
    }

    [Fact]
    public void ToolReferencingANonPackableProject_Passes_NamingPackAsTool()
    {
        // dotnet pack of a PackAsTool project writes no dependency for its project references; they ship inside the
        // package (asserted on the real package of our own CLI in Readiness.Cli.Tests' ToolPackageTests).
        var internalProject = ProjectFixtures.Project(Internal).Property("IsPackable", "false").Build();
        var builder = ProjectFixtures.Project("src/Bramble.Tool/Bramble.Tool.csproj");
        var packAsToolAt = builder.Next();
        var tool = builder.Property("PackAsTool", "true", packAsToolAt).ProjectReference(Internal).Build();

        var finding = Single(Run(new PackableReferencesCheck(), ProjectFixtures.Model(tool, internalProject)));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains(packAsToolAt.ToString(), EvidenceText(finding));
        Assert.Contains(".NET tool", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void PrivateReferenceToNonPackableProject_Passes()
    {
        var internalProject = ProjectFixtures.Project(Internal).Property("IsPackable", "false").Build();
        var plugin = ProjectFixtures.Project(Plugin).ProjectReference(Internal, ("PrivateAssets", "All")).Build();

        AssertStatus(CheckStatus.Pass, Single(Run(new PackableReferencesCheck(), ProjectFixtures.Model(plugin, internalProject))));
    }

    [Fact]
    public void ReferenceToMissingProject_Fails()
    {
        var plugin = ProjectFixtures.Project(Plugin).ProjectReference("src/Gone/Gone.csproj").Build();

        var finding = Single(Run(new PackableReferencesCheck(), ProjectFixtures.Model(plugin)));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("src/Gone/Gone.csproj", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NoProjectReferences_Skips() =>
        AssertStatus(CheckStatus.Skip, Single(Run(new PackableReferencesCheck(), ProjectFixtures.Model(ProjectFixtures.Project(Lib).Build()))));
}
