using Readiness.Core.Reports;

namespace Readiness.Core.Checks;

/// <summary>What a check found about one subject; the engine adds id, title, severity and standard.</summary>
public sealed record Finding(
    CheckStatus Status,
    string Message,
    string? Hint = null,
    string? Package = null,
    IReadOnlyList<Evidence>? Evidence = null)
{
    public static Finding Pass(string message, string? package = null, params Evidence[] evidence) =>
        new(CheckStatus.Pass, message, null, package, evidence);

    public static Finding Fail(string message, string hint, string? package = null, params Evidence[] evidence) =>
        new(CheckStatus.Fail, message, hint, package, evidence);

    public static Finding Skip(string message, string? package = null, params Evidence[] evidence) =>
        new(CheckStatus.Skip, message, null, package, evidence);

    public static Finding Error(string message, string? package = null, params Evidence[] evidence) =>
        new(CheckStatus.Error, message, null, package, evidence);
}
