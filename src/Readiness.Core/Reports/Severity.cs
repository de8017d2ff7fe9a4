namespace Readiness.Core.Reports;

/// <summary>How much a failing check matters. Only <see cref="Block"/> makes a release not ready.</summary>
public enum Severity
{
    Block,
    Warn,
    Info,
}
