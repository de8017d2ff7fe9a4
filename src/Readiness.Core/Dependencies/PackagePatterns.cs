using System.Text.RegularExpressions;

namespace Readiness.Core.Dependencies;

/// <summary>
/// Package id patterns such as <c>Lanternfly.Host.*</c>: <c>*</c> matches any run of characters, <c>?</c> one
/// character; ids compare case-insensitively, as NuGet compares them.
/// </summary>
public sealed class PackagePatterns
{
    private readonly Regex[] regexes;

    public PackagePatterns(IEnumerable<string> patterns)
    {
        ArgumentNullException.ThrowIfNull(patterns);
        Patterns = patterns.Where(p => !string.IsNullOrWhiteSpace(p)).Select(p => p.Trim()).ToArray();
        regexes = Patterns
            .Select(p => new Regex(
                "^" + Regex.Escape(p).Replace(@"\*", ".*", StringComparison.Ordinal).Replace(@"\?", ".", StringComparison.Ordinal) + "$",
                RegexOptions.IgnoreCase | RegexOptions.CultureInvariant,
                TimeSpan.FromSeconds(1)))
            .ToArray();
    }

    public IReadOnlyList<string> Patterns { get; }

    public bool IsEmpty => Patterns.Count == 0;

    public bool Matches(string id)
    {
        ArgumentNullException.ThrowIfNull(id);
        return regexes.Any(r => r.IsMatch(id));
    }

    public override string ToString() => string.Join(", ", Patterns);
}
