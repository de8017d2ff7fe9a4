using Readiness.Core.Checks.Registry;
using Readiness.Core.Registry;
using Readiness.Core.Reports;

using static Readiness.Testing.RegistryTestProjects;

namespace Readiness.Core.Tests.Checks.Registry;

public class RegistryAheadOfPublishedCheckTests
{
    private readonly RegistryAheadOfPublishedCheck check = new();

    // NuGet order, descending (learn.microsoft.com/nuget/concepts/package-versioning, "Pre-release versions";
    // standards.md oracle 5).
    public static TheoryData<string, string> DescendingPairs()
    {
        string[] order = ["1.0.1", "1.0.1-zzz", "1.0.1-rc.10", "1.0.1-rc.2", "1.0.1-open", "1.0.1-beta", "1.0.1-alpha2", "1.0.1-alpha10", "1.0.1-aaa"];
        var data = new TheoryData<string, string>();
        for (var i = 0; i + 1 < order.Length; i++)
        {
            data.Add(order[i], order[i + 1]);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(DescendingPairs))]
    public void AboveNewestPublished_Passes(string higher, string lower)
    {
        var context = RegistryCheckContexts.For(Model(Library("Bramble.Sketches")), Facts(Published("Bramble.Sketches", lower)), version: higher);

        Assert.Equal(CheckStatus.Pass, Assert.Single(check.Run(context)).Status);
    }

    [Theory]
    [MemberData(nameof(DescendingPairs))]
    public void BelowNewestPublished_Fails(string higher, string lower)
    {
        var context = RegistryCheckContexts.For(Model(Library("Bramble.Sketches")), Facts(Published("Bramble.Sketches", higher)), version: lower);

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains($"not above {higher}", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void LabelsDifferingOnlyInCase_AreNotAhead()
    {
        // 1.0.0-alpha equals 1.0.0-Alpha (package-versioning doc, standards.md oracle 5).
        var context = RegistryCheckContexts.For(Model(Library("Bramble.Sketches")), Facts(Published("Bramble.Sketches", "1.0.0-alpha")), version: "1.0.0-Alpha");

        Assert.Equal(CheckStatus.Fail, Assert.Single(check.Run(context)).Status);
    }

    [Fact]
    public void OlderMajorWithoutMaintenanceLine_Fails()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches")), Facts(Published("Bramble.Sketches", "1.5.0", "2.0.0")), version: "1.5.1");

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("maintenance-lines", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void PatchOfDeclaredMajorLine_Passes()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches")),
            Facts(Published("Bramble.Sketches", "1.5.0", "2.0.0")),
            version: "1.5.1",
            yaml: "maintenance-lines: [\"1.x\"]\n");

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("line 1.x", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void DeclaredMinorLine_ComparesWithinThatMinorOnly()
    {
        var published = Facts(Published("Bramble.Sketches", "2.3.1", "2.4.0"));
        var yaml = "maintenance-lines: [\"2.x\", \"2.3.x\"]\n";

        var patch = RegistryCheckContexts.For(Model(Library("Bramble.Sketches")), published, version: "2.3.2", yaml: yaml);
        var repeat = RegistryCheckContexts.For(Model(Library("Bramble.Sketches")), published, version: "2.3.1", yaml: yaml);

        Assert.Equal(CheckStatus.Pass, Assert.Single(check.Run(patch)).Status);
        Assert.Equal(CheckStatus.Fail, Assert.Single(check.Run(repeat)).Status);
    }

    [Fact]
    public void UnlistedNewest_StillCounts()
    {
        var lookup = new PackageLookup("Bramble.Sketches", true, "Bramble.Sketches", [new PublishedVersion("2.3.0"), new PublishedVersion("2.5.0", Listed: false)]);
        var context = RegistryCheckContexts.For(Model(Library("Bramble.Sketches")), Facts(lookup), version: "2.4.0");

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("2.5.0 (unlisted)", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NothingPublished_Passes()
    {
        var context = RegistryCheckContexts.For(Model(Library("Bramble.Sketches")), Facts(Unknown("Bramble.Sketches")), version: "0.1.0");

        Assert.Equal(CheckStatus.Pass, Assert.Single(check.Run(context)).Status);
    }

    [Fact]
    public void MalformedMaintenanceLine_IsAnError()
    {
        var context = RegistryCheckContexts.For(
            Model(Library("Bramble.Sketches")), Facts(Published("Bramble.Sketches", "1.0.0")), version: "2.0.0", yaml: "maintenance-lines: [\"one.x\"]\n");

        var finding = Assert.Single(check.Run(context));

        Assert.Equal(CheckStatus.Error, finding.Status);
        Assert.Contains("one.x", finding.Message, StringComparison.Ordinal);
    }
}
