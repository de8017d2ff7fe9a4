namespace Readiness.Core.Reports;

/// <summary>Counts of results by status, and how many results block the release.</summary>
public sealed record ReportSummary(int Pass, int Fail, int Skip, int Manual, int Error, int Blocking)
{
    public static ReportSummary From(IReadOnlyCollection<CheckResult> results, int unconfirmedBlockingManual)
    {
        ArgumentNullException.ThrowIfNull(results);
        return new ReportSummary(
            results.Count(r => r.Status == CheckStatus.Pass),
            results.Count(r => r.Status == CheckStatus.Fail),
            results.Count(r => r.Status == CheckStatus.Skip),
            results.Count(r => r.Status == CheckStatus.Manual),
            results.Count(r => r.Status == CheckStatus.Error),
            results.Count(r => r.IsBlocking) + unconfirmedBlockingManual);
    }
}
