using Readiness.Core.Reports;

namespace Readiness.Rendering;

/// <summary>Facts about a report that several renderers show the same way.</summary>
internal static class ReportFacts
{
    /// <summary>Prefix of the check ids the engine gives to a checklist's manual items.</summary>
    public const string ManualPrefix = "manual.";

    /// <summary>
    /// Seven hex digits, git's default minimum abbreviation (git-config core.abbrev; from memory of the git docs).
    /// </summary>
    public static string ShortCommit(string commit) =>
        commit.Length > 7 && commit.All(Uri.IsHexDigit) ? commit[..7] : commit;

    public static bool IsManualItem(CheckResult result) =>
        result.Check.StartsWith(ManualPrefix, StringComparison.Ordinal);

    /// <summary>
    /// What keeps the release from being ready: blocking failures and errors, and unconfirmed blocking manual items
    /// (checks.md: ready when no block check failed and no block manual item is unconfirmed).
    /// </summary>
    public static bool Blocks(CheckResult result) =>
        result.IsBlocking || (result.Status == CheckStatus.Manual && result.Severity == Severity.Block);

    public static IEnumerable<CheckResult> Failures(Report report) =>
        report.ByImportance().Where(r => r.Status is CheckStatus.Fail or CheckStatus.Error);

    public static IEnumerable<CheckResult> Blocking(Report report) => report.ByImportance().Where(Blocks);

    /// <summary>Where a report line points, as <c>path:line</c>.</summary>
    public static string Where(Evidence evidence) => evidence.ToString();

    /// <summary>True for absolute http(s) URLs: the only link targets a report shows as links.</summary>
    public static bool IsWebUrl(string? url) =>
        Uri.TryCreate(url, UriKind.Absolute, out var uri)
        && (uri.Scheme == Uri.UriSchemeHttps || uri.Scheme == Uri.UriSchemeHttp);

    public static string Subject(ReportSubject subject, string separator)
    {
        var parts = new List<string>
        {
            "version " + (subject.Version ?? "unknown"),
            subject.Tag is null ? "no tag" : "tag " + subject.Tag,
            "commit " + ShortCommit(subject.Commit),
            "checklist " + subject.Checklist,
        };
        if (subject.Inspected == InspectionKind.Worktree)
        {
            parts.Add("working tree");
        }

        return string.Join(separator, parts.Select(UntrustedText.OneLine));
    }

    public static string Counts(ReportSummary summary, string separator) =>
        string.Join(
            separator,
            $"{summary.Fail} {CheckStatus.Fail.Name()}",
            $"{summary.Error} {CheckStatus.Error.Name()}",
            $"{summary.Manual} {CheckStatus.Manual.Name()}",
            $"{summary.Skip} {CheckStatus.Skip.Name()}",
            $"{summary.Pass} {CheckStatus.Pass.Name()}");
}
