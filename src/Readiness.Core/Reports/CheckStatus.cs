namespace Readiness.Core.Reports;

/// <summary>The outcome of one check on one subject. The lowercase names are part of the JSON contract.</summary>
public enum CheckStatus
{
    Pass,
    Fail,
    Skip,
    Manual,
    Error,
}
