using NuGet.Versioning;

using Readiness.Core.Dependencies;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Core.Versioning;

namespace Readiness.Core.Checks.Deps;

/// <summary>
/// A stable release depends on no pre-release version and on no floating or open-ended version: what its users
/// restore must be what was tested.
/// </summary>
public sealed class StableOnlyCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.DepsStableOnly,
        "A stable release depends only on stable, fixed versions",
        Severity.Block,
        Standards.NuGetDependencies,
        "A stable package that depends on a pre-release drags unfinished code into its users' applications (NuGet "
        + "warns NU5104 when packing it); a floating or lower-unbounded version makes each restore pick a different "
        + "dependency than the one the release was tested with (NU1604).",
        "Depend on a released version with an inclusive lower bound (e.g. Version=\"3.1.0\" or \"[3.1.0,4.0.0)\"), "
        + "or release this version as a pre-release too.");

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (context.Release.IsPrerelease)
        {
            yield return Finding.Skip($"{context.Release.Version} is a pre-release; it may depend on pre-releases.");
            yield break;
        }

        foreach (var project in context.Projects.Packable)
        {
            yield return Judge(project, context.Projects);
        }
    }

    /// <summary>Why a dependency version is not fit for a stable release, or null when it is.</summary>
    public static string? Problem(string? version)
    {
        if (string.IsNullOrWhiteSpace(version))
        {
            return "has no version";
        }

        if (!VersionRange.TryParse(version, allowFloating: true, out var range))
        {
            return $"has '{version}', which is not a NuGet version or range";
        }

        if (range.IsFloating)
        {
            return $"floats ('{version}')";
        }

        if (range.MinVersion is null)
        {
            return $"has no lower bound ('{version}')";
        }

        if (!range.IsMinInclusive)
        {
            return $"has an exclusive lower bound ('{version}')";
        }

        if (range.MinVersion.IsPrerelease || (range.MaxVersion?.IsPrerelease ?? false))
        {
            return $"is a pre-release ('{version}')";
        }

        return null;
    }

    private Finding Judge(ProjectInfo project, ProjectModel model)
    {
        var problems = new List<string>();
        var evidence = new List<Evidence>();
        var unevaluated = new List<string>();
        var count = 0;
        foreach (var reference in project.PackageReferences)
        {
            if (ReferenceAssets.From(reference.Metadata).IsOmitted)
            {
                continue; // private: not a dependency of the package
            }

            count++;
            var at = reference.VersionLocation ?? reference.Location;
            if (reference.Version?.Contains("$(", StringComparison.Ordinal) == true)
            {
                unevaluated.Add($"{reference.Id} ({at}): '{reference.Version}' could not be evaluated statically");
                continue;
            }

            if (Problem(reference.Version) is { } problem)
            {
                problems.Add($"{reference.Id} {problem} ({at})");
                evidence.Add(new Evidence(at.Path, at.Line));
            }
        }

        foreach (var reference in project.ProjectReferences)
        {
            if (ReferenceAssets.From(reference.Metadata).IsOmitted || model.Find(reference.Path) is not { } target)
            {
                continue;
            }

            count++;
            var declared = DeclaredVersion.Of(target);
            if (declared.Value is { } v && NuGetVersion.TryParse(v, out var parsed) && parsed.IsPrerelease)
            {
                problems.Add($"the project reference {target.PackageId} is versioned {v}, a pre-release ({declared.Location})");
                evidence.Add(new Evidence(reference.Location.Path, reference.Location.Line));
                if (declared.Location is { } l)
                {
                    evidence.Add(new Evidence(l.Path, l.Line));
                }
            }
        }

        if (problems.Count > 0)
        {
            return Finding.Fail(string.Join("; ", problems) + ".", Descriptor.Fix, project.PackageId, evidence.ToArray());
        }

        if (unevaluated.Count > 0)
        {
            return Finding.Skip(string.Join("; ", unevaluated) + ".", project.PackageId, new Evidence(project.Path));
        }

        return Finding.Pass(
            count == 0 ? "The package has no dependencies." : $"All {count} dependencies are stable with an inclusive lower bound.",
            project.PackageId,
            new Evidence(project.Path));
    }
}
