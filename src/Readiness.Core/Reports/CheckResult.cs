namespace Readiness.Core.Reports;

/// <summary>One line of a report: what one check found about one subject.</summary>
public sealed record CheckResult(
    string Check,
    string Title,
    CheckStatus Status,
    Severity Severity,
    string? Package,
    string Message,
    string? Hint,
    IReadOnlyList<Evidence> Evidence,
    StandardReference Standard)
{
    /// <summary>A failing (or erroring) result of a blocking check: it makes the release not ready.</summary>
    public bool IsBlocking => Severity == Severity.Block && Status is CheckStatus.Fail or CheckStatus.Error;
}
