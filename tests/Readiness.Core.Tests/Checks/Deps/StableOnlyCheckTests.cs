using Readiness.Core.Checks.Deps;
using Readiness.Core.Reports;
using Readiness.Testing;

using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Deps;

public sealed class StableOnlyCheckTests
{
    private const string Lib = "src/Bramble.Sketches/Bramble.Sketches.csproj";

    // NuGet's own words: NU5104 ("A stable release of a package should not have a prerelease dependency") and
    // NU1604 ("Project dependency … does not contain an inclusive lower bound") — warning codes from memory;
    // range syntax per https://learn.microsoft.com/nuget/concepts/package-versioning#version-ranges.
    [Theory]
    [InlineData("3.1.0", null)]
    [InlineData("[3.1.0,4.0.0)", null)]
    [InlineData("[3.1.0]", null)]
    [InlineData("3.1.0-beta.1", "pre-release")]
    [InlineData("[3.0.0,4.0.0-rc.1)", "pre-release")]
    [InlineData("3.*", "floats")]
    [InlineData("*", "floats")]
    [InlineData("3.1.*-*", "floats")]
    [InlineData("(,4.0.0)", "no lower bound")]
    [InlineData("(3.0.0,)", "exclusive lower bound")]
    [InlineData("", "no version")]
    public void Problem_FollowsNuGetRanges(string version, string? expected)
    {
        var problem = StableOnlyCheck.Problem(version);

        if (expected is null)
        {
            Assert.Null(problem);
        }
        else
        {
            Assert.Contains(expected, problem, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void PrereleaseDependencyOfStableRelease_FailsAtTheVersionLine()
    {
        var builder = ProjectFixtures.Project(Lib).Reference("Bramble.Collections", "1.2.0");
        builder.Central("Directory.Packages.props", "Lanternfly.Host.Abstractions", "3.2.0-preview.2", out var central);
        var lib = builder.ReferenceAt(builder.Next(), "Lanternfly.Host.Abstractions", "3.2.0-preview.2", central).Build();

        var finding = Single(Run(new StableOnlyCheck(), ProjectFixtures.Model(lib), tag: TestSnapshots.Tag("v2.4.0")));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Equal([central.ToString()], EvidenceText(finding));
        Assert.DoesNotContain("Bramble.Collections", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void PrivatePrereleaseTool_IsNotADependency()
    {
        var lib = ProjectFixtures.Project(Lib)
            .Reference("Bramble.Build.Tasks", "0.9.0-alpha", ("PrivateAssets", "all"))
            .Reference("Bramble.Collections", "1.2.0")
            .Build();

        var finding = Single(Run(new StableOnlyCheck(), ProjectFixtures.Model(lib), tag: TestSnapshots.Tag("v2.4.0")));

        AssertStatus(CheckStatus.Pass, finding);
    }

    [Fact]
    public void ProjectReferenceToPrereleaseProject_Fails()
    {
        var core = ProjectFixtures.Project("src/Bramble.Core/Bramble.Core.csproj").Property("Version", "1.0.0-rc.1").Build();
        var lib = ProjectFixtures.Project(Lib).ProjectReference(core.Path).Build();

        var finding = Single(Run(new StableOnlyCheck(), ProjectFixtures.Model(lib, core), tag: TestSnapshots.Tag("v2.4.0")), "Bramble.Sketches");

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("Bramble.Core", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void PrereleaseRelease_IsSkipped()
    {
        var lib = ProjectFixtures.Project(Lib).Reference("Lanternfly.Host.Abstractions", "3.2.0-preview.2").Build();

        var finding = Single(Run(new StableOnlyCheck(), ProjectFixtures.Model(lib), tag: TestSnapshots.Tag("v2.5.0-beta.1")));

        AssertStatus(CheckStatus.Skip, finding);
    }
}
