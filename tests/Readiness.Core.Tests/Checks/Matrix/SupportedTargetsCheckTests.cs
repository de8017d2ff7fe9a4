using Readiness.Core.Checks.Matrix;
using Readiness.Core.Reports;
using Readiness.Testing;

using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Matrix;

public sealed class SupportedTargetsCheckTests
{
    private const string Lib = "src/Bramble.Sketches/Bramble.Sketches.csproj";

    private static Core.Projects.ProjectInfo Project(string targets, string? tf = null) =>
        ProjectFixtures.Project(Lib).Property(tf ?? "TargetFrameworks", targets).Build();

    [Fact]
    public void Net6Target_FailsAtTheTargetFrameworksLine()
    {
        var lib = Project("netstandard2.0;net6.0;net10.0");

        var finding = Single(Run(new SupportedTargetsCheck(), ProjectFixtures.Model(lib), tag: TestSnapshots.Tag("v2.4.0", new DateTimeOffset(2026, 3, 2, 10, 0, 0, TimeSpan.Zero))));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("net6.0 (.NET 6) went out of support on 2024-11-12", finding.Message, StringComparison.Ordinal);
        Assert.Equal([$"{Lib}:3"], EvidenceText(finding));
    }

    // standards.md oracle 15 (releases.md): on 2026-11-11 net8.0 and net9.0 are out of support; net10.0 is supported.
    [Fact]
    public void TagDatedAfterNet8EndOfSupport_FailsNet8AndNet9Only()
    {
        var lib = Project("net8.0;net9.0;net10.0");

        var finding = Single(Run(new SupportedTargetsCheck(), ProjectFixtures.Model(lib), tag: TestSnapshots.Tag("v2.4.0", new DateTimeOffset(2026, 11, 11, 0, 0, 0, TimeSpan.Zero))));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("net8.0", finding.Message, StringComparison.Ordinal);
        Assert.Contains("net9.0", finding.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("net10.0 (", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void TagOnTheLastDayOfSupport_Passes()
    {
        var lib = Project("net8.0", "TargetFramework");

        var finding = Single(Run(new SupportedTargetsCheck(), ProjectFixtures.Model(lib), tag: TestSnapshots.Tag("v2.4.0", new DateTimeOffset(2026, 11, 10, 12, 0, 0, TimeSpan.Zero))));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("leaves support on 2026-11-10", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void WithoutTag_TodayIsTheReleaseDate()
    {
        var lib = Project("net8.0;net10.0");

        var before = Single(Run(new SupportedTargetsCheck(), ProjectFixtures.Model(lib), today: new DateTimeOffset(2026, 6, 1, 0, 0, 0, TimeSpan.Zero)));
        var after = Single(Run(new SupportedTargetsCheck(), ProjectFixtures.Model(lib), today: new DateTimeOffset(2027, 1, 1, 0, 0, 0, TimeSpan.Zero)));

        AssertStatus(CheckStatus.Pass, before);
        AssertStatus(CheckStatus.Fail, after);
        Assert.Contains("today", after.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NetStandardAndFrameworkFollowingWindows_PassWithNotes()
    {
        var lib = Project("netstandard2.0;net48;net10.0");

        var finding = Single(Run(new SupportedTargetsCheck(), ProjectFixtures.Model(lib), tag: TestSnapshots.Tag("v2.4.0")));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("net48 (.NET Framework 4.8): no end date", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void RequiredTargetMissing_Fails()
    {
        var lib = Project("net10.0");

        var finding = Single(Run(new SupportedTargetsCheck(), ProjectFixtures.Model(lib), config: "require-targets: [netstandard2.0, net10.0]\n", tag: TestSnapshots.Tag("v2.4.0")));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("required target netstandard2.0", finding.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("required target net10.0", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UnrecognisedTarget_Fails()
    {
        var finding = Single(Run(new SupportedTargetsCheck(), ProjectFixtures.Model(Project("net10.0;banana4")), tag: TestSnapshots.Tag("v2.4.0")));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("'banana4' is not a target framework", finding.Message, StringComparison.Ordinal);
    }
}
