using Readiness.Core.Checks;
using Readiness.Core.Checks.License;
using Readiness.Core.Reports;
using Readiness.Core.Tests.Licensing;
using Readiness.Testing;
using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.License;

public sealed class LicenseAgreesCheckTests
{
    private const string Library = "src/Bramble.Sketches/Bramble.Sketches.csproj";

    private readonly LicenseAgreesCheck check = new();

    private Finding Judge(string expression, InMemoryFileTree files) =>
        Single(Run(check, ProjectFixtures.Model(ProjectFixtures.Project(Library).Property("PackageLicenseExpression", expression).Build()), files));

    [Theory]
    [InlineData("MIT", nameof(LicenseTexts.Mit))]
    [InlineData("ISC", nameof(LicenseTexts.Isc))]
    [InlineData("BSD-2-Clause", nameof(LicenseTexts.Bsd2))]
    [InlineData("BSD-3-Clause", nameof(LicenseTexts.Bsd3))]
    [InlineData("Unlicense", nameof(LicenseTexts.Unlicense))]
    [InlineData("GPL-3.0-or-later", nameof(LicenseTexts.Gpl3Opening))]
    [InlineData("GPL-3.0-only", nameof(LicenseTexts.Gpl3Opening))]
    [InlineData("LGPL-3.0-only", nameof(LicenseTexts.Lgpl3Opening))]
    [InlineData("MPL-2.0", nameof(LicenseTexts.Mpl2Opening))]
    public void TextOfTheDeclaredLicense_Passes(string expression, string fixture)
    {
        var text = (string)typeof(LicenseTexts).GetField(fixture)!.GetValue(null)!;

        var finding = Judge(expression, new InMemoryFileTree().Add("LICENSE", text));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains(new Evidence("LICENSE"), finding.Evidence!);
        Assert.Contains(new Evidence(Library, 3), finding.Evidence!);
    }

    [Fact]
    public void ApacheText_PassesForApache()
    {
        AssertStatus(CheckStatus.Pass, Judge("Apache-2.0", new InMemoryFileTree().Add("LICENSE.txt", ApacheLicenseText.Full)));
    }

    [Fact]
    public void MitTextWithApacheDeclared_Fails()
    {
        var finding = Judge("Apache-2.0", new InMemoryFileTree().Add("LICENSE", LicenseTexts.Mit));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("recognised as MIT, but", finding.Message, StringComparison.Ordinal);
        Assert.Contains("https://spdx.org/licenses/Apache-2.0.html", finding.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void Bsd2TextWithBsd3Declared_Fails()
    {
        AssertStatus(CheckStatus.Fail, Judge("BSD-3-Clause", new InMemoryFileTree().Add("LICENSE", LicenseTexts.Bsd2)));
    }

    [Fact]
    public void UnknownText_FailsAsNotRecognised()
    {
        var finding = Judge("MIT", new InMemoryFileTree().Add("LICENSE", "Copyright (c) 2026 Bramblecote Software.\n\nYou may use this library on Tuesdays.\n"));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("not recognised", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void OrExpression_EitherTextSuffices()
    {
        Assert.Equal(CheckStatus.Pass, Judge("MIT OR Apache-2.0", new InMemoryFileTree().Add("LICENSE", LicenseTexts.Mit)).Status);
        Assert.Equal(CheckStatus.Pass, Judge("MIT OR Apache-2.0", new InMemoryFileTree().Add("LICENSE", ApacheLicenseText.Full)).Status);
        Assert.Equal(CheckStatus.Fail, Judge("MIT OR Apache-2.0", new InMemoryFileTree().Add("LICENSE", LicenseTexts.Isc)).Status);
    }

    [Fact]
    public void AndExpression_NeedsEveryText()
    {
        var both = new InMemoryFileTree().Add("LICENSE-MIT", LicenseTexts.Mit).Add("LICENSE-BSD", LicenseTexts.Bsd3);

        AssertStatus(CheckStatus.Pass, Judge("MIT AND BSD-3-Clause", both));
        AssertStatus(CheckStatus.Fail, Judge("MIT AND BSD-3-Clause", new InMemoryFileTree().Add("LICENSE", LicenseTexts.Mit)));
    }

    [Fact]
    public void DualLicenseInOneFile_Passes()
    {
        var finding = Judge("MIT OR Apache-2.0", new InMemoryFileTree().Add("LICENSE", LicenseTexts.Mit + "\n\n" + ApacheLicenseText.Full));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("MIT + Apache-2.0", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void IdWithoutReferenceText_Skips()
    {
        var finding = Judge("LGPL-2.1-only", new InMemoryFileTree().Add("LICENSE", "GNU LESSER GENERAL PUBLIC LICENSE Version 2.1, February 1999"));

        AssertStatus(CheckStatus.Skip, finding);
        Assert.Contains("No reference text for LGPL-2.1-only", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void WithException_JudgesTheLicense()
    {
        AssertStatus(CheckStatus.Pass, Judge("GPL-3.0-or-later WITH GCC-exception-3.1", new InMemoryFileTree().Add("COPYING", LicenseTexts.Gpl3Opening)));
    }

    [Fact]
    public void NoLicenseFile_Skips()
    {
        AssertStatus(CheckStatus.Skip, Judge("MIT", new InMemoryFileTree()));
    }

    [Fact]
    public void InvalidExpression_Skips()
    {
        AssertStatus(CheckStatus.Skip, Judge("MIT/Apache-2.0", new InMemoryFileTree().Add("LICENSE", LicenseTexts.Mit)));
    }

    [Fact]
    public void PackedLicenseFile_RecognisedWithNote()
    {
        var project = ProjectFixtures.Project(Library).Property("PackageLicenseFile", "LICENSE.txt").Pack("../../LICENSE.txt", "LICENSE.txt", "\\").Build();

        var finding = Single(Run(check, ProjectFixtures.Model(project), new InMemoryFileTree().Add("LICENSE.txt", LicenseTexts.Bsd3)));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("PackageLicenseExpression BSD-3-Clause would say the same", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void SampleLibraryLicense_AgreesWithItsDeclaration()
    {
        // The MIT text the end-to-end sample library ships (Readiness.Testing.SampleLibrary).
        AssertStatus(CheckStatus.Pass, Judge("MIT", new InMemoryFileTree().Add("LICENSE", SampleLibrary.MitLicense)));
    }
}
