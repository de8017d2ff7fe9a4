using Readiness.Core.Checks.Metadata;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Testing;
using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Metadata;

public sealed class PackageMetadataCheckTests
{
    private const string Lib = "src/Bramble.Sketches/Bramble.Sketches.csproj";

    private static ProjectFixtures.Builder Complete() => ProjectFixtures.Project(Lib)
        .PropertyIn("Directory.Build.props", "Authors", "Bramblecote Software")
        .PropertyIn("Directory.Build.props", "RepositoryUrl", "https://git.example/bramblecote/sketches")
        .Property("Description", "Streaming quantile and distinct-count sketches.")
        .Property("PackageTags", "sketches;quantiles;streaming")
        .Property("PackageReadmeFile", "README.md")
        .Pack("..\\..\\README.md", "README.md", "\\");

    private static InMemoryFileTree Files() => new InMemoryFileTree().Add("README.md", "# Bramble.Sketches\n").Add("icon.png", "png");

    [Fact]
    public void CompleteMetadata_Passes()
    {
        var finding = Single(Run(new PackageMetadataCheck(), ProjectFixtures.Model(Complete().Build()), Files()));

        AssertStatus(CheckStatus.Pass, finding);
        Assert.Contains("Directory.Build.props:3", EvidenceText(finding));
    }

    [Fact]
    public void SdkDefaults_FailNamingEachProblem()
    {
        var project = ProjectFixtures.Project(Lib).Property("Authors", "Bramble.Sketches").Property("Description", "Package Description").Build();

        var finding = Single(Run(new PackageMetadataCheck(), ProjectFixtures.Model(project), Files()));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("Description is the SDK default 'Package Description'", finding.Message, StringComparison.Ordinal);
        Assert.Contains("Authors is 'Bramble.Sketches', the SDK default", finding.Message, StringComparison.Ordinal);
        Assert.Contains("no RepositoryUrl", finding.Message, StringComparison.Ordinal);
        Assert.Contains("no PackageTags", finding.Message, StringComparison.Ordinal);
        Assert.Contains("no PackageReadmeFile", finding.Message, StringComparison.Ordinal);
        Assert.Equal([$"{Lib}:4", $"{Lib}:3"], EvidenceText(finding));
    }

    [Fact]
    public void ReadmeNotPacked_Fails()
    {
        var project = ProjectFixtures.Project(Lib)
            .Property("Authors", "Bramblecote Software").Property("Description", "Sketches.")
            .Property("RepositoryUrl", "https://git.example/bramblecote/sketches").Property("PackageTags", "sketches")
            .Property("PackageReadmeFile", "README.md")
            .Pack("..\\..\\README.md", "README.md", null) // no PackagePath: lands under content/
            .Build();

        var finding = Single(Run(new PackageMetadataCheck(), ProjectFixtures.Model(project), Files()));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("no item packs a file to that path", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void PackedReadmeMissingAtCommit_Fails()
    {
        var finding = Single(Run(new PackageMetadataCheck(), ProjectFixtures.Model(Complete().Build()), new InMemoryFileTree()));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("the readme README.md", finding.Message, StringComparison.Ordinal);
        Assert.Contains("does not exist", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void DeclaredIconMissing_FailsButPackedIconPasses()
    {
        var missing = Complete().Property("PackageIcon", "icon.png").Build();
        var packed = Complete().Property("PackageIcon", "images/icon.png").Pack("..\\..\\icon.png", "icon.png", "images\\").Build();

        AssertStatus(CheckStatus.Fail, Single(Run(new PackageMetadataCheck(), ProjectFixtures.Model(missing), Files())));
        AssertStatus(CheckStatus.Pass, Single(Run(new PackageMetadataCheck(), ProjectFixtures.Model(packed), Files())));
    }

    // Where NuGet pack puts a packed file (https://learn.microsoft.com/nuget/reference/msbuild-targets#packagepath).
    [Theory]
    [InlineData("README.md", "\\", "README.md")]
    [InlineData("README.md", "", "README.md")]
    [InlineData("docs/README.md", "docs\\", "docs/README.md")]
    [InlineData("docs/guide.md", "README.md", "README.md")]
    [InlineData("icon.png", "images", "images/icon.png")]
    [InlineData("README.md", null, "content/README.md")]
    public void PackagePaths_FollowPack(string file, string? packagePath, string expected) =>
        Assert.Equal(expected, PackagePaths.InPackage(new PackItem(file, file, packagePath, new SourceLocation("p.csproj", 1))));
}
