using Readiness.Core.Checks.Matrix;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Testing;

using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Matrix;

public sealed class TestedTargetsCheckTests
{
    private const string Lib = "src/Bramble.Sketches/Bramble.Sketches.csproj";
    private const string Tests = "tests/Bramble.Sketches.Tests/Bramble.Sketches.Tests.csproj";

    private static ProjectModel Model(string libTargets, string testTargets) => ProjectFixtures.Model(
        ProjectFixtures.Project(Lib).Property("TargetFrameworks", libTargets).Build(),
        ProjectFixtures.Project(Tests).Property("TargetFrameworks", testTargets).Property("IsTestProject", "true").ProjectReference(Lib).Build());

    private static InMemoryFileTree Ci(string versions) => new InMemoryFileTree().Add(".github/workflows/ci.yml", $$$"""
        jobs:
          test:
            strategy:
              matrix:
                sdk: [{{{versions}}}]
            steps:
              - uses: actions/setup-dotnet@v4
                with:
                  dotnet-version: ${{ matrix.sdk }}
        """);

    [Fact]
    public void EveryTargetTestedAndBuildable_Passes()
    {
        var finding = Single(Run(new TestedTargetsCheck(), Model("netstandard2.0;net8.0;net10.0", "net8.0;net10.0"), Ci("8.0.x, 10.0.x")));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains(".github/workflows/ci.yml:9", EvidenceText(finding));
        Assert.Contains($"{Tests}:3", EvidenceText(finding));
    }

    [Fact]
    public void RuntimeTargetNoTestTargets_Fails()
    {
        var finding = Single(Run(new TestedTargetsCheck(), Model("net8.0;net10.0", "net10.0"), Ci("10.0.x")));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("net8.0: no test project targets it", finding.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("net10.0:", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void TargetNewerThanEveryCiSdk_Fails()
    {
        var finding = Single(Run(new TestedTargetsCheck(), Model("net8.0;net10.0", "net8.0;net10.0"), Ci("8.0.x, 9.0.x")));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("net10.0: no CI SDK can build it", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NoTestProjectReferencesTheLibrary_Fails()
    {
        var model = ProjectFixtures.Model(
            ProjectFixtures.Project(Lib).Property("TargetFramework", "net10.0").Build(),
            ProjectFixtures.Project(Tests).Property("TargetFramework", "net10.0").Property("IsTestProject", "true").Build());

        var finding = Single(Run(new TestedTargetsCheck(), model, Ci("10.0.x")));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("no test project references Bramble.Sketches", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void TransitiveTestReference_Counts()
    {
        var plugin = "src/Bramble.Sketches.Lanternfly3/Bramble.Sketches.Lanternfly3.csproj";
        var model = ProjectFixtures.Model(
            ProjectFixtures.Project(Lib).Property("TargetFramework", "net10.0").Build(),
            ProjectFixtures.Project(plugin).Property("TargetFramework", "net10.0").ProjectReference(Lib).Build(),
            ProjectFixtures.Project(Tests).Property("TargetFramework", "net10.0").Property("IsTestProject", "true").ProjectReference(plugin).Build());

        var findings = Run(new TestedTargetsCheck(), model, Ci("10.0.x"));

        Assert.All(findings, f => AssertStatus(CheckStatus.Pass, f));
        Assert.Equal(2, findings.Count);
    }

    [Fact]
    public void NoCiConfiguration_IsASkipWithNote()
    {
        var finding = Single(Run(new TestedTargetsCheck(), Model("net10.0", "net10.0"), new InMemoryFileTree()));

        AssertStatus(CheckStatus.Skip, finding);
        Assert.Contains("No CI configuration", finding.Message, StringComparison.Ordinal);
    }
}
