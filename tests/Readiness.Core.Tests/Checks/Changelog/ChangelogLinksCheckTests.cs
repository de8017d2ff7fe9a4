using Readiness.Core.Checks.Changelog;
using Readiness.Core.Reports;
using Readiness.Core.Tests.Changelogs;
using Readiness.Testing;

using static Readiness.Core.Tests.Checks.Changelog.ChangelogFixtures;

namespace Readiness.Core.Tests.Checks.Changelog;

public sealed class ChangelogLinksCheckTests
{
    private readonly ChangelogLinksCheck check = new();

    private static InMemoryFileTree Tree(string changelog) => new InMemoryFileTree().Add("CHANGELOG.md", changelog);

    [Fact]
    public void VersionLinked_Passes()
    {
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.Released))));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("compare/v2.3.1...v2.4.0", finding.Message, StringComparison.Ordinal);
        Assert.Equal("CHANGELOG.md", finding.Evidence![0].Path);
    }

    [Fact]
    public void OtherVersionsLinkedButNotThisOne_Fails()
    {
        var text = ChangelogSamples.Released.Replace(
            "[2.4.0]: https://git.example/bramblecote/bramble-sketches/compare/v2.3.1...v2.4.0\n", string.Empty, StringComparison.Ordinal);

        var finding = Assert.Single(check.Run(Context(Tree(text))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("no link for 2.4.0", finding.Message, StringComparison.Ordinal);
        Assert.Contains("[2.4.0]: https://git.example/OWNER/REPO/compare/vPREVIOUS...v2.4.0", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void LinkCopiedFromAnotherVersion_Fails()
    {
        var text = ChangelogSamples.Released.Replace("compare/v2.3.1...v2.4.0", "compare/v2.3.0...v2.3.1", StringComparison.Ordinal);

        var finding = Assert.Single(check.Run(Context(Tree(text))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("does not mention 2.4.0", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NoSectionForTheVersion_SkipsAndLeavesItToHasEntry()
    {
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.StillUnreleased))));

        Assert.Equal(CheckStatus.Skip, finding.Status);
        Assert.Contains("changelog.has-entry", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NoLinksAtAll_Skips()
    {
        var finding = Assert.Single(check.Run(Context(Tree("# Changelog\n\n## 2.4.0 - 2026-11-20\n\n- one\n\n## 2.3.1 - 2026-09-02\n\n- two\n"))));

        Assert.Equal(CheckStatus.Skip, finding.Status);
    }

    [Fact]
    public void InlineLinkedHeadings_Pass()
    {
        var text = "# Changelog\n\n## [2.4.0](https://git.example/bramblecote/bramble-sketches/releases/tag/v2.4.0) - 2026-11-20\n\n- one\n";

        var finding = Assert.Single(check.Run(Context(Tree(text))));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Equal(new Evidence("CHANGELOG.md", 3), finding.Evidence![0]);
    }

    [Fact]
    public void UnbracketedHeadingWithDefinition_Passes()
    {
        var text = "# Changelog\n\n## 2.4.0 - 2026-11-20\n\n- one\n\n[2.4.0]: https://git.example/bramblecote/bramble-sketches/releases/tag/v2.4.0\n";

        var finding = Assert.Single(check.Run(Context(Tree(text))));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Equal(new Evidence("CHANGELOG.md", 7), finding.Evidence![0]);
    }
}
