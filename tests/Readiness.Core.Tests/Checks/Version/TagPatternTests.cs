using Readiness.Core.Checks;

namespace Readiness.Core.Tests.Checks.Version;

public sealed class TagPatternTests
{
    [Theory]
    [InlineData("v{version}", "v2.4.0", null, "2.4.0")]
    [InlineData("v{version}", "v2.4.0-rc.1", null, "2.4.0-rc.1")]
    [InlineData("{id}/v{version}", "Bramble.Sketches/v2.4.0", "Bramble.Sketches", "2.4.0")]
    [InlineData("release-{version}", "release-1.0.0", null, "1.0.0")]
    public void Match_ReturnsIdAndVersion(string pattern, string tag, string? id, string version)
    {
        var match = new TagPattern(pattern).Match(tag);
        Assert.NotNull(match);
        Assert.Equal((id, version), (match.Value.Id, match.Value.Version));
    }

    [Theory]
    [InlineData("v{version}", "2.4.0")]
    [InlineData("v{version}", "vnext")]
    [InlineData("v{version}", "v")]
    [InlineData("{id}/v{version}", "v2.4.0")]
    public void Match_RejectsOtherTags(string pattern, string tag) => Assert.Null(new TagPattern(pattern).Match(tag));

    [Fact]
    public void FormatAndGlob_RoundTrip()
    {
        var pattern = new TagPattern("{id}/v{version}");
        Assert.Equal("Bramble.Sketches/v2.4.0", pattern.Format("2.4.0", "Bramble.Sketches"));
        Assert.Equal("*/v*", pattern.Glob);
    }
}
