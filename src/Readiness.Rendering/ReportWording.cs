using System.Globalization;
using Readiness.Core.Reports;

namespace Readiness.Rendering;

/// <summary>
/// The verdict and the run summary, worded once: every format, the CLI's closing line, the hook and the service use
/// these sentences, so a maintainer reads the same words wherever the report reaches them.
/// </summary>
public static class ReportWording
{
    public static string Verdict(bool ready) => ready ? "READY" : "NOT READY";

    /// <summary><c>2 blocking; 3 fail, 0 error, 1 manual, 4 skip, 12 pass</c> (invariant culture).</summary>
    public static string Counts(ReportSummary summary, int? blocking = null)
    {
        ArgumentNullException.ThrowIfNull(summary);
        return string.Create(
            CultureInfo.InvariantCulture,
            $"{blocking ?? summary.Blocking} blocking; {ReportFacts.Counts(summary, ", ")}");
    }

    /// <summary><c>NOT READY: 2.4.0 — 2 blocking; 3 fail, 0 error, 1 manual, 4 skip, 12 pass</c>.</summary>
    public static string Sentence(Report report)
    {
        ArgumentNullException.ThrowIfNull(report);
        var version = UntrustedText.OneLine(report.Subject.Version);
        return $"{Verdict(report.Ready)}: {(version.Length > 0 ? version : "(no version)")} — {Counts(report.Summary)}";
    }
}
