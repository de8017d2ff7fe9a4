using System.Text;

using Readiness.Core.Checks.Changelog;
using Readiness.Core.Reports;
using Readiness.Core.Tests.Changelogs;
using Readiness.Testing;

using static Readiness.Core.Tests.Checks.Changelog.ChangelogFixtures;

namespace Readiness.Core.Tests.Checks.Changelog;

public sealed class ChangelogHasEntryCheckTests
{
    private readonly ChangelogHasEntryCheck check = new();

    private static InMemoryFileTree Tree(string changelog) => new InMemoryFileTree().Add("CHANGELOG.md", changelog);

    [Fact]
    public void ReleasedSection_Passes()
    {
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.Released))));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.StartsWith("CHANGELOG.md:9:", finding.Message, StringComparison.Ordinal);
        Assert.Contains("3 entries (Added, Fixed)", finding.Message, StringComparison.Ordinal);
        Assert.Equal(new Evidence("CHANGELOG.md", 9), Assert.Single(finding.Evidence!));
    }

    [Fact]
    public void EntriesStillUnderUnreleased_FailWithMoveHint()
    {
        // Keep a Changelog 1.1.0: the Unreleased section's changes move into the new release's section.
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.StillUnreleased))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("no section for 2.4.0", finding.Message, StringComparison.Ordinal);
        Assert.Contains("3 entries still sit under '## [Unreleased]' (CHANGELOG.md:7)", finding.Hint, StringComparison.Ordinal);
        Assert.Contains("`## [2.4.0] - 2026-11-20`", finding.Hint, StringComparison.Ordinal);
        Assert.Contains(new Evidence("CHANGELOG.md", 7), finding.Evidence!);
    }

    [Fact]
    public void NoSectionAndEmptyUnreleased_HintSaysToAddOne()
    {
        var text = ChangelogSamples.Preamble + "## [Unreleased]\n\n" + ChangelogSamples.Older;

        var finding = Assert.Single(check.Run(Context(Tree(text))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.StartsWith("Add a section `## [2.4.0] - 2026-11-20`", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void DatedAfterTheTag_Fails()
    {
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.With("## [2.4.0] - 2026-11-21")))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("dated 2026-11-21, after the date of tag v2.4.0 (2026-11-20)", finding.Message, StringComparison.Ordinal);
        Assert.StartsWith("CHANGELOG.md:9:", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void DatedBeforeTheTag_Passes()
    {
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.With("## [2.4.0] - 2026-11-18")))));

        Assert.Equal(CheckStatus.Pass, finding.Status);
    }

    [Fact]
    public void TagDate_IsTheTaggersCalendarDate()
    {
        // 2026-11-21 09:00 at UTC+13 is 2026-11-20 20:00 UTC: the tagger wrote the 21st, and that is their release date.
        var east = new DateTimeOffset(2026, 11, 21, 9, 0, 0, TimeSpan.FromHours(13));
        var changelog = Tree(ChangelogSamples.With("## [2.4.0] - 2026-11-21"));

        var finding = Assert.Single(check.Run(Context(changelog, tagDate: east)));
        var inUtc = Assert.Single(check.Run(Context(changelog, tagDate: east.ToUniversalTime())));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Equal(CheckStatus.Fail, inUtc.Status);
    }

    [Fact]
    public void UndatedHeading_IsTheEntry_WithAWarning()
    {
        // Keep a Changelog 1.1.0 dates every release; a heading without one is still this version's entry.
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.With("## [2.4.0]")))));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("warning: the heading has no date", finding.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("## [2.4.0] - 20/11/2026", "its date '20/11/2026' is not an ISO date YYYY-MM-DD")]
    [InlineData("## [2.4.0] - 2026-11-31", "its date '2026-11-31' is not an ISO date YYYY-MM-DD")]
    public void MissingOrMalformedDate_Fails(string heading, string expected)
    {
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.With(heading)))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains(expected, finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void EmptySection_Fails()
    {
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.With("## [2.4.0] - 2026-11-20", "### Added\n")))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("it has no entries", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void EmptySectionWhileUnreleasedHoldsEntries_HintSaysToMoveThem()
    {
        var text = ChangelogSamples.Preamble + "## [Unreleased]\n\n- Merge operation.\n\n## [2.4.0] - 2026-11-20\n\n" + ChangelogSamples.Older;

        var finding = Assert.Single(check.Run(Context(Tree(text))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("1 entry still sits under '## [Unreleased]' (CHANGELOG.md:7)", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void YankedSectionForTheReleasedVersion_Fails()
    {
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.With("## [2.4.0] - 2026-11-20 [YANKED]")))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("[YANKED]", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void YankedOlderRelease_DoesNotMatter()
    {
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.Released), tag: "v2.3.1")));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("2.3.1", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void CrlfAndBom_Pass()
    {
        var bytes = Encoding.UTF8.GetPreamble().Concat(Encoding.UTF8.GetBytes(ChangelogSamples.Released.Replace("\n", "\r\n", StringComparison.Ordinal))).ToArray();

        var finding = Assert.Single(check.Run(Context(new InMemoryFileTree().Add("CHANGELOG.md", bytes))));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.StartsWith("CHANGELOG.md:9:", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ShortVersionInHeading_MatchesAsNuGetNormalisesIt()
    {
        // NuGet package versioning: 2.4 and 2.4.0 are the same version once normalised.
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.With("## [2.4] - 2026-11-20")))));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("the heading writes 2.4, which NuGet reads as 2.4.0", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void OtherVersionOnly_DoesNotMatch()
    {
        // SemVer 2.0.0 §11: 2.4.0-rc.1 is a different (lower) version than 2.4.0.
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.With("## [2.4.0-rc.1] - 2026-11-10")))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
    }

    [Fact]
    public void TwoSectionsForTheVersion_Fail()
    {
        var text = ChangelogSamples.With("## [2.4.0] - 2026-11-20") + "\n## [2.4.0] - 2026-11-19\n\n- again\n";

        var finding = Assert.Single(check.Run(Context(Tree(text))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Contains("2 sections for 2.4.0", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ProseSection_PassesWithNote()
    {
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.With("## [2.4.0] - 2026-11-20", "Maintenance release: no functional change.\n")))));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("written as prose", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NoVersionAnywhere_Skips()
    {
        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.Released), tag: null)));

        Assert.Equal(CheckStatus.Skip, finding.Status);
        Assert.Contains("No version", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NoTag_DeclaredVersionJudgedAgainstToday()
    {
        // Without a tag the release date is today (TestSnapshots: 2026-12-01).
        var projects = ProjectFixtures.Model(Project(Library, "2.4.0"));

        var finding = Assert.Single(check.Run(Context(Tree(ChangelogSamples.Released), tag: null, projects: projects)));

        Assert.Equal(CheckStatus.Pass, finding.Status);
        Assert.Contains("today", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NoChangelog_Skips()
    {
        var finding = Assert.Single(check.Run(Context(new InMemoryFileTree().Add("README.md", "x"))));

        Assert.Equal(CheckStatus.Skip, finding.Status);
        Assert.Contains("changelog.present", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ChangelogAboveTheSizeBound_IsAnError()
    {
        var huge = new byte[Core.Snapshots.FileLimits.DefaultMaxBytes + 1];
        Array.Fill(huge, (byte)'a');

        var finding = Assert.Single(check.Run(Context(new InMemoryFileTree().Add("CHANGELOG.md", huge))));

        Assert.Equal(CheckStatus.Error, finding.Status);
    }

    [Fact]
    public void ChangelogMarkdigRefuses_IsAnErrorNamingTheFile()
    {
        var finding = Assert.Single(check.Run(Context(Tree(new string('[', 100_000)))));

        Assert.Equal(CheckStatus.Error, finding.Status);
        Assert.StartsWith("CHANGELOG.md: Markdown could not be parsed", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void PerPackageTag_UsesThatPackagesChangelog()
    {
        var files = new InMemoryFileTree()
            .Add("CHANGELOG.md", ChangelogSamples.Released)
            .Add("src/Bramble.Sketches.Lanternfly3/CHANGELOG.md", "# Changelog\n\n## [Unreleased]\n\n- Host 3.2 support.\n\n## [1.1.0] - 2026-08-01\n\n- First release.\n");
        var projects = ProjectFixtures.Model(Project(Library, "2.4.0"), Project(Plugin, "1.2.0"));

        var finding = Assert.Single(check.Run(Context(files, tag: "Bramble.Sketches.Lanternfly3/v1.2.0", projects: projects, config: PerPackageTags)));

        Assert.Equal(CheckStatus.Fail, finding.Status);
        Assert.Equal("Bramble.Sketches.Lanternfly3", finding.Package);
        Assert.Contains("src/Bramble.Sketches.Lanternfly3/CHANGELOG.md has no section for 1.2.0", finding.Message, StringComparison.Ordinal);
        Assert.Contains("`## [1.2.0] - 2026-11-20`", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void PerPackageWithoutTag_EachPackageItsDeclaredVersion()
    {
        var files = new InMemoryFileTree()
            .Add("src/Bramble.Sketches/CHANGELOG.md", ChangelogSamples.Released)
            .Add("src/Bramble.Sketches.Lanternfly3/CHANGELOG.md", "# Changelog\n\n## [1.2.0] - 2026-11-30\n\n- Host 3.2 support.\n");
        var projects = ProjectFixtures.Model(Project(Library, "2.4.0"), Project(Plugin, "1.2.0"));

        var findings = check.Run(Context(files, tag: null, projects: projects, config: PerPackageTags)).ToList();

        Assert.Equal(2, findings.Count);
        Assert.All(findings, f => Assert.Equal(CheckStatus.Pass, f.Status));
        Assert.Contains("1.2.0", findings.Single(f => f.Package == "Bramble.Sketches.Lanternfly3").Message, StringComparison.Ordinal);
    }
}
