namespace Readiness.Core.Registry;

/// <summary>The registry's answer for one id.</summary>
/// <param name="Id">The id that was asked for.</param>
/// <param name="Exists">The registry knows the id.</param>
/// <param name="RegistryId">The id as the registry spells it, when it says.</param>
/// <param name="Versions">Published versions (listed and unlisted).</param>
/// <param name="Problem">Why the answer is unavailable (timeout, 500, malformed); then the other fields mean nothing.</param>
/// <param name="Owners">The registry accounts that own the id, when the feed says (its search service); null when unknown.</param>
public sealed record PackageLookup(
    string Id,
    bool Exists,
    string? RegistryId,
    IReadOnlyList<PublishedVersion> Versions,
    string? Problem = null,
    IReadOnlyList<string>? Owners = null)
{
    public bool Available => Problem is null;

    public static PackageLookup Unavailable(string id, string problem) => new(id, false, null, [], problem);
}
