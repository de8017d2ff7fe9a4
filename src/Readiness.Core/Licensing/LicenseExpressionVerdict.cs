namespace Readiness.Core.Licensing;

/// <summary>What <see cref="LicenseExpressionJudge"/> concluded about one <c>PackageLicenseExpression</c>.</summary>
/// <param name="Accepted">NuGet parses it and every identifier is a standard one (or NuGet's own <c>UNLICENSED</c>).</param>
/// <param name="Message">One sentence for the report.</param>
/// <param name="Hint">How to fix it, when it is not accepted.</param>
/// <param name="NotApproved">Standard ids that are neither OSI-approved nor FSF-libre (nuget.org accepts neither).</param>
/// <param name="ValidSpdx">It is a valid SPDX expression (grammar and ids), whatever NuGet says.</param>
public sealed record LicenseExpressionVerdict(
    bool Accepted,
    string Message,
    string? Hint,
    IReadOnlyList<string> NotApproved,
    bool ValidSpdx);
