using Readiness.Core.Licensing;

namespace Readiness.Core.Tests.Licensing;

public sealed class LicenseTextNormalizerTests
{
    // SPDX license matching guidelines (https://spdx.github.io/spdx-spec/v2.3/license-matching-guidelines-and-templates/),
    // one pair per guideline: the two texts must match.
    [Theory]
    [InlineData("The Software", "the   software")]                                             // case; whitespace
    [InlineData("the \"Software\"", "the \u201CSoftware\u201D")]                                   // quotes
    [InlineData("the 'Software'", "the \u2018Software\u2019")]                                     // quotes
    [InlineData("non-exclusive", "non\u2013exclusive")]                                          // dashes
    [InlineData("non-exclusive", "non\u2014exclusive")]                                          // dashes
    [InlineData("see http://www.apache.org/licenses/", "see https://www.apache.org/licenses/")] // http = https
    [InlineData("1. Redistributions of source", "* Redistributions of source")]                 // bullets and numbering
    [InlineData("(a) You must give", "You must give")]                                          // numbering
    [InlineData("this licence", "this license")]                                                 // equivalent words
    [InlineData("the following acknowledgement", "the following acknowledgment")]               // equivalent words
    [InlineData("Copyright (c) 2026 Bramblecote Software\nPermission is granted", "Permission is granted")] // copyright notice
    [InlineData("Copyright 2019-2026 Bramblecote\nAll rights reserved.\nPermission", "© 2026 someone\nPermission")]
    public void GuidelinePairs_NormaliseEqual(string left, string right)
    {
        Assert.Equal(LicenseTextNormalizer.Normalize(left), LicenseTextNormalizer.Normalize(right));
    }

    [Fact]
    public void BodyLinesStartingWithCopyright_AreKept()
    {
        // A rewrapped body line may begin with "copyright notice ..."; only notices (with (c), ©, a year) are dropped.
        var normalized = LicenseTextNormalizer.Normalize("The above\ncopyright notice and this permission notice");

        Assert.Equal("the above copyright notice and this permission notice", normalized);
    }

    [Fact]
    public void DifferentWords_StayDifferent()
    {
        Assert.NotEqual(LicenseTextNormalizer.Normalize("with or without fee"), LicenseTextNormalizer.Normalize("with or without a fee"));
    }
}
