using System.Text.RegularExpressions;

namespace Readiness.Core.Configuration;

/// <summary>
/// Shell-style name patterns used in configuration (<c>release/*</c>, <c>Lanternfly.Host.*</c>): <c>*</c> matches any
/// run of characters, <c>?</c> one character. Case-insensitive when asked (package ids are, branch names are not).
/// </summary>
public static class NameGlob
{
    public static bool Matches(string glob, string name, bool ignoreCase = false)
    {
        ArgumentNullException.ThrowIfNull(glob);
        ArgumentNullException.ThrowIfNull(name);
        var pattern = "^" + Regex.Escape(glob).Replace("\\*", ".*", StringComparison.Ordinal).Replace("\\?", ".", StringComparison.Ordinal) + "$";
        var options = RegexOptions.CultureInvariant | (ignoreCase ? RegexOptions.IgnoreCase : RegexOptions.None);
        return Regex.IsMatch(name, pattern, options, TimeSpan.FromMilliseconds(100));
    }

    public static bool MatchesAny(IEnumerable<string> globs, string name, bool ignoreCase = false) =>
        globs.Any(g => Matches(g, name, ignoreCase));
}
