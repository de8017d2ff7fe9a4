namespace Readiness.Core.Reports;

/// <summary>The contract words for statuses and severities (cli.md), shared by every renderer and parser.</summary>
public static class StatusNames
{
    public static string Name(this CheckStatus status) => status switch
    {
        CheckStatus.Pass => "pass",
        CheckStatus.Fail => "fail",
        CheckStatus.Skip => "skip",
        CheckStatus.Manual => "manual",
        CheckStatus.Error => "error",
        _ => throw new ArgumentOutOfRangeException(nameof(status)),
    };

    public static string Name(this Severity severity) => severity switch
    {
        Severity.Block => "block",
        Severity.Warn => "warn",
        Severity.Info => "info",
        _ => throw new ArgumentOutOfRangeException(nameof(severity)),
    };

    public static bool TryParseSeverity(string? text, out Severity severity)
    {
        switch (text)
        {
            case "block": severity = Severity.Block; return true;
            case "warn": severity = Severity.Warn; return true;
            case "info": severity = Severity.Info; return true;
            default: severity = default; return false;
        }
    }
}
