using Readiness.Core.Checks;
using Readiness.Core.Checks.Registry;
using Readiness.Core.Registry;
using Readiness.Core.Reports;

using static Readiness.Testing.RegistryTestProjects;

namespace Readiness.Core.Tests.Checks.Registry;

public class RegistryDependenciesCurrentCheckTests
{
    private static Finding RunOne(string version, PackageLookup lookup)
    {
        var project = Library("Bramble.Sketches", "2.4.0", Reference("Lanternfly.Host.Abstractions", version));
        var context = RegistryCheckContexts.For(Model(project), Facts(lookup));
        return Assert.Single(new RegistryDependenciesCurrentCheck().Run(context));
    }

    [Fact]
    public void TwoMajorsBehind_Fails()
    {
        var finding = RunOne("1.2.0", Published("Lanternfly.Host.Abstractions", "1.2.0", "2.0.0", "3.1.0"));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("2 major versions behind 3.1.0", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void OneMajorBehind_Passes()
    {
        Assert.Equal(CheckStatus.Pass, RunOne("2.0.0", Published("Lanternfly.Host.Abstractions", "2.0.0", "3.1.0")).Status);
    }

    [Fact]
    public void PrereleaseAndUnlistedNewer_AreIgnored()
    {
        var lookup = new PackageLookup(
            "Lanternfly.Host.Abstractions",
            true,
            "Lanternfly.Host.Abstractions",
            [new PublishedVersion("1.0.0"), new PublishedVersion("2.1.0"), new PublishedVersion("3.0.0-preview.1"), new PublishedVersion("4.0.0", Listed: false)]);

        var finding = RunOne("1.0.0", lookup);

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("2.1.0", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void DeprecatedVersion_Fails()
    {
        var lookup = new PackageLookup(
            "Lanternfly.Host.Abstractions", true, "Lanternfly.Host.Abstractions", [new PublishedVersion("3.0.0", true, Deprecated: true), new PublishedVersion("3.1.0")]);

        var finding = RunOne("3.0.0", lookup);

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("deprecated", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NoStableVersion_Skips()
    {
        Assert.Equal(CheckStatus.Skip, RunOne("1.0.0-beta", Published("Lanternfly.Host.Abstractions", "1.0.0-beta")).Status);
    }
}
