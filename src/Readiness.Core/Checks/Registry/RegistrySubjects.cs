using NuGet.Versioning;

using Readiness.Core.Projects;
using Readiness.Core.Registry;
using Readiness.Core.Reports;
using Readiness.Core.Versioning;

namespace Readiness.Core.Checks.Registry;

/// <summary>What the registry checks share: the registry's answer for an id, the version each packable project
/// releases, and the dependencies a package will declare.</summary>
internal static class RegistrySubjects
{
    /// <summary>The parameter by which a checklist (or <c>.readiness.yml</c>) makes a missing answer a failure.</summary>
    public const string RequiredParameter = "registry-required";

    private const string RequiredHint =
        "Run the check again when the registry answers (or without --offline). This checklist sets registry-required: "
        + "a release is not judged ready without the registry's answer; waive the check with a reason if you must go on.";

    /// <summary>
    /// When no registry facts are there (offline, unreachable): a skip for the whole check, or a failure when the
    /// checklist sets <c>registry-required: true</c>; else null.
    /// </summary>
    public static Finding? Unavailable(CheckContext context)
    {
        if (context.Registry is null)
        {
            return Missing(context, "No registry was asked (offline); this check needs one.", null);
        }

        return context.Registry.Unavailable is { } why
            ? Missing(context, $"The registry could not be asked ({why}).", null)
            : null;
    }

    /// <summary>The registry's usable answer for <paramref name="id"/>, or the skip that explains why there is none.</summary>
    public static (PackageLookup? Lookup, Finding? Skip) Lookup(CheckContext context, string id, string? package)
    {
        var facts = context.Registry!;
        var lookup = facts.Find(id);
        if (lookup is null)
        {
            return (null, Finding.Skip($"{id} was not looked up on {facts.Source}.", package));
        }

        return lookup.Available
            ? (lookup, null)
            : (null, Missing(context, $"{id}: no answer from the registry ({lookup.Problem}).", package));
    }

    private static Finding Missing(CheckContext context, string message, string? package) =>
        context.Parameters.Bool(RequiredParameter)
            ? Finding.Fail(message + " The checklist requires the registry's answer (registry-required).", RequiredHint, package)
            : Finding.Skip(message, package);

    /// <summary>
    /// The version <paramref name="project"/> releases: <c>--version</c>, else the release tag's (with per-package
    /// tags only for the project the tag names), else the version the project declares. Null with a reason when
    /// there is none to judge.
    /// </summary>
    public static (NuGetVersion? Version, string? Text, Finding? Skip) CandidateVersion(CheckContext context, ProjectInfo project)
    {
        var release = context.Release;
        var evidence = new Evidence(project.Path);
        string? text;
        if (release.VersionSource == ReleaseFacts.VersionOptionSource)
        {
            text = release.Version;
        }
        else if (release.Tag is { } tag && release.TagVersion is not null)
        {
            var match = release.TagPattern.Match(tag.Name);
            if (match?.Id is { } tagId && !string.Equals(tagId, project.PackageId, StringComparison.OrdinalIgnoreCase))
            {
                return (null, null, Finding.Skip($"The release tag {tag.Name} releases {tagId}, not this package.", project.PackageId, evidence));
            }

            text = release.TagVersion;
        }
        else
        {
            var declared = DeclaredVersion.Of(project);
            if (VersionSourceDetector.ExternalSource(project, context.Snapshot.Files, declared) is { } external)
            {
                // Never the SDK default or a placeholder: the registry is asked about the version the release will have.
                return (null, null, Finding.Skip(
                    $"The release's version is not known before it is tagged ({external}); pass --version or --tag.", project.PackageId, evidence));
            }

            if (declared.Unevaluated is { } why)
            {
                return (null, null, Finding.Skip($"{declared.Property} could not be evaluated statically: {why}.", project.PackageId, evidence));
            }

            text = declared.Value ?? "1.0.0";
        }

        return NuGetVersion.TryParse(text, out var version)
            ? (version, text, null)
            : (null, text, Finding.Skip($"'{text}' is not a version NuGet can read (version.well-formed reports it).", project.PackageId, evidence));
    }

    /// <summary>Published versions NuGet can read, with their registry entries.</summary>
    public static IReadOnlyList<(NuGetVersion Version, PublishedVersion Entry)> Parsed(PackageLookup lookup) =>
        lookup.Versions
            .Select(p => (Ok: NuGetVersion.TryParse(p.Version, out var v), Version: v, Entry: p))
            .Where(x => x.Ok)
            .Select(x => (x.Version!, x.Entry))
            .ToArray();

    /// <summary>
    /// The package references that go into the package as dependencies: not <c>PrivateAssets="all"</c> and not
    /// <c>IncludeAssets="none"</c> (those are left out of the nuspec: NuGet pack, standards.md §5); one per id and
    /// version.
    /// </summary>
    public static IEnumerable<PackageReferenceItem> DeclaredDependencies(ProjectInfo project) =>
        project.SuppressesDependencies
            ? []
            : project.PackageReferences
            .Where(r => !IsAll(r.Meta("PrivateAssets")) && !IsNone(r.Meta("IncludeAssets")))
            .DistinctBy(r => (r.Id.ToUpperInvariant(), r.Version));

    /// <summary>The version a consumer's restore starts from: the exact version, or the range's lower bound.</summary>
    public static (VersionRange? Range, string? Problem) Range(PackageReferenceItem reference)
    {
        if (string.IsNullOrWhiteSpace(reference.Version))
        {
            return (null, "no version is declared for it");
        }

        if (reference.Version.Contains("$(", StringComparison.Ordinal))
        {
            return (null, $"its version '{reference.Version}' could not be evaluated statically");
        }

        return VersionRange.TryParse(reference.Version, allowFloating: true, out var range)
            ? (range, null)
            : (null, $"'{reference.Version}' is not a NuGet version or range");
    }

    public static Evidence Where(PackageReferenceItem reference)
    {
        var at = reference.VersionLocation ?? reference.Location;
        return new Evidence(at.Path, at.Line);
    }

    private static bool IsAll(string? assets) =>
        assets is not null && assets.Split(';', StringSplitOptions.TrimEntries).Any(a => a.Equals("all", StringComparison.OrdinalIgnoreCase));

    private static bool IsNone(string? assets) =>
        assets is not null && assets.Trim().Equals("none", StringComparison.OrdinalIgnoreCase);
}
