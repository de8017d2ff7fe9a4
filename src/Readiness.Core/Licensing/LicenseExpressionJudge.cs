using NuGet.Packaging.Licenses;

namespace Readiness.Core.Licensing;

/// <summary>
/// Judges a license expression twice: with NuGet.Packaging's own parser (what <c>dotnet pack</c> and the registry
/// apply) and with the SPDX grammar (<see cref="SpdxExpressionParser"/>), so that an expression SPDX accepts but
/// NuGet refuses is named as such, precisely.
/// </summary>
public static class LicenseExpressionJudge
{
    public static LicenseExpressionVerdict Judge(string expression)
    {
        ArgumentNullException.ThrowIfNull(expression);
        var spdxValid = IsValidSpdx(expression, out var spdx, out var spdxProblem);
        NuGetLicenseExpression parsed;
        try
        {
            parsed = NuGetLicenseExpression.Parse(expression);
        }
        catch (NuGetLicenseExpressionParsingException e)
        {
            return Refused(expression, e.Message, spdxValid, spdxProblem, spdx);
        }

        var nonStandard = new List<NuGetLicense>();
        var approved = new List<string>();
        var notApproved = new List<string>();
        parsed.OnEachLeafNode(
            license =>
            {
                if (!license.IsStandardLicense)
                {
                    nonStandard.Add(license);
                }
                else if (NuGetLicenseData.LicenseList.TryGetValue(license.Identifier, out var data) && !data.IsOsiApproved && !data.IsFsfLibre)
                {
                    notApproved.Add(license.Identifier);
                }
            },
            _ => { });

        if (nonStandard.Count == 0)
        {
            var unlicensed = parsed.IsUnlicensed()
                ? " UNLICENSED is NuGet's own keyword (not SPDX): it says no license is granted to anyone."
                : string.Empty;
            return new LicenseExpressionVerdict(true, $"'{expression.Trim()}' is a valid license expression NuGet accepts.{unlicensed}", null, notApproved, spdxValid);
        }

        var problems = nonStandard.Select(l => Describe(l.Identifier)).ToArray();
        var validSpdx = spdxValid ? "valid SPDX but refused by NuGet: " : "not accepted: ";
        return new LicenseExpressionVerdict(
            false,
            $"'{expression.Trim()}' is {validSpdx}{string.Join("; ", problems.Select(p => p.Problem))}.",
            string.Join(" ", problems.Select(p => p.Hint).Distinct()),
            notApproved,
            spdxValid);
    }

    private static (string Problem, string Hint) Describe(string id)
    {
        if (id.Contains("LicenseRef-", StringComparison.OrdinalIgnoreCase))
        {
            return ($"NuGet's license grammar has no LicenseRef- references, so it takes '{id}' for an unknown identifier (nuget.org accepts only OSI- or FSF-approved SPDX licenses)",
                "Ship the license text in the package and name it with PackageLicenseFile instead of PackageLicenseExpression.");
        }

        if (SpdxLicenseList.License(id) is { } known)
        {
            var deprecated = known.IsDeprecatedLicenseId ? $" (and {known.LicenseID} is deprecated: use {DeprecatedLicenseIds.ReplacementFor(known.LicenseID) ?? "a current id"})" : string.Empty;
            return ($"NuGet matches identifiers case-sensitively and does not recognise '{id}' as '{known.LicenseID}' (SPDX ids are case-insensitive){deprecated}",
                $"Write the identifier as the SPDX list spells it: {known.LicenseID}.");
        }

        return ($"'{id}' is not an identifier on the SPDX license list (list {SpdxLicenseList.Version} as NuGet.Packaging carries it)",
            "Use an identifier from https://spdx.org/licenses/, or ship a custom license text with PackageLicenseFile.");
    }

    private static LicenseExpressionVerdict Refused(string expression, string nugetMessage, bool spdxValid, string? spdxProblem, SpdxNode? spdx)
    {
        var text = expression.Trim();
        var deprecated = DeprecatedLicenseIds.In(expression);
        if (deprecated.Count > 0)
        {
            var replacements = deprecated.Select(id => DeprecatedLicenseIds.ReplacementFor(id) is { } r ? $"{id} → {r}" : $"{id} → (see the SPDX list)");
            return new LicenseExpressionVerdict(
                false,
                $"'{text}' uses deprecated SPDX identifier{(deprecated.Count == 1 ? string.Empty : "s")} {string.Join(", ", deprecated)}, which NuGet refuses ({nugetMessage}).",
                $"Replace: {string.Join("; ", replacements)} (SPDX license list; -only and -or-later say whether later versions may be chosen).",
                [],
                spdxValid);
        }

        if (spdxValid)
        {
            var reason = SpdxExpressionParser.LowercaseOperators(expression) is { Count: > 0 } lower
                ? $"NuGet requires the operators in upper case, while SPDX 3 also allows lower case ({string.Join(", ", lower)})"
                : spdx!.Licenses.Any(l => l.IsReference) || expression.Contains("AdditionRef-", StringComparison.OrdinalIgnoreCase)
                    ? "NuGet's grammar has no DocumentRef-/LicenseRef-/AdditionRef- references"
                    : $"NuGet says: {nugetMessage}";
            var hint = reason.StartsWith("NuGet requires", StringComparison.Ordinal)
                ? $"Write the operators in upper case: {UppercaseOperators(text)}."
                : "Use only SPDX list identifiers with upper-case operators, or ship the license text with PackageLicenseFile.";
            return new LicenseExpressionVerdict(false, $"'{text}' is valid SPDX but refused by NuGet: {reason}.", hint, [], true);
        }

        return new LicenseExpressionVerdict(
            false,
            $"'{text}' is not a valid license expression: {spdxProblem ?? nugetMessage} (NuGet: {nugetMessage}).",
            "Write an SPDX expression such as MIT, Apache-2.0 or (MIT OR Apache-2.0): list identifiers joined by AND, OR and WITH.",
            [],
            false);
    }

    /// <summary>Valid SPDX: the grammar holds and every id is on the list (or a reference).</summary>
    private static bool IsValidSpdx(string expression, out SpdxNode? node, out string? problem)
    {
        if (!SpdxExpressionParser.TryParse(expression.Trim(), out node, out problem))
        {
            return false;
        }

        var unknown = node!.Licenses.Where(l => !l.IsReference && SpdxLicenseList.License(l.Id) is null).Select(l => l.Id).ToArray();
        var additions = Additions(node).Where(a => !a.Contains("AdditionRef-", StringComparison.OrdinalIgnoreCase) && SpdxLicenseList.Exception(a) is null).ToArray();
        if (unknown.Length > 0 || additions.Length > 0)
        {
            problem = $"{string.Join(", ", unknown.Concat(additions).Select(u => $"'{u}'"))} {(unknown.Length + additions.Length == 1 ? "is" : "are")} not on the SPDX license or exception list";
            return false;
        }

        return true;
    }

    private static IEnumerable<string> Additions(SpdxNode node) => node switch
    {
        SpdxNode.With with => [with.Addition],
        SpdxNode.And and => Additions(and.Left).Concat(Additions(and.Right)),
        SpdxNode.Or or => Additions(or.Left).Concat(Additions(or.Right)),
        _ => [],
    };

    private static string UppercaseOperators(string expression) =>
        string.Join(' ', expression.Split(' ', StringSplitOptions.RemoveEmptyEntries)
            .Select(t => t is "and" or "or" or "with" ? t.ToUpperInvariant() : t));
}
