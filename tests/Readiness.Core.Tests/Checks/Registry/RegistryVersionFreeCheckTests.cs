using Readiness.Core.Checks.Registry;
using Readiness.Core.Registry;
using Readiness.Core.Reports;
using Readiness.Testing;

using static Readiness.Testing.RegistryTestProjects;

namespace Readiness.Core.Tests.Checks.Registry;

public class RegistryVersionFreeCheckTests
{
    private readonly RegistryVersionFreeCheck check = new();

    [Fact]
    public void VersionAlreadyPublished_Fails()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "2.4.0")), Facts(Published("Bramble.Sketches", "2.3.1", "2.4.0")), tag: TestSnapshots.Tag("v2.4.0"));

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("already published", finding.Message, StringComparison.Ordinal);
        Assert.Contains("2.4.0", finding.Hint, StringComparison.Ordinal);
        Assert.Equal("Bramble.Sketches", finding.Package);
    }

    [Fact]
    public void VersionNotYetPublished_Passes()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "2.4.0")), Facts(Published("Bramble.Sketches", "2.3.0", "2.3.1")), tag: TestSnapshots.Tag("v2.4.0"));

        Assert.Equal(CheckStatus.Pass, Assert.Single(check.Run(context)).Status);
    }

    [Fact]
    public void NewId_Passes()
    {
        var context = RegistryCheckContexts.For(Model(Library("Bramble.Sketches", "2.4.0")), Facts(Unknown("Bramble.Sketches")));

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("no package Bramble.Sketches", finding.Message, StringComparison.Ordinal);
    }

    // NuGet normalisation (learn.microsoft.com/nuget/concepts/package-versioning, "Normalized version numbers";
    // standards.md oracles 3–5): each pair is one version to the registry.
    [Theory]
    [InlineData("1.0", "1.0.0")]
    [InlineData("1.00", "1.0.0")]
    [InlineData("1.01.1", "1.1.1")]
    [InlineData("1.0.0.0", "1.0.0")]
    [InlineData("1.0.01.0", "1.0.1")]
    [InlineData("1.0.7+r3456", "1.0.7")]
    [InlineData("1.0.0009.01-1.1+A", "1.0.9.1-1.1")]
    [InlineData("1.0+A", "1.0.0")]
    [InlineData("1.0.0-Alpha", "1.0.0-alpha")]
    public void SameVersionAfterNormalisation_Fails(string candidate, string published)
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "0.1.0")), Facts(Published("Bramble.Sketches", published)), version: candidate);

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Fail, finding.Status);
    }

    [Fact]
    public void NormalisedDifferently_SaysHowNuGetReadsIt()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches")), Facts(Published("Bramble.Sketches", "1.0.0")), version: "1.0");

        var finding = Assert.Single(check.Run(context));

        // package-versioning doc: 1.0 and 1.0.0 are the same version; ToNormalizedString gives 1.0.0.
        Assert.Contains("NuGet reads 1.0 as 1.0.0", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UnlistedVersion_StillTaken()
    {
        var lookup = new PackageLookup("Bramble.Sketches", true, "Bramble.Sketches", [new PublishedVersion("2.4.0", Listed: false)]);
        var context = RegistryCheckContexts.For(Model(Library("Bramble.Sketches", "2.4.0")), Facts(lookup));

        var finding = Assert.Single(check.Run(context));

        // Unlisting is not deletion (learn.microsoft.com/nuget/nuget-org/policies/deleting-packages).
        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("unlisted", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Offline_Skips()
    {
        var context = RegistryCheckContexts.For(Model(Library("Bramble.Sketches", "2.4.0")), null);

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Skip, finding.Status);
        Assert.Contains("offline", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void RegistryUnavailable_SkipsWithReason()
    {
        var facts = RegistryFacts.Offline("offline: --offline was given");
        var context = RegistryCheckContexts.For(Model(Library("Bramble.Sketches", "2.4.0")), facts);

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Skip, finding.Status);
        Assert.Contains("--offline was given", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void RegistryRequired_OfflineOrUnanswered_Fails()
    {
        var model = Model(Library("Bramble.Sketches", "2.4.0"), Library("Bramble.Sketches.Lanternfly3", "2.4.0"));
        const string Required = "registry-required: true\n";

        var offline = Assert.Single(check.Run(RegistryCheckContexts.For(model, null, yaml: Required)));
        Assert.Equal(CheckStatus.Fail, offline.Status);
        Assert.Contains("registry-required", offline.Message, StringComparison.Ordinal);
        Assert.Contains("waive", offline.Hint, StringComparison.Ordinal);

        var unreachable = Assert.Single(check.Run(RegistryCheckContexts.For(model, RegistryFacts.Offline("the feed did not answer within 3 s"), yaml: Required)));
        Assert.Equal(CheckStatus.Fail, unreachable.Status);
        Assert.Contains("did not answer within 3 s", unreachable.Message, StringComparison.Ordinal);

        var facts = Facts(PackageLookup.Unavailable("Bramble.Sketches", "HTTP 500 from the feed"), Unknown("Bramble.Sketches.Lanternfly3"));
        var findings = check.Run(RegistryCheckContexts.For(model, facts, yaml: Required)).ToList();
        Assert.Equal(CheckStatus.Fail, findings.Single(f => f.Package == "Bramble.Sketches").Status);
        Assert.Equal(CheckStatus.Pass, findings.Single(f => f.Package == "Bramble.Sketches.Lanternfly3").Status);
    }

    [Fact]
    public void LookupProblem_SkipsThatPackageWithReason()
    {
        var facts = Facts(
            PackageLookup.Unavailable("Bramble.Sketches", "HTTP 500 from the feed"),
            Unknown("Bramble.Sketches.Lanternfly3"));
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "2.4.0"), Library("Bramble.Sketches.Lanternfly3", "2.4.0")), facts);

        var findings = check.Run(context).ToList();

        Assert.Equal(CheckStatus.Skip, findings.Single(f => f.Package == "Bramble.Sketches").Status);
        Assert.Contains("HTTP 500", findings.Single(f => f.Package == "Bramble.Sketches").Message, StringComparison.Ordinal);
        Assert.Equal(CheckStatus.Pass, findings.Single(f => f.Package == "Bramble.Sketches.Lanternfly3").Status);
    }

    [Fact]
    public void PerPackageTag_JudgesOnlyTheTaggedPackage()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "2.4.0"), Library("Bramble.Sketches.Lanternfly3", "1.0.0")),
            Facts(Published("Bramble.Sketches", "2.4.0"), Published("Bramble.Sketches.Lanternfly3", "1.0.0")),
            yaml: "tag-pattern: \"{id}/v{version}\"\n",
            tag: TestSnapshots.Tag("Bramble.Sketches.Lanternfly3/v1.1.0"));

        var findings = check.Run(context).ToList();

        Assert.Equal(CheckStatus.Skip, findings.Single(f => f.Package == "Bramble.Sketches").Status);
        Assert.Equal(CheckStatus.Pass, findings.Single(f => f.Package == "Bramble.Sketches.Lanternfly3").Status);
    }
}
