using Readiness.Core.Checks;
using Readiness.Core.Engine;
using Readiness.Core.Reports;

namespace Readiness.Rendering.Tests;

/// <summary>Reports in the demo scenario's style (Bramblecote Software), with fixed commit and time.</summary>
internal static class SampleReports
{
    public const string Commit = "3f9c2a7d5e8b41c6a0f2d9e7b5c3a1f8e6d4b2c0";
    public const string Sketches = "Bramble.Sketches";
    public const string Plugin = "Bramble.Sketches.Lanternfly3";

    public static readonly DateTimeOffset GeneratedAt = new(2026, 11, 20, 12, 30, 0, TimeSpan.Zero);

    public static readonly ReportSubject Subject = new(
        "https://git.example/bramblecote/bramble-sketches", Commit, "v2.4.0", "v2.4.0", "2.4.0", "host-plugin", InspectionKind.Commit);

    /// <summary>The demo release candidate: blocking failures, warnings, an error, manual items, skips and passes.</summary>
    public static Report Demo()
    {
        List<CheckResult> results =
        [
            Pass(CheckIds.VersionWellFormed, "Declared versions are valid SemVer", Sketches, "2.4.0 is valid SemVer 2.0.0.", Standards.SemVer),
            Pass(CheckIds.VersionWellFormed, "Declared versions are valid SemVer", Plugin, "2.4.0 is valid SemVer 2.0.0.", Standards.SemVer),
            new(CheckIds.VersionMatchesTag, "The tag matches the declared version", CheckStatus.Fail, Severity.Block, Sketches,
                "The tag v2.4.0 says 2.4.0 but the project declares 2.3.1.",
                "Set <Version>2.4.0</Version> in Directory.Build.props, or tag the commit v2.3.1.",
                [new Evidence("Directory.Build.props", 4)], Standards.SemVer),
            new(CheckIds.VersionMatchesTag, "The tag matches the declared version", CheckStatus.Fail, Severity.Block, Plugin,
                "The tag v2.4.0 says 2.4.0 but the project declares 2.3.1.",
                "Set <Version>2.4.0</Version> in Directory.Build.props, or tag the commit v2.3.1.",
                [new Evidence("Directory.Build.props", 4)], Standards.SemVer),
            Pass(CheckIds.VersionConsistent, "Projects released together share a version", null, "Both packable projects declare 2.3.1.", Standards.SemVer),
            Pass(CheckIds.ChangelogPresent, "A changelog exists", null, "CHANGELOG.md found.", Standards.KeepAChangelog),
            new(CheckIds.ChangelogHasEntry, "The changelog has a dated entry for this version", CheckStatus.Fail, Severity.Block, Sketches,
                "CHANGELOG.md has no section for 2.4.0; the new entries still sit under Unreleased.",
                "Move the entries under a heading \"## [2.4.0] - 2026-11-20\".",
                [new Evidence("CHANGELOG.md", 7)], Standards.KeepAChangelog),
            Pass(CheckIds.LicenseFile, "A license file exists", null, "LICENSE found at the root.", Standards.NuGetLicense),
            Pass(CheckIds.LicenseDeclared, "The package declares its license", Sketches, "PackageLicenseExpression MIT is a valid SPDX expression.", Standards.Spdx),
            Pass(CheckIds.LicenseDeclared, "The package declares its license", Plugin, "PackageLicenseExpression MIT is a valid SPDX expression.", Standards.Spdx),
            new(CheckIds.LicenseAgrees, "The license file matches the declared license", CheckStatus.Error, Severity.Warn, null,
                "The check could not run: LICENSE is larger than 1048576 bytes.",
                "Check that LICENSE holds the license text only.",
                [new Evidence("LICENSE")], Standards.SpdxMatching),
            new(CheckIds.DepsHostCompileOnly, "Host packages are referenced compile-only", CheckStatus.Fail, Severity.Block, Plugin,
                "Lanternfly.Host.Runtime is referenced with its runtime assets; every Lanternfly installation brings its own host.",
                "Add PrivateAssets=\"all\" (or ExcludeAssets=\"runtime\") to the PackageReference.",
                [new Evidence("src/Bramble.Sketches.Lanternfly3/Bramble.Sketches.Lanternfly3.csproj", 12)], Standards.NuGetAssets),
            Pass(CheckIds.DepsHostVersionMarked, "The package id marks the host major version", Plugin, "The id ends in 3; the host reference resolves to 3.2.0.", Standards.NuGetAssets),
            Pass(CheckIds.DepsStableOnly, "A stable release depends only on stable versions", Sketches, "No pre-release or floating dependency.", Standards.NuGetDependencies),
            new(CheckIds.MatrixSupportedTargets, "Target frameworks are in support", CheckStatus.Fail, Severity.Warn, Sketches,
                "net6.0 is out of support since 2024-11-12.",
                "Drop net6.0 from TargetFrameworks; net8.0 and net10.0 are supported.",
                [new Evidence("src/Bramble.Sketches/Bramble.Sketches.csproj", 5)], Standards.DotNetLifecycle),
            new(CheckIds.MatrixTestedTargets, "Every target is tested in CI", CheckStatus.Skip, Severity.Warn, null,
                "No CI configuration found under .github/workflows.", null, [], Standards.LibraryTargeting),
            new(CheckIds.SigningTag, "The release tag is signed", CheckStatus.Fail, Severity.Warn, null,
                "v2.4.0 is a lightweight tag: it carries no signature.",
                "Replace it with an annotated, signed tag (git tag -s v2.4.0) made with a key from the allowed signers.",
                [], Standards.GitSignature),
            new(CheckIds.SecretsNoneCommitted, "No secrets are committed", CheckStatus.Fail, Severity.Block, null,
                "A PKCS #12 key store is tracked in the repository.",
                "Remove the file from the repository and its history, and replace the certificate as your organisation's security policy requires.",
                [new Evidence("signing/release.pfx")], Standards.NuGetConfig),
            new(CheckIds.RegistryVersionFree, "The version is not yet published", CheckStatus.Skip, Severity.Block, Sketches,
                "Offline: the registry was not consulted.", null, [], Standards.NuGetPublish),
            new(CheckIds.RegistryVersionFree, "The version is not yet published", CheckStatus.Skip, Severity.Block, Plugin,
                "Offline: the registry was not consulted.", null, [], Standards.NuGetPublish),
            Pass(CheckIds.MetadataPackage, "Package metadata is complete", Sketches, "Description, Authors, RepositoryUrl, readme and tags are set.", Standards.NuGetMetadata),
            Manual("memory-stable", "The library was called 1,000 times in one process without its memory growing.", Severity.Block, confirmed: false),
            Manual("host-smoke-test", "The plugin was loaded into a Lanternfly 3 host and answered one query.", Severity.Warn, confirmed: true),
        ];

        return Build(Subject, results, unconfirmedBlockingManual: 1, ["Registry checks were skipped: --offline.", "Bramble.Sketches.Tests is a test project: not checked."]);
    }

