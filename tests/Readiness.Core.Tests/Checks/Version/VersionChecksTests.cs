using Readiness.Core.Checks;
using Readiness.Core.Checks.Version;
using Readiness.Core.Configuration;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;
using Readiness.Testing;
using static Readiness.Core.Tests.VersionProjects;

namespace Readiness.Core.Tests.Checks.Version;

public sealed class VersionChecksTests
{
    private static CheckContext Context(ProjectModel model, TagInfo? tag, IReadOnlyList<TagInfo>? tags = null, InMemoryFileTree? files = null, string? version = null, RepositoryConfig? config = null) =>
        TestSnapshots.Context(TestSnapshots.Snapshot(files ?? new InMemoryFileTree(), tag, tags), model, version, config);

    private static ProjectInfo Sketches(string version, int line = 4) =>
        Project("src/Bramble.Sketches/Bramble.Sketches.csproj", ("Version", version, -line), ("PackageId", "Bramble.Sketches", 3));

    [Fact]
    public void WellFormed_FailsALeadingZero_WithTheDeclarationAsEvidence()
    {
        var findings = new VersionWellFormedCheck().Run(Context(Model(Sketches("2.04.0")), null)).ToList();
        var fail = Assert.Single(findings, f => f.Status == CheckStatus.Fail);
        Assert.Equal(new Evidence("Directory.Build.props", 4), Assert.Single(fail.Evidence!));
        Assert.Contains("leading zero", fail.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void WellFormed_PassesTagAndDeclaration()
    {
        var findings = new VersionWellFormedCheck().Run(Context(Model(Sketches("2.4.0")), TestSnapshots.Tag("v2.4.0"))).ToList();
        Assert.Equal(2, findings.Count);
        Assert.All(findings, f => Assert.Equal(CheckStatus.Pass, f.Status));
    }

    [Fact]
    public void MatchesTag_FailsWhenTheProjectStillDeclaresTheOldVersion()
    {
        // The scenario's mistake: Directory.Build.props says 2.3.1 while the tag says v2.4.0.
        var finding = Assert.Single(new VersionMatchesTagCheck().Run(Context(Model(Sketches("2.3.1")), TestSnapshots.Tag("v2.4.0"))));
        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("2.3.1", finding.Message, StringComparison.Ordinal);
        Assert.Contains("Directory.Build.props:4", finding.Hint, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("2.4.0", "v2.4.0")]
    [InlineData("2.4.0+build.7", "v2.4.0")] // build metadata is ignored for identity (semver.org §10, NuGet normalisation)
    public void MatchesTag_PassesEqualVersions(string declared, string tag) =>
        Assert.Equal(CheckStatus.Pass, Assert.Single(new VersionMatchesTagCheck().Run(Context(Model(Sketches(declared)), TestSnapshots.Tag(tag)))).Status);

    [Fact]
    public void MatchesTag_RecognisesAGitVersioningPackage()
    {
        var reference = new PackageReferenceItem("MinVer", "6.0.0", null, new Dictionary<string, string>(), new SourceLocation("Directory.Build.props", 9));
        var project = Project("src/A/A.csproj", [reference]);
        var finding = Assert.Single(new VersionMatchesTagCheck().Run(Context(Model(project), TestSnapshots.Tag("v2.4.0"))));
        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("MinVer", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void MatchesTag_RecognisesAPlaceholderInjectedAtBuildTime()
    {
        var finding = Assert.Single(new VersionMatchesTagCheck().Run(Context(Model(Sketches("0.0.0")), TestSnapshots.Tag("v2.4.0"))));
        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("placeholder", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void MatchesTag_SkipsWithoutATag() =>
        Assert.Equal(CheckStatus.Skip, Assert.Single(new VersionMatchesTagCheck().Run(Context(Model(Sketches("2.4.0")), null))).Status);

    [Fact]
    public void MatchesTag_PerPackageTags_OnlyJudgeTheTaggedPackage()
    {
        var config = RepositoryConfig.Empty with { TagPattern = "{id}/v{version}" };
        var other = Project("src/B/B.csproj", ("Version", "9.9.9", 3), ("PackageId", "Bramble.Other", 2));
        var findings = new VersionMatchesTagCheck().Run(Context(Model(Sketches("2.4.0"), other), TestSnapshots.Tag("Bramble.Sketches/v2.4.0"), config: config)).ToList();
        Assert.Equal(CheckStatus.Pass, findings.Single(f => f.Package == "Bramble.Sketches").Status);
        Assert.Equal(CheckStatus.Skip, findings.Single(f => f.Package == "Bramble.Other").Status);
    }

    [Fact]
    public void Consistent_FailsTheOddPackageOut()
    {
        var plugin = Project("src/P/P.csproj", ("Version", "2.3.1", 5), ("PackageId", "Bramble.Sketches.Lanternfly3", 2));
        var third = Project("src/C/C.csproj", ("Version", "2.4.0", 5), ("PackageId", "Bramble.Sketches.Extra", 2));
        var findings = new VersionConsistentCheck().Run(Context(Model(Sketches("2.4.0"), plugin, third), null)).ToList();
        var fail = Assert.Single(findings);
        Assert.Equal(CheckStatus.Fail, fail.Status);
        Assert.Equal("Bramble.Sketches.Lanternfly3", fail.Package);
    }

    [Fact]
    public void MovesForward_FailsAVersionAlreadyTagged_AndPassesABump()
    {
        var old = TestSnapshots.Tag("v2.3.1", commit: "1111111111111111111111111111111111111111");
        var older = TestSnapshots.Tag("v2.3.0", commit: "2222222222222222222222222222222222222222");
        var sameAgain = Context(Model(), TestSnapshots.Tag("v2.3.1-again"), [old, older], version: "2.3.1");
        var fail = Assert.Single(new VersionMovesForwardCheck().Run(sameAgain));
        Assert.Equal(CheckStatus.Fail, fail.Status);
        Assert.Contains("already released as v2.3.1", fail.Message, StringComparison.Ordinal);

        var tag = TestSnapshots.Tag("v2.4.0");
        var bump = Context(Model(), tag, [tag, old, older]);
        Assert.Equal(CheckStatus.Pass, Assert.Single(new VersionMovesForwardCheck().Run(bump)).Status);
    }

    [Fact]
    public void MovesForward_UsesSemVerPrecedenceNotTextOrder()
    {
        // semver.org §11: 1.0.0-beta.11 > 1.0.0-beta.2 although "11" < "2" as text.
        var earlier = TestSnapshots.Tag("v1.0.0-beta.2", commit: "3333333333333333333333333333333333333333");
        var tag = TestSnapshots.Tag("v1.0.0-beta.11");
        Assert.Equal(CheckStatus.Pass, Assert.Single(new VersionMovesForwardCheck().Run(Context(Model(), tag, [tag, earlier]))).Status);
        var down = TestSnapshots.Tag("v1.0.0-alpha");
        Assert.Equal(CheckStatus.Fail, Assert.Single(new VersionMovesForwardCheck().Run(Context(Model(), down, [down, earlier]))).Status);
    }
}
