using Readiness.Core.Checks.License;
using Readiness.Core.Reports;
using Readiness.Core.Tests.Licensing;
using Readiness.Testing;
using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.License;

public sealed class LicenseFileCheckTests
{
    private const string Library = "src/Bramble.Sketches/Bramble.Sketches.csproj";
    private const string Plugin = "src/Bramble.Sketches.Lanternfly3/Bramble.Sketches.Lanternfly3.csproj";

    private readonly LicenseFileCheck check = new();

    private static Core.Projects.ProjectModel Projects() => ProjectFixtures.Model(
        ProjectFixtures.Project(Library).Build(),
        ProjectFixtures.Project(Plugin).Build(),
        ProjectFixtures.Project("tests/Bramble.Sketches.Tests/Bramble.Sketches.Tests.csproj").Property("IsPackable", "false").Build());

    [Theory]
    [InlineData("LICENSE")]
    [InlineData("LICENSE.md")]
    [InlineData("LICENSE.txt")]
    [InlineData("license.txt")]
    [InlineData("COPYING")]
    [InlineData("LICENCE")] // British spelling: common practice, no published source
    public void RootLicenseFile_PassesForEachPackableProject(string name)
    {
        // checks.md: LICENSE, LICENSE.md, LICENSE.txt, COPYING at the root or next to the project.
        var findings = Run(check, Projects(), new InMemoryFileTree().Add(name, LicenseTexts.Mit));

        Assert.Equal(2, findings.Count);
        Assert.All(findings, f =>
        {
            AssertStatus(CheckStatus.Pass, f);
            Assert.Equal(name, f.Evidence![0].Path);
        });
    }

    [Fact]
    public void LicenseNextToOneProjectOnly_TheOtherFails()
    {
        var files = new InMemoryFileTree().Add("src/Bramble.Sketches.Lanternfly3/LICENSE.md", LicenseTexts.Mit);

        var findings = Run(check, Projects(), files);

        AssertStatus(CheckStatus.Pass, Single(findings, "Bramble.Sketches.Lanternfly3"));
        var failing = Single(findings, "Bramble.Sketches");
        AssertStatus(CheckStatus.Fail, failing);
        Assert.Equal(new Evidence(Library), failing.Evidence![0]);
        Assert.NotNull(failing.Hint);
    }

    [Fact]
    public void DualLicenseFiles_AllNamed()
    {
        // LICENSE-MIT / LICENSE-APACHE pairs: common practice for dual licensing, no published source.
        var files = new InMemoryFileTree().Add("LICENSE-APACHE", ApacheLicenseText.Full).Add("LICENSE-MIT", LicenseTexts.Mit);

        var finding = Single(Run(check, ProjectFixtures.Model(ProjectFixtures.Project(Library).Build()), files));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("LICENSE-APACHE", finding.Message, StringComparison.Ordinal);
        Assert.Contains("LICENSE-MIT", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ReuseLicensesFolder_Counts()
    {
        // REUSE 3.2: license texts in LICENSES/<id>.<ext> at the root.
        var files = new InMemoryFileTree().Add("LICENSES/MIT.txt", LicenseTexts.Mit);

        AssertStatus(CheckStatus.Pass, Single(Run(check, ProjectFixtures.Model(ProjectFixtures.Project(Library).Build()), files)));
    }

    [Theory]
    [InlineData("LicenseExtensions.cs")]
    [InlineData("docs/LICENSE")]
    [InlineData("licenses.json")]
    public void OtherFiles_DoNotCount(string path)
    {
        var finding = Single(Run(check, ProjectFixtures.Model(ProjectFixtures.Project(Library).Build()), new InMemoryFileTree().Add(path, "x")));

        AssertStatus(CheckStatus.Fail, finding);
    }

    [Fact]
    public void LicensePackedFromElsewhere_Passes()
    {
        var project = ProjectFixtures.Project(Library)
            .Property("PackageLicenseFile", "LICENSE.txt")
            .Pack("../../legal/LICENSE.txt", "legal/LICENSE.txt", "\\")
            .Build();

        var finding = Single(Run(check, ProjectFixtures.Model(project), new InMemoryFileTree().Add("legal/LICENSE.txt", LicenseTexts.Mit)));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Equal("legal/LICENSE.txt", finding.Evidence![0].Path);
    }

    [Fact]
    public void NoPackableProject_Skips()
    {
        var model = ProjectFixtures.Model(ProjectFixtures.Project("tests/T/T.csproj").Property("IsTestProject", "true").Build());

        AssertStatus(CheckStatus.Skip, Single(Run(check, model, new InMemoryFileTree())));
    }

    [Fact]
    public void EveryMessage_SaysItIsNotLegalAdvice()
    {
        var findings = Run(check, Projects(), new InMemoryFileTree().Add("src/Bramble.Sketches.Lanternfly3/LICENSE", LicenseTexts.Mit));

        Assert.All(findings, f => Assert.EndsWith("they are not legal advice.)", f.Message, StringComparison.Ordinal));
    }
}
