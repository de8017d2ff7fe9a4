namespace Readiness.Core.Tests.Changelogs;

/// <summary>
/// Changelogs written in the structure of Keep a Changelog 1.1.0's own example file
/// (https://github.com/olivierlacan/keep-a-changelog/blob/main/CHANGELOG.md): title, preamble, <c>## [Unreleased]</c>,
/// <c>## [x.y.z] - YYYY-MM-DD</c> sections newest first with <c>### Added</c>-style groups, link definitions at the bottom.
/// </summary>
internal static class ChangelogSamples
{
    public const string Preamble = """
        # Changelog

        All notable changes to this project will be documented in this file.

        The format is based on [Keep a Changelog](https://keepachangelog.com/en/1.1.0/),
        and this project adheres to [Semantic Versioning](https://semver.org/spec/v2.0.0.html).

        """;

    public const string Older = """
        ## [2.3.1] - 2026-09-02

        ### Fixed

        - Serialising a sketch larger than 2 GiB no longer truncates it.

        ## [2.3.0] - 2026-06-15

        ### Added

        - `net10.0` target.

        ### Deprecated

        - `QuantileSketch.Create(int)`; use the overload taking `SketchOptions`.

        ## [2.2.0] - 2026-03-01 [YANKED]

        ### Changed

        - Distinct-count estimates use 64-bit hashes.

        """;

    public const string OlderLinks = """
        [2.3.1]: https://git.example/bramblecote/bramble-sketches/compare/v2.3.0...v2.3.1
        [2.3.0]: https://git.example/bramblecote/bramble-sketches/compare/v2.2.0...v2.3.0
        [2.2.0]: https://git.example/bramblecote/bramble-sketches/releases/tag/v2.2.0
        """;

    /// <summary>Released: entries moved from Unreleased into <c>## [2.4.0] - 2026-11-20</c> (line 9).</summary>
    public const string Released = Preamble + """
        ## [Unreleased]

        ## [2.4.0] - 2026-11-20

        ### Added

        - Merge operation for quantile sketches built with different accuracies.
        - `DistinctCount.Estimate` overload taking a confidence level.

        ### Fixed

        - Quantile queries on an empty sketch returned NaN instead of throwing.

        """ + Older + "\n" + """
        [unreleased]: https://git.example/bramblecote/bramble-sketches/compare/v2.4.0...HEAD
        [2.4.0]: https://git.example/bramblecote/bramble-sketches/compare/v2.3.1...v2.4.0

        """ + "\n" + OlderLinks;

    /// <summary>Not yet released: the three entries still sit under <c>## [Unreleased]</c> (line 7).</summary>
    public const string StillUnreleased = Preamble + """
        ## [Unreleased]

        ### Added

        - Merge operation for quantile sketches built with different accuracies.
        - `DistinctCount.Estimate` overload taking a confidence level.

        ### Fixed

        - Quantile queries on an empty sketch returned NaN instead of throwing.

        """ + Older + "\n" + """
        [unreleased]: https://git.example/bramblecote/bramble-sketches/compare/v2.3.1...HEAD

        """ + "\n" + OlderLinks;

    /// <summary>A changelog whose 2.4.0 section is <paramref name="heading"/> followed by <paramref name="body"/>.</summary>
    public static string With(string heading, string body = "### Added\n\n- Merge operation for quantile sketches.\n") =>
        Preamble + "## [Unreleased]\n\n" + heading + "\n\n" + body + "\n" + Older;
}
