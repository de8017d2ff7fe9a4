using Readiness.Core.Checks.Registry;
using Readiness.Core.Registry;
using Readiness.Core.Reports;

using static Readiness.Testing.RegistryTestProjects;

namespace Readiness.Core.Tests.Checks.Registry;

public class RegistryIdOwnedCheckTests
{
    private readonly RegistryIdOwnedCheck check = new();

    [Fact]
    public void NewId_Passes()
    {
        var context = RegistryCheckContexts.For(Model(Library("Bramble.Sketches", "1.0.0")), Facts(Unknown("Bramble.Sketches")));

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("new id", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void EveryPublishedVersionTaggedHere_Passes()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "2.4.0")),
            Facts(Published("Bramble.Sketches", "2.3.0", "2.3.1")),
            tags: [RegistryCheckContexts.OldTag("v2.3.0"), RegistryCheckContexts.OldTag("v2.3.1")]);

        Assert.Equal(CheckStatus.Pass, Assert.Single(check.Run(context)).Status);
    }

    [Fact]
    public void TagsMatchAfterNormalisation_Passes()
    {
        // package-versioning doc: 1.0 = 1.0.0 and 1.01.1 → 1.1.1 (standards.md oracle 3).
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "2.0.0")),
            Facts(Published("Bramble.Sketches", "1.0.0", "1.1.1")),
            tags: [RegistryCheckContexts.OldTag("v1.0"), RegistryCheckContexts.OldTag("v1.01.1")]);

        Assert.Equal(CheckStatus.Pass, Assert.Single(check.Run(context)).Status);
    }

    [Fact]
    public void PublishedVersionsWithoutTags_Fails()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "1.0.0")),
            Facts(Published("Bramble.Sketches", "0.9.0", "3.2.0")),
            tags: [RegistryCheckContexts.OldTag("v0.9.0")]);

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("1 of its 2 published versions (3.2.0)", finding.Message, StringComparison.Ordinal);
        Assert.Contains("known-ids", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void KnownIdsPattern_SettlesIt()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "1.0.0")),
            Facts(Published("Bramble.Sketches", "0.1.0")),
            yaml: "known-ids: [\"Bramble.*\"]\n");

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("known-ids", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void KnownIdsForAnotherId_DoesNotSettleIt()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "1.0.0")),
            Facts(Published("Bramble.Sketches", "0.1.0")),
            yaml: "known-ids: [\"Bramble.Sketches.*\", \"Lanternfly.Host.Runtime\"]\n");

        Assert.Equal(CheckStatus.Fail, Assert.Single(check.Run(context)).Status);
    }

    [Fact]
    public void OwnersMatchingTheRegistry_SettleIt()
    {
        var lookup = Published("Bramble.Sketches", "0.1.0") with { Owners = ["BrambleCote"] };
        var context = RegistryCheckContexts.For(Model(Library("Bramble.Sketches", "1.0.0")), Facts(lookup), yaml: "owners: [bramblecote]\n");

        Assert.Equal(CheckStatus.Pass, Assert.Single(check.Run(context)).Status);
    }

    [Fact]
    public void OwnersWhenTheRegistryDoesNotSay_FailsAndSaysWhy()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "1.0.0")), Facts(Published("Bramble.Sketches", "0.1.0")), yaml: "owners: [bramblecote]\n");

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("does not say who owns", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void IdSpelledDifferentlyByRegistry_ReportsRegistrySpelling()
    {
        // Package ids are case-insensitive (learn.microsoft.com/nuget/reference/nuspec#id).
        var lookup = new PackageLookup("Bramble.Sketches", true, "bramble.sketches", [new PublishedVersion("2.3.0")]);
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "2.4.0")), Facts(lookup), tags: [RegistryCheckContexts.OldTag("v2.3.0")]);

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.StartsWith("bramble.sketches is on", finding.Message, StringComparison.Ordinal);
        Assert.Contains("spells the id 'bramble.sketches'", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void PerPackageTagsOfAnotherId_DoNotCount()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "2.0.0")),
            Facts(Published("Bramble.Sketches", "1.0.0")),
            yaml: "tag-pattern: \"{id}/v{version}\"\n",
            tags: [RegistryCheckContexts.OldTag("Bramble.Sketches.Lanternfly3/v1.0.0")]);

        Assert.Equal(CheckStatus.Fail, Assert.Single(check.Run(context)).Status);
    }

    [Fact]
    public void LookupProblem_Skips()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches", "2.0.0")), Facts(PackageLookup.Unavailable("Bramble.Sketches", "malformed JSON")));

        Assert.Equal(CheckStatus.Skip, Assert.Single(check.Run(context)).Status);
    }
}
