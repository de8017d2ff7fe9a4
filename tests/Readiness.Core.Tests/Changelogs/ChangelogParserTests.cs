using System.Text;
using System.Text.RegularExpressions;

using Readiness.Core.Changelogs;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Tests.Changelogs;

public sealed class ChangelogParserTests
{
    // standards.md oracle 13: regexes built from Keep a Changelog 1.1.0's example file
    // (https://github.com/olivierlacan/keep-a-changelog/blob/main/CHANGELOG.md).
    private static readonly Regex OracleUnreleased = new(@"^## \[Unreleased\]$");
    private static readonly Regex OracleRelease = new(@"^## \[[^\]]+\] - \d{4}-\d{2}-\d{2}( \[YANKED\])?$");

    public static TheoryData<string, bool, bool, string> HeadingLines => new()
    {
        // line, oracle: Unreleased, oracle: release, what the parser reads
        { "## [Unreleased]", true, false, "unreleased" },
        { "## [1.1.1] - 2023-03-05", false, true, "1.1.1 2023-03-05" },
        { "## [1.0.0-rc.1] - 2023-01-01", false, true, "1.0.0-rc.1 2023-01-01" },
        { "## [0.0.5] - 2014-12-13 [YANKED]", false, true, "0.0.5 2014-12-13 yanked" },
        { "## [v2.4.0] - 2026-11-20", false, true, "v2.4.0 2026-11-20" },

        // Beyond the oracle, tolerated: the standard's own yanked example has no brackets (keepachangelog.com 1.1.0,
        // "Yanked releases"); the rest is common practice, no published source.
        { "## 0.0.5 - 2014-12-13 [YANKED]", false, false, "0.0.5 2014-12-13 yanked" },
        { "## 1.1.1 - 2023-03-05", false, false, "1.1.1 2023-03-05" },
        { "## Unreleased", false, false, "unreleased" },
        { "## [unreleased]", false, false, "unreleased" },
        { "## [1.1.1] \u2013 2023-03-05", false, false, "1.1.1 2023-03-05" },
        { "## v1.1.1 (2023-03-05)", false, false, "v1.1.1 2023-03-05" },
        { "## [1.1.1] - 2023-03-05 [yanked]", false, false, "1.1.1 2023-03-05 yanked" },

        // Rejected by the oracle and read by the parser as a release without a usable date (has-entry fails them).
        { "## [1.1.1]", false, false, "1.1.1 undated" },
        { "## [1.1.1] - 2023-3-5", false, false, "1.1.1 bad-date:2023-3-5" },
        { "## [1.1.1] - 2023-03-05 extra", false, false, "1.1.1 bad-date:2023-03-05 extra" },

        // Accepted by the oracle (it checks digits only) but not a calendar date: the parser is stricter on purpose.
        { "## [1.1.1] - 2023-02-30", false, true, "1.1.1 bad-date:2023-02-30" },

        // The oracle takes any bracketed text for a version; the parser wants a version there.
        { "## [Unreleased] - 2023-03-05", false, true, "none" },
        { "## [Next] - 2023-03-05", false, true, "none" },

        // Not release headings for either.
        { "## Release notes", false, false, "none" },
        { "## 2023 highlights", false, false, "none" },
        { "### [1.1.1] - 2023-03-05", false, false, "none" },
        { "#### Added", false, false, "none" },
    };

