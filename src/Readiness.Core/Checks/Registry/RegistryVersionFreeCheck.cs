using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Registry;

/// <summary>The id + version is not published yet: published versions are immutable, and a push of an existing one
/// is refused only after the tag and the release notes are out.</summary>
public sealed class RegistryVersionFreeCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.RegistryVersionFree,
        "The package version is not published yet",
        Severity.Block,
        Standards.NuGetPublish,
        "A published id + version never changes: the registry refuses a second push of it (HTTP 409), and consumers who "
        + "restored the first one would never see the second. Finding out at push time means a tag and release notes "
        + "that name a version that can never ship.",
        "Choose the next version (and move the changelog entry and the tag with it). NuGet compares versions after "
        + "normalising them, so 1.0 and 1.0.0 are the same version to the registry.")
    {
        Settings = ["registry-required"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (RegistrySubjects.Unavailable(context) is { } skip)
        {
            yield return skip;
            yield break;
        }

        var source = context.Registry!.Source;
        foreach (var project in context.Projects.Packable)
        {
            var id = project.PackageId;
            var (version, text, noVersion) = RegistrySubjects.CandidateVersion(context, project);
            if (noVersion is not null)
            {
                yield return noVersion;
                continue;
            }

            var (lookup, noAnswer) = RegistrySubjects.Lookup(context, id, id);
            if (lookup is null)
            {
                yield return noAnswer!;
                continue;
            }

            var evidence = new Evidence(project.Path);
            if (!lookup.Exists)
            {
                yield return Finding.Pass($"{id} {text} is free: {source} has no package {id} yet.", id, evidence);
                continue;
            }

            // NuGet compares normalised versions, case-insensitively, ignoring build metadata (package-versioning doc).
            var taken = RegistrySubjects.Parsed(lookup).FirstOrDefault(p => p.Version == version);
            if (taken.Entry is not null)
            {
                var normalised = version!.ToNormalizedString();
                var same = string.Equals(taken.Entry.Version, text, StringComparison.Ordinal) ? string.Empty : $" (as {taken.Entry.Version}; NuGet reads {text} as {normalised})";
                var unlisted = taken.Entry.Listed == false ? ", unlisted but still restorable" : string.Empty;
                var newest = RegistrySubjects.Parsed(lookup).Max(p => p.Version)!;
                yield return Finding.Fail(
                    $"{id} {text} is already published on {source}{same}{unlisted}.",
                    $"Published versions are immutable: release a version above {newest.ToNormalizedString()}, the newest on the registry, "
                    + "and move the changelog entry and the tag with it.",
                    id,
                    evidence);
            }
            else
            {
                yield return Finding.Pass($"{id} {text} is not published on {source} ({lookup.Versions.Count} other versions are).", id, evidence);
            }
        }
    }
}
