using Readiness.Core.Dependencies;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Core.Versioning;

namespace Readiness.Core.Checks.Deps;

/// <summary>
/// With <c>host-marker: id-suffix</c> (or <c>version-suffix</c>), the host major version a plugin's host references
/// resolve to equals the number its package id (or its version's suffix) carries.
/// </summary>
public sealed class HostVersionMarkedCheck : ICheck
{
    public const string IdSuffix = "id-suffix";
    public const string VersionSuffix = "version-suffix";

    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.DepsHostVersionMarked,
        "The package marks the host major version it supports",
        Severity.Warn,
        Standards.NuGetDependencies,
        "Users pick a plugin by the host version they run. When the number in the package id (or version) and the "
        + "host version the plugin was built against disagree, they install a plugin that fails inside their host.",
        "Make the host reference resolve to the major version the package id (or version suffix) carries, or rename "
        + "the package for the host major it now targets.")
    {
        Settings = ["host-packages", "host-marker"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var marker = context.Parameters.String("host-marker");
        if (string.IsNullOrWhiteSpace(marker))
        {
            yield return Finding.Skip("No host-marker is configured (id-suffix or version-suffix in .readiness.yml).");
            yield break;
        }

        if (marker is not (IdSuffix or VersionSuffix))
        {
            var mark = context.Parameters.Node("host-marker")!.Mark;
            yield return Finding.Error($"host-marker is '{marker}' at {mark}; it must be {IdSuffix} or {VersionSuffix}.",
                null, new Evidence(mark.File, mark.Line));
            yield break;
        }

        var hosts = new PackagePatterns(context.Parameters.Strings("host-packages"));
        if (hosts.IsEmpty)
        {
            yield return Finding.Skip("No host packages are configured (host-packages), so no host version can be compared.");
            yield break;
        }

        var any = false;
        foreach (var project in context.Projects.Packable)
        {
            var references = project.PackageReferences.Where(r => hosts.Matches(r.Id)).ToArray();
            if (references.Length == 0)
            {
                continue;
            }

            any = true;
            yield return Judge(project, references, marker, context);
        }

        if (!any)
        {
            yield return Finding.Skip($"No packable project references a host package ({hosts}).");
        }
    }

    private Finding Judge(ProjectInfo project, PackageReferenceItem[] references, string marker, CheckContext context)
    {
        var evidence = references.Select(r => r.VersionLocation ?? r.Location).Distinct()
            .Select(l => new Evidence(l.Path, l.Line)).ToList();
        int? marked;
        string markedBy;
        if (marker == IdSuffix)
        {
            marked = HostMajor.FromIdSuffix(project.PackageId);
            markedBy = $"the package id {project.PackageId}";
        }
        else
        {
            var declared = DeclaredVersion.Of(project);
            var version = declared.Value ?? context.Release.Version;
            if (declared.Location is { } at)
            {
                evidence.Insert(0, new Evidence(at.Path, at.Line));
            }

            marked = version is null ? null : HostMajor.FromVersionSuffix(version);
            markedBy = $"the version {version ?? "(none declared)"}";
        }

        if (marked is null)
        {
            return Finding.Fail(
                $"{markedBy} carries no host major version ({marker}).",
                marker == IdSuffix
                    ? "End the package id with the host major it supports (e.g. Bramble.Sketches.Lanternfly3), or change host-marker."
                    : "End the version's pre-release label or build metadata with the host major (e.g. 2.4.0+lanternfly3), or change host-marker.",
                project.PackageId,
                evidence.ToArray());
        }

        var resolved = references.Select(r => (Reference: r, Result: HostMajor.Resolve(r.Version))).ToArray();
        var unknown = resolved.Where(x => x.Result.Major is null).ToArray();
        if (unknown.Length > 0)
        {
            return Finding.Skip(
                "The host version could not be settled: " + string.Join("; ", unknown.Select(x =>
                    $"{x.Reference.Id} ({x.Reference.VersionLocation ?? x.Reference.Location}): {x.Result.Problem}")) + ".",
                project.PackageId,
                evidence.ToArray());
        }

        var wrong = resolved.Where(x => x.Result.Major != marked).ToArray();
        var described = string.Join(", ", resolved.Select(x =>
            $"{x.Reference.Id} {x.Reference.Version} ({x.Reference.VersionLocation ?? x.Reference.Location})"));
        if (wrong.Length > 0)
        {
            return Finding.Fail(
                $"{markedBy} marks host major {marked}, but {string.Join(", ", wrong.Select(x => $"{x.Reference.Id} resolves to major {x.Result.Major} ({x.Reference.Version})"))}.",
                $"Reference host major {marked} (e.g. in {wrong[0].Reference.VersionLocation ?? wrong[0].Reference.Location}), "
                + "or publish the plugin under an id (or version) that marks the host major it is built against.",
                project.PackageId,
                evidence.ToArray());
        }

        return Finding.Pass($"{markedBy} marks host major {marked}, and the host references resolve to it: {described}.",
            project.PackageId, evidence.ToArray());
    }
}