    /// <summary>A release candidate that passes everything.</summary>
    public static Report Ready() =>
        Build(
            Subject with { Inspected = InspectionKind.Worktree },
            [
                Pass(CheckIds.VersionMatchesTag, "The tag matches the declared version", Sketches, "v2.4.0 matches 2.4.0.", Standards.SemVer),
                Pass(CheckIds.ChangelogHasEntry, "The changelog has a dated entry for this version", Sketches, "## [2.4.0] - 2026-11-20 has 3 entries.", Standards.KeepAChangelog),
            ],
            0,
            []);

    /// <summary>Text an inspected repository controls, trying to become active content in each format.</summary>
    public static Report Hostile()
    {
        const string script = "<script>alert(1)</script>";
        List<CheckResult> results =
        [
            new(CheckIds.SecretsNoneCommitted, "No secrets are committed", CheckStatus.Fail, Severity.Block, "Bramble.<b>Sketches</b>",
                $"Found a key in {script} | and a pipe\nsecond line # not a heading\n---\n1. not a list",
                "See [the fix](javascript:alert(1)) or ![x](https://git.example/bramblecote/t.png) {onclick=alert(1)} <img src=x onerror=alert(1)>",
                [new Evidence("](javascript:alert(1))", 3), new Evidence("<script>x</script>.md", 1), new Evidence("evil\u001b]0;pwned\u0007\u001b[2J.txt")],
                new StandardReference("Click <me>", "javascript:alert(1)")),
            new("manual.[x](javascript:alert(1))", "**bold** <i>italic</i> `code` *[HTML]: x", CheckStatus.Manual, Severity.Block, null,
                "A person must confirm this before the release.", null, [], ChecklistEngine.ManualStandard),
            new(CheckIds.ChangelogHasEntry, "| a | b |", CheckStatus.Fail, Severity.Warn, "pkg\\|x",
                "~~struck~~ ==marked== ++ins++ ^sup^ $math$ \"\"cite\"\" ::span:: &amp; &lt;script&gt; www.bramblecote.example \\",
                "<javascript:alert(1)>", [], Standards.KeepAChangelog),
        ];
        var subject = new ReportSubject("<repo>", Commit, "refs/tags/<x>", "v1<script>", "1.0.0 | x", "check**list**", InspectionKind.Commit);
        return Build(subject, results, 1, ["note with <script>alert(2)</script> and [link](javascript:alert(3))"]);
    }

    public static CheckResult Pass(string check, string title, string? package, string message, StandardReference standard) =>
        new(check, title, CheckStatus.Pass, Severity.Block, package, message, null, [], standard);

    private static CheckResult Manual(string id, string text, Severity severity, bool confirmed) =>
        new(
            "manual." + id,
            text,
            confirmed ? CheckStatus.Pass : CheckStatus.Manual,
            severity,
            null,
            confirmed ? "Confirmed by a person." : "A person must confirm this before the release.",
            confirmed ? null : $"Confirm with --confirm {id}, or tick the box in the release pull request.",
            [],
            ChecklistEngine.ManualStandard);

    private static Report Build(ReportSubject subject, List<CheckResult> results, int unconfirmedBlockingManual, IReadOnlyList<string> notes)
    {
        var summary = ReportSummary.From(results, unconfirmedBlockingManual);
        return new Report(subject, summary.Blocking == 0, summary, results, GeneratedAt, notes);
    }

    public static string Render(IReportRenderer renderer, Report report)
    {
        using var writer = new StringWriter();
        renderer.Render(report, writer);
        return writer.ToString();
    }
}
