using Readiness.Core.Checks;
using Readiness.Core.Checks.License;
using Readiness.Core.Reports;
using Readiness.Testing;
using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.License;

public sealed class LicenseDeclaredCheckTests
{
    private const string Library = "src/Bramble.Sketches/Bramble.Sketches.csproj";

    private readonly LicenseDeclaredCheck check = new();

    private Finding Judge(ProjectFixtures.Builder project, InMemoryFileTree? files = null, string? config = null) =>
        Single(Run(check, ProjectFixtures.Model(project.Build()), files ?? new InMemoryFileTree(), config: config));

    [Theory]
    [InlineData("MIT")]
    [InlineData("MIT OR Apache-2.0")]
    [InlineData("GPL-2.0-or-later WITH Bison-exception-2.2")]
    [InlineData("LGPL-2.1-only OR BSD-3-Clause AND MIT")]
    public void ExpressionNuGetAccepts_Passes(string expression)
    {
        // Accepted by NuGet.Packaging's NuGetLicenseExpression.Parse with standard ids only (SPDX oracle 9 included).
        var finding = Judge(ProjectFixtures.Project(Library).Property("Description", "Sketches").Property("PackageLicenseExpression", expression));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Equal(new Evidence(Library, 4), Assert.Single(finding.Evidence!));
        Assert.Contains("not legal advice", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void LowercaseOperators_FailAsValidSpdxRefusedByNuGet()
    {
        var finding = Judge(ProjectFixtures.Project(Library).Property("PackageLicenseExpression", "MIT or Apache-2.0"));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("valid SPDX but refused by NuGet", finding.Message, StringComparison.Ordinal);
        Assert.StartsWith($"PackageLicenseExpression ({Library}:3)", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void DeprecatedId_FailsNamingTheReplacement()
    {
        var finding = Judge(ProjectFixtures.Project(Library).Property("PackageLicenseExpression", "GPL-2.0"));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("deprecated", finding.Message, StringComparison.Ordinal);
        Assert.Contains("GPL-2.0-only or GPL-2.0-or-later", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void LicenseRef_Fails()
    {
        var finding = Judge(ProjectFixtures.Project(Library).Property("PackageLicenseExpression", "LicenseRef-Bramble-Custom"));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("valid SPDX but refused by NuGet", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void LicenseUrlOnly_FailsAsDeprecated()
    {
        // nuspec reference: licenseUrl is deprecated in favour of license.
        var finding = Judge(ProjectFixtures.Project(Library).Property("PackageLicenseUrl", "https://git.example/bramblecote/bramble-sketches/LICENSE"));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("deprecates", finding.Message, StringComparison.Ordinal);
        Assert.Contains("PackageLicenseExpression", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void NothingDeclared_Fails()
    {
        var finding = Judge(ProjectFixtures.Project(Library).Property("Description", "Sketches"));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Equal(new Evidence(Library), finding.Evidence![0]);
    }

    [Fact]
    public void BothExpressionAndFile_Fail()
    {
        var finding = Judge(ProjectFixtures.Project(Library).Property("PackageLicenseExpression", "MIT").Property("PackageLicenseFile", "LICENSE"));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Equal(2, finding.Evidence!.Count);
    }

    [Fact]
    public void LicenseFilePacked_Passes()
    {
        var project = ProjectFixtures.Project(Library)
            .Property("PackageLicenseFile", "LICENSE.txt")
            .Pack("../../LICENSE.txt", "LICENSE.txt", "\\");

        var finding = Judge(project, new InMemoryFileTree().Add("LICENSE.txt", "terms"));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("packed from LICENSE.txt", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void LicenseFileExistingButNotPacked_Fails()
    {
        var project = ProjectFixtures.Project(Library).Property("PackageLicenseFile", "LICENSE.txt");

        var finding = Judge(project, new InMemoryFileTree().Add("src/Bramble.Sketches/LICENSE.txt", "terms"));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("exists but is not packed", finding.Message, StringComparison.Ordinal);
        Assert.Contains("Pack=\"true\"", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void LicenseFilePackedUnderAnotherPath_Fails()
    {
        // PackagePath "docs" puts LICENSE.txt at docs/LICENSE.txt in the package, not where PackageLicenseFile points.
        var project = ProjectFixtures.Project(Library)
            .Property("PackageLicenseFile", "LICENSE.txt")
            .Pack("../../LICENSE.txt", "LICENSE.txt", "docs");

        var finding = Judge(project, new InMemoryFileTree().Add("LICENSE.txt", "terms"));

        AssertStatus(CheckStatus.Fail, finding);
    }

    [Fact]
    public void LicenseFilePackedFromMissingFile_Fails()
    {
        var project = ProjectFixtures.Project(Library)
            .Property("PackageLicenseFile", "LICENSE.txt")
            .Pack("../../LICENSE.txt", "LICENSE.txt", "");

        var finding = Judge(project, new InMemoryFileTree());

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("does not exist", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UnevaluatedProperty_Skips()
    {
        var project = ProjectFixtures.Project(Library).Property("PackageLicenseExpression", "$(LicenseFromSomewhere)", unevaluated: "property function not evaluated");

        var finding = Judge(project);

        AssertStatus(CheckStatus.Skip, finding);
        Assert.Contains("property function not evaluated", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NotApprovedLicense_FailsOnlyWhenPublishingToNuGetOrg()
    {
        // nuspec reference: nuget.org accepts only OSI- or FSF-approved licenses; NuGet.Packaging's list says which.
        var id = NuGet.Packaging.Licenses.NuGetLicenseData.LicenseList.Values.First(l => !l.IsOsiApproved && !l.IsFsfLibre && !l.IsDeprecatedLicenseId).LicenseID;
        var project = ProjectFixtures.Project(Library).Property("PackageLicenseExpression", id);

        AssertStatus(CheckStatus.Pass, Judge(project));
        AssertStatus(CheckStatus.Fail, Judge(project, config: "publish-to: https://api.nuget.org/v3/index.json\n"));
    }
}
