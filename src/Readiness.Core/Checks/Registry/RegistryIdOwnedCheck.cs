using NuGet.Versioning;

using Readiness.Core.Projects;
using Readiness.Core.Registry;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Registry;

/// <summary>The package id is new on the registry, or what is published under it is this repository's own work:
/// every published version has a release tag here, or the configuration settles it (<c>known-ids</c>, <c>owners</c>).</summary>
public sealed class RegistryIdOwnedCheck : ICheck
{
    private const int Listed = 5;

    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.RegistryIdOwned,
        "The package id is new or already ours",
        Severity.Block,
        Standards.NuGetPrefix,
        "Package ids are unique per registry and case-insensitive. If someone else published the id first, the push is "
        + "refused — or, worse, a version ships under a name consumers already trust for something else.",
        "If the id is yours, list it under known-ids (or your registry account under owners) in .readiness.yml; "
        + "otherwise choose an id nobody has published.")
    {
        Settings = ["known-ids", "owners", "registry-required"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (RegistrySubjects.Unavailable(context) is { } skip)
        {
            yield return skip;
            yield break;
        }

        var knownIds = context.Parameters.Strings("known-ids");
        var owners = context.Parameters.Strings("owners");
        foreach (var project in context.Projects.Packable)
        {
            var id = project.PackageId;
            var (lookup, noAnswer) = RegistrySubjects.Lookup(context, id, id);
            yield return lookup is null ? noAnswer! : Judge(context, project, lookup, knownIds, owners);
        }
    }

    private Finding Judge(CheckContext context, ProjectInfo project, PackageLookup lookup, IReadOnlyList<string> knownIds, IReadOnlyList<string> owners)
    {
        var id = project.PackageId;
        var source = context.Registry!.Source;
        var evidence = new Evidence(project.Path);
        if (!lookup.Exists)
        {
            return Finding.Pass($"{id} is a new id on {source}.", id, evidence);
        }

        // Ids are case-insensitive (nuspec doc); the registry keeps the spelling of the first push.
        var spelled = lookup.RegistryId ?? id;
        var spelling = string.Equals(spelled, id, StringComparison.Ordinal)
            ? string.Empty
            : $" The registry spells the id '{spelled}', and keeps that spelling: the package will be listed as {spelled}, not {id}.";

        var tagged = TaggedVersions(context, id);
        var published = RegistrySubjects.Parsed(lookup).Select(p => p.Version).ToArray();
        var untagged = published.Where(v => !tagged.Contains(v)).OrderByDescending(v => v).ToArray();
        if (untagged.Length == 0)
        {
            return Finding.Pass($"{spelled} is on {source}, and each of its {published.Length} published versions has a release tag here.{spelling}", id, evidence);
        }

        if (knownIds.FirstOrDefault(k => Glob(k, id)) is { } known)
        {
            return Finding.Pass($"{spelled} is on {source} and is declared ours by known-ids ('{known}').{spelling}", id, evidence);
        }

        var registryOwners = lookup.Owners ?? [];
        if (owners.Intersect(registryOwners, StringComparer.OrdinalIgnoreCase).FirstOrDefault() is { } owner)
        {
            return Finding.Pass($"{spelled} is on {source}, owned by {owner} (listed under owners).{spelling}", id, evidence);
        }

        var shown = string.Join(", ", untagged.Take(Listed).Select(v => v.ToNormalizedString())) + (untagged.Length > Listed ? ", …" : string.Empty);
        var ownersNote = owners.Count == 0 ? string.Empty
            : lookup.Owners is null ? " The registry does not say who owns the id, so owners cannot settle it."
            : $" The registry names its owners as {(registryOwners.Count == 0 ? "nobody" : string.Join(", ", registryOwners))}, none of them under owners.";
        return Finding.Fail(
            $"{spelled} is already on {source}, and {untagged.Length} of its {published.Length} published versions ({shown}) have no "
            + $"release tag ({context.Release.TagPattern.Pattern}) here: the id may belong to someone else.{ownersNote}{spelling}",
            Descriptor.Fix,
            id,
            evidence);
    }

    /// <summary>Versions of this repository's release tags for <paramref name="id"/> (per-package tags must name it).</summary>
    private static HashSet<NuGetVersion> TaggedVersions(CheckContext context, string id)
    {
        var versions = new HashSet<NuGetVersion>();
        foreach (var tag in context.Snapshot.Tags)
        {
            if (context.Release.TagPattern.Match(tag.Name) is { } match
                && (match.Id is null || string.Equals(match.Id, id, StringComparison.OrdinalIgnoreCase))
                && NuGetVersion.TryParse(match.Version, out var version))
            {
                versions.Add(version);
            }
        }

        return versions;
    }

    /// <summary>Case-insensitive match where <c>*</c> stands for any run of characters.</summary>
    private static bool Glob(string pattern, string id)
    {
        var parts = pattern.Split('*');
        if (parts.Length == 1)
        {
            return string.Equals(pattern, id, StringComparison.OrdinalIgnoreCase);
        }

        if (!id.StartsWith(parts[0], StringComparison.OrdinalIgnoreCase) || !id.EndsWith(parts[^1], StringComparison.OrdinalIgnoreCase)
            || id.Length < parts[0].Length + parts[^1].Length)
        {
            return false;
        }

        var at = parts[0].Length;
        var end = id.Length - parts[^1].Length;
        foreach (var middle in parts[1..^1])
        {
            var found = id.IndexOf(middle, at, end - at, StringComparison.OrdinalIgnoreCase);
            if (found < 0)
            {
                return false;
            }

            at = found + middle.Length;
        }

        return true;
    }
}
