using Readiness.Core.Checks;
using Readiness.Core.Checks.Registry;
using Readiness.Core.Registry;
using Readiness.Core.Reports;

using static Readiness.Testing.RegistryTestProjects;

namespace Readiness.Core.Tests.Checks.Registry;

public class RegistryDependenciesPublishedCheckTests
{
    private readonly RegistryDependenciesPublishedCheck check = new();

    private static Finding RunOne(string? version, PackageLookup lookup, params (string, string)[] metadata)
    {
        var project = Library("Bramble.Sketches", "2.4.0", Reference("Lanternfly.Host.Abstractions", version, metadata));
        var context = RegistryCheckContexts.For(Model(project), Facts(Unknown("Bramble.Sketches"), lookup));
        return Assert.Single(new RegistryDependenciesPublishedCheck().Run(context));
    }

    [Fact]
    public void LowerBoundPublished_Passes()
    {
        var finding = RunOne("3.1.0", Published("Lanternfly.Host.Abstractions", "3.0.0", "3.1.0", "3.2.0"));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Equal("Bramble.Sketches", finding.Package);
        Assert.Equal("src/Bramble.Sketches/Bramble.Sketches.csproj", finding.Evidence![0].Path);
    }

    [Fact]
    public void ExactVersionPublished_Passes()
    {
        Assert.Equal(CheckStatus.Pass, RunOne("[3.1.0]", Published("Lanternfly.Host.Abstractions", "3.1.0")).Status);
    }

    [Fact]
    public void LowerBoundMissingButHigherPublished_FailsNamingWhatConsumersGet()
    {
        // NuGet resolves the lowest applicable version (learn.microsoft.com/nuget/concepts/dependency-resolution).
        var finding = RunOne("3.1.0", Published("Lanternfly.Host.Abstractions", "3.0.0", "3.2.0", "3.3.0"));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("consumers would get 3.2.0", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UnknownId_Fails()
    {
        var finding = RunOne("3.1.0", Unknown("Lanternfly.Host.Abstractions"));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("not on", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void RangeNothingSatisfies_Fails()
    {
        var finding = RunOne("[4.0.0, 5.0.0)", Published("Lanternfly.Host.Abstractions", "3.0.0", "5.0.0"));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("no published version", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NormalisedLowerBound_Matches()
    {
        // 3.1 = 3.1.0 (package-versioning doc, standards.md oracle 3).
        Assert.Equal(CheckStatus.Pass, RunOne("3.1", Published("Lanternfly.Host.Abstractions", "3.1.0")).Status);
    }

    [Fact]
    public void FloatingVersionWithAMatch_Passes()
    {
        var finding = RunOne("3.*", Published("Lanternfly.Host.Abstractions", "2.9.0", "3.4.0"));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("3.4.0", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UnlistedExactVersion_Passes()
    {
        var lookup = new PackageLookup("Lanternfly.Host.Abstractions", true, "Lanternfly.Host.Abstractions", [new PublishedVersion("3.1.0", Listed: false)]);

        // Unlisted versions still restore by exact version (learn.microsoft.com/nuget/nuget-org/policies/deleting-packages).
        var finding = RunOne("3.1.0", lookup);

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("unlisted", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UnevaluatedVersion_Skips()
    {
        var finding = RunOne("$(LanternflyVersion)", Published("Lanternfly.Host.Abstractions", "3.1.0"));

        Assert.Equal(CheckStatus.Skip, finding.Status);
        Assert.Contains("could not be evaluated", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void LookupProblem_SkipsWithReason()
    {
        var finding = RunOne("3.1.0", PackageLookup.Unavailable("Lanternfly.Host.Abstractions", "HTTP 500"));

        Assert.Equal(CheckStatus.Skip, finding.Status);
        Assert.Contains("HTTP 500", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void PrivateReferences_AreNotDeclaredSoNotChecked()
    {
        // PrivateAssets="all" and IncludeAssets="none" leave the dependency out of the nuspec (NuGet pack, standards.md §5).
        var project = Library(
            "Bramble.Sketches",
            "2.4.0",
            Reference("Lanternfly.Host.Runtime", "3.1.0", ("PrivateAssets", "All")),
            Reference("Lanternfly.Host.Abstractions", "3.1.0", ("IncludeAssets", "none")),
            Reference("Bramble.Tools.Missing", "1.0.0"));
        var context = RegistryCheckContexts.For(Model(project), Facts(Unknown("Bramble.Tools.Missing")));

        var finding = Assert.Single(check.Run(context));

        Assert.Contains("Bramble.Tools.Missing", finding.Message, StringComparison.Ordinal);
        Assert.Equal(CheckStatus.Fail, finding.Status);
    }

    [Fact]
    public void SameReferenceInTwoTargets_JudgedOnce()
    {
        var project = Library(
            "Bramble.Sketches",
            "2.4.0",
            Reference("Lanternfly.Host.Abstractions", "3.1.0"),
            Reference("Lanternfly.Host.Abstractions", "3.1.0"));
        var context = RegistryCheckContexts.For(Model(project), Facts(Published("Lanternfly.Host.Abstractions", "3.1.0")));

        Assert.Single(check.Run(context));
    }
}
