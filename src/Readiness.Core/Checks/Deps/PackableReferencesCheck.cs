using Readiness.Core.Dependencies;
using Readiness.Core.Projects;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Deps;

/// <summary>
/// Every <c>ProjectReference</c> of a packable project becomes a package dependency when packed; it must point to a
/// project that is itself packed and published, or be private.
/// </summary>
public sealed class PackableReferencesCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.DepsPackableReferences,
        "Project references point to packable projects",
        Severity.Block,
        Standards.NuGetPack,
        "dotnet pack turns each ProjectReference into a dependency on a package of that project's id and version. "
        + "If that project is never packed, the dependency names a package nobody publishes and the install fails.",
        "Make the referenced project packable (remove IsPackable=false) and release it too, or add "
        + "PrivateAssets=\"all\" to the ProjectReference and ship its assembly inside this package.");

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var any = false;
        foreach (var project in context.Projects.Packable.Where(p => p.ProjectReferences.Count > 0))
        {
            any = true;
            yield return Judge(project, context.Projects);
        }

        if (!any)
        {
            yield return Finding.Skip("No packable project has a ProjectReference.");
        }
    }

    private Finding Judge(ProjectInfo project, ProjectModel model)
    {
        if (project.IsTool)
        {
            // A tool package holds the program's whole publish output and no dependency group: referenced projects
            // ship inside it whether they are packable or not (see the nuspec check in ToolPackageTests).
            var at = project.Property("PackAsTool")!.Location;
            return Finding.Pass(
                $"{project.PackageId} is a .NET tool (PackAsTool at {at}): its {project.ProjectReferences.Count} project reference(s) ship inside the package.",
                project.PackageId,
                new Evidence(at.Path, at.Line));
        }

        if (project.SuppressesDependencies)
        {
            // NuGet pack target inputs: SuppressDependenciesWhenPacking leaves the dependency group out entirely.
            var at = project.Property("SuppressDependenciesWhenPacking")!.Location;
            return Finding.Pass(
                $"{project.PackageId} sets SuppressDependenciesWhenPacking at {at}: its project references become no dependencies.",
                project.PackageId,
                new Evidence(at.Path, at.Line));
        }

        var problems = new List<string>();
        var evidence = new List<Evidence>();
        var fine = new List<string>();
        foreach (var reference in project.ProjectReferences)
        {
            var at = new Evidence(reference.Location.Path, reference.Location.Line);
            if (ReferenceAssets.From(reference.Metadata).IsOmitted)
            {
                fine.Add($"{reference.Path} (private)");
                continue;
            }

            if (string.Equals(ReferenceAssets.Find(reference.Metadata, "ReferenceOutputAssembly")?.Trim(), "false", StringComparison.OrdinalIgnoreCase))
            {
                // An analyzer or source generator referenced for the build only: NuGet pack writes no dependency
                // for a ProjectReference with ReferenceOutputAssembly=false (NuGet/Home#10312).
                fine.Add($"{reference.Path} (ReferenceOutputAssembly=false)");
                continue;
            }

            var target = model.Find(reference.Path);
            if (target is null)
            {
                problems.Add($"{reference.Path} ({reference.Location}) is not an SDK-style project at this commit");
                evidence.Add(at);
            }
            else if (!model.IsReleased(target))
            {
                evidence.Add(at);
                var decided = model.Decisions?.FirstOrDefault(d => d.Path == target.Path)?.Reason;
                var why = target.IsTestProject ? "a test project" : decided is null ? "not packable" : $"not released ({decided})";
                if (target.Property("IsPackable") is { } p && !target.IsTestProject)
                {
                    why = $"not packable (IsPackable={p.Value} at {p.Location})";
                    evidence.Add(new Evidence(p.Location.Path, p.Location.Line));
                }

                problems.Add($"{target.PackageId} ({reference.Location}) is {why}");
            }
            else
            {
                fine.Add(target.PackageId);
            }
        }

        return problems.Count > 0
            ? Finding.Fail(
                "The package would depend on packages nobody publishes: " + string.Join("; ", problems) + ".",
                Descriptor.Fix,
                project.PackageId,
                evidence.ToArray())
            : Finding.Pass(
                "Every project reference is packable or private: " + string.Join(", ", fine) + ".",
                project.PackageId,
                project.ProjectReferences.Select(r => new Evidence(r.Location.Path, r.Location.Line)).ToArray());
    }
}
