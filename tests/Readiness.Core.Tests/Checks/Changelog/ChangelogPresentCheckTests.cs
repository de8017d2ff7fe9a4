using Readiness.Core.Checks.Changelog;
using Readiness.Core.Reports;
using Readiness.Testing;

using static Readiness.Core.Tests.Checks.Changelog.ChangelogFixtures;

namespace Readiness.Core.Tests.Checks.Changelog;

public sealed class ChangelogPresentCheckTests
{
    private readonly ChangelogPresentCheck check = new();

    [Theory]
    [InlineData("CHANGELOG.md")]
    [InlineData("changelog.md")]
    [InlineData("CHANGES.md")]
    [InlineData("HISTORY.md")]
    [InlineData("RELEASE_NOTES.md")]
    public void RootChangelogUnderAnAcceptedName_Passes(string name)
    {
        // checks.md: CHANGELOG.md, CHANGES.md, HISTORY.md, RELEASE_NOTES.md, names compared case-insensitively.
        var files = new InMemoryFileTree().Add(name, "# Changelog\n").Add("README.md", "# Bramble.Sketches\n");

        var finding = Assert.Single(check.Run(Context(files)));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Equal(name, Assert.Single(finding.Evidence!).Path);
    }

    [Fact]
    public void NoChangelog_Fails()
    {
        var files = new InMemoryFileTree().Add("README.md", "# Bramble.Sketches\n").Add("docs/old/CHANGELOG.txt", "old\n");

        var finding = Assert.Single(check.Run(Context(files)));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("CHANGELOG, CHANGES", finding.Message, StringComparison.Ordinal);
        Assert.NotNull(finding.Hint);
    }

    [Fact]
    public void ConfiguredPath_IsUsedAndMustExist()
    {
        var files = new InMemoryFileTree().Add("docs/releases.md", "# Releases\n");

        var found = Assert.Single(check.Run(Context(files, with: With("changelog", "docs/releases.md"))));
        var missing = Assert.Single(check.Run(Context(files, with: With("changelog", "docs/RELEASES.md"))));

        Assert.Equal(CheckStatus.Pass, found.Status);
        Assert.Equal(CheckStatus.Fail, missing.Status);
        Assert.Contains("docs/RELEASES.md", missing.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ChangelogsNextToProjects_EachProjectJudged()
    {
        var files = new InMemoryFileTree()
            .Add("src/Bramble.Sketches/CHANGELOG.md", "# Changelog\n");
        var projects = ProjectFixtures.Model(Project(Library), Project(Plugin), ProjectFixtures.Project("tests/Bramble.Sketches.Tests/Bramble.Sketches.Tests.csproj").Property("IsTestProject", "true").Build());

        var findings = check.Run(Context(files, projects: projects)).ToList();

        Assert.Equal(2, findings.Count);
        Assert.Equal(CheckStatus.Pass, findings.Single(f => f.Package == "Bramble.Sketches").Status);
        Assert.Equal(CheckStatus.Fail, findings.Single(f => f.Package == "Bramble.Sketches.Lanternfly3").Status);
    }

    [Fact]
    public void RootChangelog_CoversEveryProject()
    {
        var files = new InMemoryFileTree().Add("CHANGELOG.md", "# Changelog\n");
        var projects = ProjectFixtures.Model(Project(Library), Project(Plugin));

        var finding = Assert.Single(check.Run(Context(files, projects: projects)));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Null(finding.Package);
    }

    [Fact]
    public void PerPackageTag_LooksNextToTheTaggedPackageFirst()
    {
        var files = new InMemoryFileTree()
            .Add("CHANGELOG.md", "# Changelog\n")
            .Add("src/Bramble.Sketches.Lanternfly3/CHANGELOG.md", "# Changelog\n");
        var projects = ProjectFixtures.Model(Project(Library), Project(Plugin));

        var finding = Assert.Single(check.Run(Context(files, tag: "Bramble.Sketches.Lanternfly3/v1.2.0", projects: projects, config: PerPackageTags)));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Equal("Bramble.Sketches.Lanternfly3", finding.Package);
        Assert.Equal("src/Bramble.Sketches.Lanternfly3/CHANGELOG.md", finding.Evidence![0].Path);
    }
}
