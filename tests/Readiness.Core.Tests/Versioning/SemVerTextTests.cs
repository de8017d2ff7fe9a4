using NuGet.Versioning;
using Readiness.Core.Versioning;

namespace Readiness.Core.Tests.Versioning;

public sealed class SemVerTextTests
{
    // Reference: semver.org FAQ "Is there a suggested regular expression" examples (standards.md oracle 2).
    [Theory]
    [InlineData("1.0.0-0.3.7")]
    [InlineData("1.0.0-x.7.z.92")]
    [InlineData("1.0.0-x-y-z.--")]
    [InlineData("1.0.0+20130313144700")]
    [InlineData("2.4.0")]
    [InlineData("1.0.0-alpha+001")]
    public void ValidSemVer_HasNoProblem(string version) => Assert.Null(SemVerText.Problem(version));

    // Reference: semver.org FAQ regex rejections (standards.md oracle 2).
    [Theory]
    [InlineData("01.0.0")]
    [InlineData("1.0.0-01")]
    [InlineData("1.0")]
    [InlineData("1.0.0-")]
    [InlineData("1.0.0+")]
    [InlineData("v1.0.0")]
    public void InvalidSemVer_IsRejectedWithAReason(string version)
    {
        var problem = SemVerText.Problem(version);
        Assert.NotNull(problem);
        Assert.DoesNotMatch(SemVerText.FaqRegex(), version);
    }

    [Fact]
    public void FourParts_AreAllowedOnlyWhenAsked()
    {
        // NuGet allows a fourth Revision part (learn.microsoft.com/nuget/concepts/package-versioning); SemVer does not.
        Assert.Contains("fourth", SemVerText.Problem("1.2.3.4"), StringComparison.Ordinal);
        Assert.Null(SemVerText.Problem("1.2.3.4", allowFourParts: true));
    }

    [Fact]
    public void UnicodeDigits_AreNotDigits()
    {
        // SemVer identifiers are ASCII [0-9A-Za-z-] only (semver.org §9); \d in .NET would accept Arabic-Indic digits.
        Assert.NotNull(SemVerText.Problem("1.0.\u0663"));
    }

    [Fact]
    public void Precedence_FollowsSemVerSection11()
    {
        // Reference: semver.org §11 example list (standards.md oracle 1); VersionComparer.VersionRelease ignores metadata.
        string[] ordered =
        [
            "1.0.0-alpha", "1.0.0-alpha.1", "1.0.0-alpha.beta", "1.0.0-beta", "1.0.0-beta.2", "1.0.0-beta.11",
            "1.0.0-rc.1", "1.0.0", "2.0.0", "2.1.0", "2.1.1",
        ];
        for (var i = 1; i < ordered.Length; i++)
        {
            Assert.True(
                VersionComparer.VersionRelease.Compare(NuGetVersion.Parse(ordered[i - 1]), NuGetVersion.Parse(ordered[i])) < 0,
                $"{ordered[i - 1]} < {ordered[i]}");
        }
    }

    [Theory]
    // Reference: NuGet package-versioning doc, normalisation examples (standards.md oracle 3) and NuGetVersionTest.cs (oracle 4).
    [InlineData("1.00", "1.0.0")]
    [InlineData("1.01.1", "1.1.1")]
    [InlineData("1.0.0.0", "1.0.0")]
    [InlineData("1.0.01.0", "1.0.1")]
    [InlineData("1.0.7+r3456", "1.0.7")]
    [InlineData("1.0.0009.01-1.1+A", "1.0.9.1-1.1")]
    public void NuGetNormalisation_MatchesTheDocumentedExamples(string input, string normalized) =>
        Assert.Equal(normalized, NuGetVersion.Parse(input).ToNormalizedString());
}
