using Readiness.Core.Reports;

namespace Readiness.Cli.Commands;

/// <summary>Maps a report to an exit code under <c>--fail-on</c>.</summary>
public static class FailPolicy
{
    public static int ExitCode(Report report, string failOn)
    {
        ArgumentNullException.ThrowIfNull(report);
        return failOn switch
        {
            "never" => ExitCodes.Ready,
            "warn" => !report.Ready || report.Results.Any(r => r.Severity == Severity.Warn && r.Status is CheckStatus.Fail or CheckStatus.Error)
                ? ExitCodes.NotReady
                : ExitCodes.Ready,
            _ => report.Ready ? ExitCodes.Ready : ExitCodes.NotReady,
        };
    }
}
