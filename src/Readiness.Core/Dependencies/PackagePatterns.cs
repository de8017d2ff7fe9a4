using Readiness.Core.Configuration;

namespace Readiness.Core.Dependencies;

/// <summary>
/// Package id patterns such as <c>Lanternfly.Host.*</c> (<see cref="NameGlob"/>); ids compare case-insensitively,
/// as NuGet compares them.
/// </summary>
public sealed class PackagePatterns(IEnumerable<string> patterns)
{
    public IReadOnlyList<string> Patterns { get; } =
        patterns.Where(p => !string.IsNullOrWhiteSpace(p)).Select(p => p.Trim()).ToArray();

    public bool IsEmpty => Patterns.Count == 0;

    public bool Matches(string id)
    {
        ArgumentNullException.ThrowIfNull(id);
        return NameGlob.MatchesAny(Patterns, id, ignoreCase: true);
    }

    public override string ToString() => string.Join(", ", Patterns);
}
