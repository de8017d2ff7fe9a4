using NuGet.Packaging.Licenses;
using Readiness.Core.Licensing;

namespace Readiness.Core.Tests.Licensing;

public sealed class LicenseExpressionJudgeTests
{
    public static TheoryData<string, bool> Expressions => new()
    {
        // expression, valid SPDX (grammar and ids: SPDX 3.0.1 annex; ids from the SPDX license list)
        { "MIT", true },
        { "Apache-2.0", true },
        { "MIT OR Apache-2.0", true },
        { "(MIT OR Apache-2.0) AND BSD-2-Clause", true },
        { "LGPL-2.1-only OR BSD-3-Clause AND MIT", true },
        { "GPL-2.0-or-later WITH Bison-exception-2.2", true },
        { "Apache-2.0+", true },
        { "MIT or Apache-2.0", true },
        { "mit", true },
        { "LicenseRef-Bramble-Custom", true },
        { "GPL-2.0", true },
        { "GPL-3.0+", true },
        { "Bramble-License", false },
        { "MIT Or Apache-2.0", false },
        { "MIT/Apache-2.0", false },
        { "(MIT", false },
        { "MIT AND", false },
        { "MIT WITH Bramble-exception", false },
    };

    [Theory]
    [MemberData(nameof(Expressions))]
    public void Verdict_AgreesWithNuGetParser(string expression, bool validSpdx)
    {
        // Reference: NuGet.Packaging's own parser — what pack and the registry apply. Accepted means it parses and
        // every identifier is a standard one.
        bool nuGetAccepts;
        try
        {
            nuGetAccepts = NuGetLicenseExpression.Parse(expression).HasOnlyStandardIdentifiers();
        }
        catch (NuGetLicenseExpressionParsingException)
        {
            nuGetAccepts = false;
        }

        var verdict = LicenseExpressionJudge.Judge(expression);

        Assert.Equal(nuGetAccepts, verdict.Accepted);
        Assert.Equal(validSpdx, verdict.ValidSpdx);
        Assert.Equal(verdict.Accepted, verdict.Hint is null);
    }

    [Fact]
    public void NuGetParser_AndBindsTighterThanOr()
    {
        // SPDX oracle 9 against NuGet.Packaging's tree: the root is OR, its right side the AND.
        var root = Assert.IsType<LogicalOperator>(NuGetLicenseExpression.Parse("LGPL-2.1-only OR BSD-3-Clause AND MIT"));

        Assert.Equal(LogicalOperatorType.Or, root.LogicalOperatorType);
        Assert.Equal(LogicalOperatorType.And, Assert.IsType<LogicalOperator>(root.Right).LogicalOperatorType);
    }

    [Fact]
    public void LowercaseOperators_ValidSpdxButRefusedByNuGet()
    {
        // standards.md oracle 9: "MIT or Apache-2.0" is valid SPDX 3.x but rejected by NuGet.
        var verdict = LicenseExpressionJudge.Judge("MIT or Apache-2.0");

        Assert.False(verdict.Accepted);
        Assert.Contains("valid SPDX but refused by NuGet", verdict.Message, StringComparison.Ordinal);
        Assert.Contains("upper case", verdict.Message, StringComparison.Ordinal);
        Assert.Contains("MIT OR Apache-2.0", verdict.Hint, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("GPL-2.0", "GPL-2.0 → GPL-2.0-only or GPL-2.0-or-later")]
    [InlineData("GPL-3.0+", "GPL-3.0+ → GPL-3.0-or-later")]
    [InlineData("MIT OR LGPL-2.1", "LGPL-2.1 → LGPL-2.1-only")]
    [InlineData("GPL-2.0-only WITH Nokia-Qt-exception-1.1", "Nokia-Qt-exception-1.1 → Qt-LGPL-exception-1.1")]
    public void DeprecatedIds_FailNamingTheReplacement(string expression, string replacement)
    {
        // Deprecation from NuGet.Packaging's embedded SPDX list; replacements from the SPDX list (from memory).
        Assert.Contains(expression.Split(' '), token =>
            (NuGetLicenseData.LicenseList.TryGetValue(token, out var license) && license.IsDeprecatedLicenseId)
            || (NuGetLicenseData.ExceptionList.TryGetValue(token, out var exception) && exception.IsDeprecatedLicenseId));

        var verdict = LicenseExpressionJudge.Judge(expression);

        Assert.False(verdict.Accepted);
        Assert.Contains("deprecated", verdict.Message, StringComparison.Ordinal);
        Assert.Contains(replacement, verdict.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void LicenseRef_ValidSpdxButRefusedByNuGet()
    {
        var verdict = LicenseExpressionJudge.Judge("LicenseRef-Bramble-Custom");

        Assert.False(verdict.Accepted);
        Assert.Contains("valid SPDX but refused by NuGet", verdict.Message, StringComparison.Ordinal);
        Assert.Contains("LicenseRef-", verdict.Message, StringComparison.Ordinal);
        Assert.Contains("PackageLicenseFile", verdict.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void WrongCaseId_NamesTheListSpelling()
    {
        // SPDX: ids are case-insensitive; NuGet.Packaging matches them exactly (pitfalls.md).
        var verdict = LicenseExpressionJudge.Judge("mit");

        Assert.False(verdict.Accepted);
        Assert.Contains("valid SPDX but refused by NuGet", verdict.Message, StringComparison.Ordinal);
        Assert.Contains("Write the identifier as the SPDX list spells it: MIT.", verdict.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void UnknownId_IsNotOnTheList()
    {
        var verdict = LicenseExpressionJudge.Judge("Bramble-License");

        Assert.False(verdict.Accepted);
        Assert.Contains("not an identifier on the SPDX license list", verdict.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NotApprovedId_IsReported()
    {
        // NuGet.Packaging's list flags each id as OSI-approved and/or FSF-libre; nuget.org wants one of them.
        var id = NuGetLicenseData.LicenseList.Values.First(l => !l.IsOsiApproved && !l.IsFsfLibre && !l.IsDeprecatedLicenseId).LicenseID;

        var verdict = LicenseExpressionJudge.Judge(id);

        Assert.True(verdict.Accepted);
        Assert.Equal([id], verdict.NotApproved);
    }
}
