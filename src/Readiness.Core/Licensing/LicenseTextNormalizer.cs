using System.Text;
using System.Text.RegularExpressions;

namespace Readiness.Core.Licensing;

/// <summary>
/// Normalises license text after the SPDX license matching guidelines
/// (https://spdx.github.io/spdx-spec/v2.3/license-matching-guidelines-and-templates/), so that two copies of a
/// license compare equal when they differ only in what the guidelines say to ignore.
/// </summary>
/// <remarks>
/// Applied, by guideline: whitespace collapsed (2.1.4); case ignored (2.1.3); copyright notices dropped (2.1.11:
/// lines starting with "Copyright (c)", "Copyright ©", "Copyright YEAR", "©" or "(c) YEAR", and "All rights
/// reserved" lines); bullets and list numbering at the start of a line dropped (2.1.6); <c>http://</c> equal to
/// <c>https://</c> (2.1.13); a few equivalent spellings from the guidelines' equivalent-words list (2.1.8, from memory:
/// licence/license, acknowledgement/acknowledgment, &amp;/and). Punctuation is then dropped altogether — every
/// character other than a letter or digit separates words — which makes quotes of any kind and dashes of any kind
/// equal (2.1.5) and is more lenient than the guidelines, which keep other punctuation: acceptable here because
/// texts are recognised by whole key passages, not judged character by character. Markdown markup goes with it.
/// </remarks>
public static partial class LicenseTextNormalizer
{
    [GeneratedRegex(@"^(?:copyright\s*(?:\(c\)|©|\[|<|\{|[0-9]{4})|©|\(c\)\s*[0-9]{4}|all rights reserved\.?\s*$)", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex CopyrightLine();

    [GeneratedRegex(@"^(?:[-*+•·]|[0-9]{1,2}\.|\(?[0-9a-z]{1,4}\)|[a-z]\.)\s+", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex ListMarker();

    [GeneratedRegex(@"^[\s#>*_`]+", RegexOptions.CultureInvariant)]
    private static partial Regex LeadingMarkup();

    private static readonly (string From, string To)[] EquivalentWords =
    [
        ("licence", "license"),
        ("licences", "licenses"),
        ("licenced", "licensed"),
        ("acknowledgement", "acknowledgment"),
        ("acknowledgements", "acknowledgments"),
        ("http", "https"),
    ];

    public static string Normalize(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var kept = new StringBuilder(text.Length);
        foreach (var rawLine in text.Split('\n'))
        {
            var line = LeadingMarkup().Replace(rawLine.Trim(), string.Empty);
            if (CopyrightLine().IsMatch(line))
            {
                continue;
            }

            line = ListMarker().Replace(line, string.Empty);
            kept.Append(line).Append(' ');
        }

        var words = new StringBuilder(kept.Length);
        foreach (var c in kept.ToString().Replace("&", " and ", StringComparison.Ordinal))
        {
            words.Append(char.IsLetterOrDigit(c) ? char.ToLowerInvariant(c) : ' ');
        }

        var tokens = words.ToString().Split(' ', StringSplitOptions.RemoveEmptyEntries);
        for (var i = 0; i < tokens.Length; i++)
        {
            foreach (var (from, to) in EquivalentWords)
            {
                if (tokens[i] == from)
                {
                    tokens[i] = to;
                    break;
                }
            }
        }

        return string.Join(' ', tokens);
    }
}