    [Theory]
    [MemberData(nameof(HeadingLines))]
    public void KeepAChangelogHeadings_ReadAsTheOracleSays(string line, bool oracleUnreleased, bool oracleRelease, string expected)
    {
        Assert.Equal(oracleUnreleased, OracleUnreleased.IsMatch(line));
        Assert.Equal(oracleRelease, OracleRelease.IsMatch(line));

        var document = ChangelogParser.Parse(line + "\n");
        var level2 = document.SectionLevel == 2 ? document.Sections : [];
        Assert.Equal(expected, Describe(level2.SingleOrDefault()));

        // Agreement: every heading the oracle accepts is, for the parser, Unreleased or (when the bracketed text is a
        // version) a release with that version.
        if (oracleUnreleased)
        {
            Assert.True(level2.Single().IsUnreleased);
        }

        var bracketed = line[(line.IndexOf('[') + 1)..Math.Max(line.IndexOf('[') + 1, line.IndexOf(']'))];
        if (oracleRelease && NuGet.Versioning.NuGetVersion.TryParse(bracketed.TrimStart('v'), out _))
        {
            var section = Assert.Single(level2);
            Assert.Equal(line[(line.IndexOf('[') + 1)..line.IndexOf(']')], section.VersionText);
            Assert.Equal(line.EndsWith("[YANKED]", StringComparison.Ordinal), section.IsYanked);
        }
    }

    [Fact]
    public void KeepAChangelogExample_SectionsEntriesAndLinks()
    {
        var document = ChangelogParser.Parse(ChangelogSamples.Released);

        Assert.Equal(2, document.SectionLevel);
        Assert.Equal(["unreleased", "2.4.0 2026-11-20", "2.3.1 2026-09-02", "2.3.0 2026-06-15", "2.2.0 2026-03-01 yanked"], document.Sections.Select(Describe));
        var release = document.Sections[1];
        Assert.Equal(9, release.Line);
        Assert.Equal(3, release.Entries);
        Assert.Equal(["Added", "Fixed"], release.ChangeTypes);
        Assert.Equal(0, document.Unreleased!.Entries);
        Assert.Equal(["Added", "Deprecated"], document.Sections[3].ChangeTypes);

        // Link reference definitions (CommonMark: labels match case-insensitively, so [unreleased] serves [Unreleased]).
        Assert.Equal(["unreleased", "2.4.0", "2.3.1", "2.3.0", "2.2.0"], document.Links.Select(l => l.Label));
        Assert.Equal("https://git.example/bramblecote/bramble-sketches/compare/v2.3.1...v2.4.0", release.HeadingLink);
        Assert.Equal(document.Links[1].Line, release.HeadingLinkLine);
        Assert.Equal(document.Links[0].Url, document.Unreleased.HeadingLink);
        Assert.Equal("2.4.0", document.LinkFor(NuGet.Versioning.NuGetVersion.Parse("2.4.0"))!.Label);
    }

    [Fact]
    public void EntriesStillUnderUnreleased_AreCounted()
    {
        var document = ChangelogParser.Parse(ChangelogSamples.StillUnreleased);

        Assert.Equal(7, document.Unreleased!.Line);
        Assert.Equal(3, document.Unreleased.Entries);
        Assert.Empty(document.SectionsFor(NuGet.Versioning.NuGetVersion.Parse("2.4.0")));
    }

    [Fact]
    public void CrlfAndBom_ReadLikeLf()
    {
        var lf = ChangelogParser.Parse(ChangelogSamples.Released);
        var crlfBytes = Encoding.UTF8.GetPreamble().Concat(Encoding.UTF8.GetBytes(ChangelogSamples.Released.Replace("\n", "\r\n", StringComparison.Ordinal))).ToArray();

        // Decoded as the checks decode files (the BOM is dropped), and parsed from a string that still holds it.
        var crlf = ChangelogParser.Parse(FileTreeExtensions.Decode(crlfBytes));
        var withBom = ChangelogParser.Parse("\uFEFF" + ChangelogSamples.Released.Replace("\n", "\r\n", StringComparison.Ordinal));

        Assert.Equal(lf.Sections.Select(s => (Describe(s), s.Line, s.Entries)), crlf.Sections.Select(s => (Describe(s), s.Line, s.Entries)));
        Assert.Equal(lf.Sections.Select(s => (Describe(s), s.Line, s.Entries)), withBom.Sections.Select(s => (Describe(s), s.Line, s.Entries)));
        Assert.Equal(lf.Links, crlf.Links);
    }

