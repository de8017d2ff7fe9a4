using System.Globalization;
using System.Text.RegularExpressions;

namespace Readiness.Rendering.Tests;

/// <summary>The report page's colours: every text colour readable on every background it is drawn on, in both schemes.</summary>
public sealed partial class HtmlPageStyleTests
{
    /// <summary>(text, background) pairs the style sheet draws: body text, quiet footer text and links on the page and on table bands.</summary>
    private static readonly (string Text, string Background)[] Pairs =
        [("ink", "paper"), ("ink", "band"), ("quiet", "paper"), ("quiet", "band"), ("link", "paper"), ("link", "band")];

    [Theory]
    [InlineData("light")]
    [InlineData("dark")]
    public void EveryTextColour_MeetsWcagAA_OnEveryBackground(string scheme)
    {
        var css = HtmlPageStyle.Css;
        var darkAt = css.IndexOf("@media (prefers-color-scheme: dark)", StringComparison.Ordinal);
        Assert.True(darkAt > 0);
        var light = Variables(css[..darkAt]);
        var colours = scheme == "light" ? light : new Dictionary<string, string>(light.Concat(Variables(css[darkAt..])).GroupBy(p => p.Key).Select(g => g.Last()));

        foreach (var (text, background) in Pairs)
        {
            var ratio = ContrastRatio(colours[text], colours[background]);
            // WCAG 2.2, success criterion 1.4.3 (Contrast, Minimum): at least 4.5:1 for normal text.
            Assert.True(ratio >= 4.5, $"{scheme}: --{text} {colours[text]} on --{background} {colours[background]} is {ratio:0.00}:1");
        }
    }

    [Fact]
    public void ContrastRatio_FollowsTheWcagDefinition()
    {
        // WCAG 2.2, "contrast ratio": black on white is 21:1, a colour on itself 1:1.
        Assert.Equal(21.0, ContrastRatio("#000000", "#ffffff"), 2);
        Assert.Equal(1.0, ContrastRatio("#777777", "#777777"), 6);
        // #767676 on white is the lightest grey that passes AA, about 4.54:1 (common practice, no published source).
        Assert.InRange(ContrastRatio("#767676", "#ffffff"), 4.5, 4.6);
    }

    private static Dictionary<string, string> Variables(string css) =>
        Variable().Matches(css).ToDictionary(m => m.Groups["name"].Value, m => m.Groups["hex"].Value);

    /// <summary>WCAG 2.2 definitions of "relative luminance" and "contrast ratio" (https://www.w3.org/TR/WCAG22/).</summary>
    private static double ContrastRatio(string a, string b)
    {
        var (la, lb) = (Luminance(a), Luminance(b));
        return (Math.Max(la, lb) + 0.05) / (Math.Min(la, lb) + 0.05);
    }

    private static double Luminance(string hex)
    {
        double Channel(int offset)
        {
            var c = int.Parse(hex.AsSpan(1 + offset, 2), NumberStyles.HexNumber, CultureInfo.InvariantCulture) / 255.0;
            return c <= 0.04045 ? c / 12.92 : Math.Pow((c + 0.055) / 1.055, 2.4);
        }

        return (0.2126 * Channel(0)) + (0.7152 * Channel(2)) + (0.0722 * Channel(4));
    }

    [GeneratedRegex("--(?<name>[a-z]+): (?<hex>#[0-9a-f]{6})")]
    private static partial Regex Variable();
}
