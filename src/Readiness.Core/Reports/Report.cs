namespace Readiness.Core.Reports;

/// <summary>
/// The verdict on one release candidate. A tree of immutable records that knows nothing of its renderers.
/// </summary>
public sealed record Report(
    ReportSubject Subject,
    bool Ready,
    ReportSummary Summary,
    IReadOnlyList<CheckResult> Results,
    DateTimeOffset GeneratedAt,
    IReadOnlyList<string> Notes)
{
    public const string Schema = "readiness-report/1";

    /// <summary>Results ordered for reading: blocking failures first, then other failures, errors, manual, skips, passes.</summary>
    public IEnumerable<CheckResult> ByImportance() =>
        Results.OrderBy(r => r.IsBlocking ? 0 : 1)
            .ThenBy(r => r.Status switch
            {
                CheckStatus.Fail => 0,
                CheckStatus.Error => 1,
                CheckStatus.Manual => 2,
                CheckStatus.Skip => 3,
                _ => 4,
            })
            .ThenBy(r => r.Severity)
            .ThenBy(r => r.Check, StringComparer.Ordinal);
}
