using NuGet.Versioning;

using Readiness.Core.Projects;
using Readiness.Core.Registry;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Registry;

/// <summary>Every dependency the package declares resolves on the registry consumers use: the exact version, or the
/// lower bound of a range, is published there (NuGet resolves the lowest applicable version).</summary>
public sealed class RegistryDependenciesPublishedCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.RegistryDependenciesPublished,
        "Every dependency is published",
        Severity.Block,
        Standards.NuGetDependencies,
        "A package that depends on an id or version the consumers' feed does not have cannot be restored (NU1101, "
        + "NU1102), or restores a different version than the one it was built and tested against (NU1603).",
        "Publish the dependency first, reference a version that is published, or mark a build-only reference "
        + "PrivateAssets=\"all\" so it stays out of the package.")
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

        foreach (var project in context.Projects.Packable)
        {
            foreach (var reference in RegistrySubjects.DeclaredDependencies(project))
            {
                yield return Judge(context, project, reference);
            }
        }
    }

    private Finding Judge(CheckContext context, ProjectInfo project, PackageReferenceItem reference)
    {
        var id = project.PackageId;
        var dependency = reference.Id;
        var evidence = RegistrySubjects.Where(reference);
        var (range, problem) = RegistrySubjects.Range(reference);
        if (range is null)
        {
            return Finding.Skip($"Dependency {dependency}: {problem}.", id, evidence);
        }

        var (lookup, noAnswer) = RegistrySubjects.Lookup(context, dependency, id);
        if (lookup is null)
        {
            return noAnswer! with { Evidence = [evidence] };
        }

        var source = context.Registry!.Source;
        var wanted = Describe(range);
        if (!lookup.Exists)
        {
            // NU1101 "Unable to find package" (NuGet restore error codes, from memory).
            return Finding.Fail($"Dependency {dependency} {wanted} is not on {source} at all: consumers' restore fails (NU1101).", Descriptor.Fix, id, evidence);
        }

        var published = RegistrySubjects.Parsed(lookup);
        var versions = published.Select(p => p.Version).ToArray();
        var best = range.FindBestMatch(versions);
        if (range is { HasLowerBound: true, IsMinInclusive: true, IsFloating: false })
        {
            var lower = range.MinVersion!;
            var exact = published.FirstOrDefault(p => p.Version == lower);
            if (exact.Entry is not null)
            {
                var unlisted = exact.Entry.Listed == false ? " (unlisted, still restorable by exact version)" : string.Empty;
                return Finding.Pass($"Dependency {dependency} {wanted}: {lower.ToNormalizedString()} is published on {source}{unlisted}.", id, evidence);
            }

            // NU1603 "approximate best match" and NU1102 "Unable to find package with version" (from memory).
            return best is null
                ? Finding.Fail($"Dependency {dependency} {wanted}: no published version on {source} satisfies it (NU1102).", Descriptor.Fix, id, evidence)
                : Finding.Fail(
                    $"Dependency {dependency} {wanted}: {lower.ToNormalizedString()} is not published on {source}; consumers would get "
                    + $"{best.ToNormalizedString()} instead (NU1603).",
                    Descriptor.Fix,
                    id,
                    evidence);
        }

        return best is null
            ? Finding.Fail($"Dependency {dependency} {wanted}: no published version on {source} satisfies it (NU1102).", Descriptor.Fix, id, evidence)
            : Finding.Pass($"Dependency {dependency} {wanted}: resolves to {best.ToNormalizedString()} on {source}.", id, evidence);
    }

    private static string Describe(VersionRange range) =>
        range.IsFloating || !range.HasLowerBound || !range.IsMinInclusive || range.HasUpperBound
            ? range.ToNormalizedString()
            : range.MinVersion!.ToNormalizedString();
}