    [Fact]
    public void HeadingsInCodeBlocks_AreNotSections()
    {
        var document = ChangelogParser.Parse("""
            # Changelog

            ## [1.0.0] - 2026-01-05

            ```markdown
            ## [9.9.9] - 2026-01-01
            - not an entry
            ```

            - real entry
            """);

        Assert.Equal(["1.0.0 2026-01-05"], document.Sections.Select(Describe));
        Assert.Equal(1, document.Sections[0].Entries);
    }

    [Fact]
    public void SetextHeadingsAndLevelOneChangelogs_AreRead()
    {
        // CommonMark: an underline of '-' makes a level-2 heading; a file whose releases are '#' headings is read at level 1.
        var setext = ChangelogParser.Parse("1.2.0 - 2026-02-01\n------------------\n\n- entry\n");
        var levelOne = ChangelogParser.Parse("# 1.2.0 - 2026-02-01\n\n- entry\n- another\n\n# 1.1.0 - 2026-01-01\n\n- entry\n");

        Assert.Equal(["1.2.0 2026-02-01"], setext.Sections.Select(Describe));
        Assert.Equal(1, levelOne.SectionLevel);
        Assert.Equal([2, 1], levelOne.Sections.Select(s => s.Entries));
    }

    [Fact]
    public void NonReleaseHeading_EndsTheSection()
    {
        var document = ChangelogParser.Parse("## [1.0.0] - 2026-01-05\n\n- one\n\n## Contributors\n\n- someone\n");

        Assert.Equal(1, Assert.Single(document.Sections).Entries);
    }

    [Fact]
    public void NestedItemsAndProse_CountedSeparately()
    {
        var document = ChangelogParser.Parse("## [1.0.0] - 2026-01-05\n\nA maintenance release.\n\n- one\n  - detail\n- two\n");

        var section = Assert.Single(document.Sections);
        Assert.Equal(2, section.Entries);
        Assert.Equal(1, section.Paragraphs);
    }

    [Fact]
    public void InlineLinkHeading_KeepsItsTarget()
    {
        var document = ChangelogParser.Parse("## [1.0.0](https://git.example/bramblecote/bramble-sketches/releases/tag/v1.0.0) - 2026-01-05\n\n- one\n");

        var section = Assert.Single(document.Sections);
        Assert.Equal("1.0.0 2026-01-05", Describe(section));
        Assert.Equal("https://git.example/bramblecote/bramble-sketches/releases/tag/v1.0.0", section.HeadingLink);
        Assert.Null(section.HeadingLinkLine);
    }

    [Theory]
    [InlineData("")]
    [InlineData("no headings at all")]
    [InlineData("## [\n\n[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[")]
    public void OddInput_GivesNoSections(string text)
    {
        var document = ChangelogParser.Parse(text);

        Assert.Empty(document.Sections);
        Assert.Null(document.SectionLevel);
    }

    [Fact]
    public void NestingBeyondMarkdigsDepthLimit_IsRefusedWithAReason()
    {
        // Markdig 1.6.0 throws ArgumentException past its depth limit (seen on this machine); the parser reports it.
        var nested = new string('>', 2_000) + " ## [1.0.0] - 2026-01-05\n";

        Assert.False(ChangelogParser.TryParse(nested, out var document, out var error));
        Assert.Null(document);
        Assert.Contains("nested", error, StringComparison.Ordinal);
        Assert.Throws<InvalidDataException>(() => ChangelogParser.Parse(nested));
    }

    private static string Describe(ChangelogSection? section) => section switch
    {
        null => "none",
        { IsUnreleased: true } => "unreleased",
        _ => $"{section.VersionText} {(section.Date is { } d ? d.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture) : section.DateText is null ? "undated" : "bad-date:" + section.DateText)}{(section.IsYanked ? " yanked" : string.Empty)}",
    };
}
