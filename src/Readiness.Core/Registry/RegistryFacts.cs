namespace Readiness.Core.Registry;

/// <summary>What the registry phase learnt before checks ran.</summary>
/// <param name="Source">The feed asked.</param>
/// <param name="Packages">Answers by id (case-insensitive).</param>
/// <param name="Unavailable">Why the registry as a whole could not be asked (offline, unreachable), or null.</param>
public sealed record RegistryFacts(
    string Source,
    IReadOnlyDictionary<string, PackageLookup> Packages,
    string? Unavailable = null)
{
    public PackageLookup? Find(string id) => Packages.TryGetValue(id, out var lookup) ? lookup : null;

    public static RegistryFacts Offline(string why) =>
        new("(none)", new Dictionary<string, PackageLookup>(StringComparer.OrdinalIgnoreCase), why);
}
