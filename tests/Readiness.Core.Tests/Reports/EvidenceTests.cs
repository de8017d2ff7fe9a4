using Readiness.Core.Reports;

namespace Readiness.Core.Tests.Reports;

public sealed class EvidenceTests
{
    [Fact]
    public void Condense_DropsRepeats_AndABarePathThatALineOfTheSameFileNames()
    {
        var condensed = Evidence.Condense(
        [
            new Evidence("CHANGELOG.md"),
            new Evidence("CHANGELOG.md", 6),
            new Evidence("CHANGELOG.md", 6),
            new Evidence("LICENSE"),
            new Evidence("src/Bramble.Sketches/Bramble.Sketches.csproj", 9),
            new Evidence("CHANGELOG.md", 12),
        ]);

        Assert.Equal(["CHANGELOG.md:6", "LICENSE", "src/Bramble.Sketches/Bramble.Sketches.csproj:9", "CHANGELOG.md:12"], condensed.Select(e => e.ToString()));
    }

    [Fact]
    public void Condense_KeepsBarePaths_WhenNoLineIsKnown() =>
        Assert.Equal(
            [new Evidence("signing/release.pfx"), new Evidence("LICENSE")],
            Evidence.Condense([new Evidence("signing/release.pfx"), new Evidence("LICENSE"), new Evidence("signing/release.pfx")]));
}
