using Readiness.Core.Checks.Deps;
using Readiness.Core.Dependencies;
using Readiness.Core.Reports;
using Readiness.Testing;

using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Deps;

public sealed class HostVersionMarkedCheckTests
{
    private const string Plugin = "src/Bramble.Sketches.Lanternfly3/Bramble.Sketches.Lanternfly3.csproj";
    private const string Config = "host-packages: [\"Lanternfly.Host.*\"]\nhost-marker: id-suffix\n";

    [Fact]
    public void CentralVersionOfMarkedMajor_Passes()
    {
        var builder = ProjectFixtures.Project(Plugin);
        builder.Central("Directory.Packages.props", "Lanternfly.Host.Runtime", "3.1.0", out var central);
        var plugin = builder.ReferenceAt(builder.Next(), "Lanternfly.Host.Runtime", "3.1.0", central, ("PrivateAssets", "all")).Build();

        var finding = Single(Run(new HostVersionMarkedCheck(), ProjectFixtures.Model(plugin), config: Config));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Equal([central.ToString()], EvidenceText(finding));
        Assert.Contains("major 3", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void VersionOverrideToOtherMajor_FailsAtTheOverride()
    {
        var builder = ProjectFixtures.Project(Plugin);
        var overrideAt = builder.Next();
        var plugin = builder.ReferenceAt(overrideAt, "Lanternfly.Host.Runtime", "4.0.1", overrideAt).Build();

        var finding = Single(Run(new HostVersionMarkedCheck(), ProjectFixtures.Model(plugin), config: Config));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("marks host major 3", finding.Message, StringComparison.Ordinal);
        Assert.Contains("major 4", finding.Message, StringComparison.Ordinal);
        Assert.Equal([overrideAt.ToString()], EvidenceText(finding));
    }

    [Fact]
    public void IdWithoutNumber_Fails()
    {
        var plugin = ProjectFixtures.Project("src/Bramble.Sketches.Lanternfly/Bramble.Sketches.Lanternfly.csproj")
            .Reference("Lanternfly.Host.Runtime", "3.1.0").Build();

        var finding = Single(Run(new HostVersionMarkedCheck(), ProjectFixtures.Model(plugin), config: Config));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("carries no host major", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void VersionSuffixMarker_ReadsTheDeclaredVersion()
    {
        var plugin = ProjectFixtures.Project("src/Bramble.Sketches.Lanternfly/Bramble.Sketches.Lanternfly.csproj")
            .Property("Version", "2.4.0+lanternfly3")
            .Reference("Lanternfly.Host.Runtime", "[3.0.0,4.0.0)").Build();

        var finding = Single(Run(new HostVersionMarkedCheck(), ProjectFixtures.Model(plugin),
            config: "host-packages: [\"Lanternfly.Host.*\"]\nhost-marker: version-suffix\n"));

        AssertStatus(CheckStatus.Pass, finding);
    }

    [Fact]
    public void RangeOverSeveralMajors_IsSkippedWithReason()
    {
        var plugin = ProjectFixtures.Project(Plugin).Reference("Lanternfly.Host.Runtime", "[3.0.0,5.0.0)").Build();

        var finding = Single(Run(new HostVersionMarkedCheck(), ProjectFixtures.Model(plugin), config: Config));

        AssertStatus(CheckStatus.Skip, finding);
        Assert.Contains("more than one major", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NoMarkerConfigured_Skips() =>
        AssertStatus(CheckStatus.Skip, Single(Run(new HostVersionMarkedCheck(), config: "host-packages: [\"Lanternfly.Host.*\"]\n")));

    [Fact]
    public void UnknownMarker_IsAnErrorNamingTheLine()
    {
        var finding = Single(Run(new HostVersionMarkedCheck(), config: "host-packages: [\"Lanternfly.Host.*\"]\nhost-marker: suffix\n"));

        AssertStatus(CheckStatus.Error, finding);
        Assert.Equal([".readiness.yml:2"], EvidenceText(finding));
    }

    // Ranges per the NuGet version-range documentation (https://learn.microsoft.com/nuget/concepts/package-versioning#version-ranges):
    // "3.1.0" means >= 3.1.0, "[3.0.0,4.0.0)" excludes 4.0.0, "3.*" floats within 3.
    [Theory]
    [InlineData("3.1.0", 3)]
    [InlineData("[3.1.0]", 3)]
    [InlineData("[3.0.0,4.0.0)", 3)]
    [InlineData("3.*", 3)]
    [InlineData("[3.0.0,3.9.9]", 3)]
    [InlineData("[3.0.0,4.0.0]", null)]
    [InlineData("(,4.0.0)", null)]
    [InlineData("$(LanternflyVersion)", null)]
    public void Resolve_GivesTheSingleMajor(string range, int? expected) =>
        Assert.Equal(expected, HostMajor.Resolve(range).Major);
}
