using System.Text.RegularExpressions;
using NuGet.Versioning;

namespace Readiness.Core.Versioning;

/// <summary>Strict SemVer 2.0.0 validation with a reason, and NuGet's leniencies named.</summary>
public static partial class SemVerText
{
    // semver.org FAQ regex, with [0-9] instead of \d (\d matches Unicode digits in .NET).
    [GeneratedRegex(@"^(?<major>0|[1-9][0-9]*)\.(?<minor>0|[1-9][0-9]*)\.(?<patch>0|[1-9][0-9]*)(?:-(?<prerelease>(?:0|[1-9][0-9]*|[0-9]*[a-zA-Z-][0-9a-zA-Z-]*)(?:\.(?:0|[1-9][0-9]*|[0-9]*[a-zA-Z-][0-9a-zA-Z-]*))*))?(?:\+(?<buildmetadata>[0-9a-zA-Z-]+(?:\.[0-9a-zA-Z-]+)*))?$", RegexOptions.CultureInvariant)]
    public static partial Regex FaqRegex();

    [GeneratedRegex(@"^(0|[1-9][0-9]*)\.(0|[1-9][0-9]*)\.(0|[1-9][0-9]*)\.(0|[1-9][0-9]*)(-[0-9A-Za-z.-]+)?(\+[0-9A-Za-z.-]+)?$", RegexOptions.CultureInvariant)]
    private static partial Regex FourPartRegex();

    /// <summary>Null when <paramref name="text"/> is valid; otherwise why not.</summary>
    public static string? Problem(string text, bool allowFourParts = false)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (text.Length == 0)
        {
            return "it is empty";
        }

        if (text.Length > 64)
        {
            return "it is longer than the 64 characters nuget.org accepts";
        }

        if (FaqRegex().IsMatch(text))
        {
            return null;
        }

        if (allowFourParts && FourPartRegex().IsMatch(text) && SemanticVersionValid(text))
        {
            return null;
        }

        if (text.StartsWith('v') || text.StartsWith('V'))
        {
            return "it starts with a 'v' prefix, which belongs in the tag, not the version";
        }

        var core = text.Split('+', 2)[0].Split('-', 2)[0];
        var parts = core.Split('.');
        if (parts.Length < 3)
        {
            return $"it has {parts.Length} numeric part{(parts.Length == 1 ? string.Empty : "s")}; SemVer needs MAJOR.MINOR.PATCH";
        }

        if (parts.Length == 4)
        {
            return "it has a fourth numeric part, which SemVer does not allow (NuGet does; the checklist may allow it)";
        }

        if (parts.Length > 4)
        {
            return "it has more than four numeric parts";
        }

        if (parts.Any(p => p.Length == 0 || !p.All(char.IsAsciiDigit)))
        {
            return "MAJOR, MINOR and PATCH must be non-negative integers";
        }

        if (parts.Any(p => p.Length > 1 && p[0] == '0'))
        {
            return "a numeric part has a leading zero";
        }

        if (text.EndsWith('-') || text.EndsWith('+') || text.Contains("..", StringComparison.Ordinal))
        {
            return "a pre-release or build identifier is empty";
        }

        return "the pre-release or build metadata has a leading zero in a numeric identifier or a character outside [0-9A-Za-z-]";
    }

    private static bool SemanticVersionValid(string text) => NuGetVersion.TryParse(text, out _);
}
