using Readiness.Core.Configuration;

namespace Readiness.Core.Projects;

/// <summary>
/// Decides which projects the release packs, from evidence in this order: the <c>packages</c> list in
/// <c>.readiness.yml</c>; IsPackable / PackAsTool set in the project; the pack commands of CI and build scripts;
/// then conventions (test, sample, benchmark and build folders, executables without PackAsTool are not packages).
/// </summary>
public static class PackageSelection
{
    public const string PackagesKey = "packages";

    /// <summary>Folder names that hold no released package by convention (common practice, no published source).</summary>
    public static readonly IReadOnlyList<string> NonPackageFolders =
    [
        "test", "tests", "testing", "sample", "samples", "example", "examples", "demo", "demos", "benchmark",
        "benchmarks", "bench", "perf", "build", "eng", "docs", "doc", "playground", "sandbox",
    ];

    /// <summary>The model with each project's decision; <see cref="ProjectModel.Packable"/> then follows it.</summary>
    public static ProjectModel Apply(ProjectModel model, PackCommands packs, RepositoryConfig config)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(packs);
        ArgumentNullException.ThrowIfNull(config);
        var listed = config.GetList(PackagesKey);
        // A pack command that names a build-only project (a traversal project: no target framework) packs what it
        // references, so it restricts nothing.
        var throughTraversal = model.Projects.Any(p => p.TargetFrameworks.Count == 0 && packs.Naming(p) is not null);
        var restricted = packs.Named.Count > 0 && packs.PacksAll.Count == 0 && !throughTraversal;
        var decisions = model.Projects.Select(p => Decide(p, listed, packs, restricted)).ToList();
        return model with { Decisions = decisions };
    }

    /// <summary>The report's lines: each released project with its reason, the others grouped by reason.</summary>
    public static IEnumerable<string> Describe(ProjectModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (model.Decisions is null || model.Decisions.Count == 0)
        {
            yield break;
        }

        var released = model.Decisions.Where(d => d.Released).ToList();
        yield return released.Count == 0
            ? "Packages: none of the projects is released as a package."
            : $"Packages: {string.Join("; ", released.Take(20).Select(d => $"{d.Path} ({d.Reason})"))}{(released.Count > 20 ? $" and {released.Count - 20} more" : string.Empty)}.";
        var others = model.Decisions.Where(d => !d.Released).ToList();
        if (others.Count > 0)
        {
            yield return $"Not packages: {string.Join("; ", others.Take(20).Select(d => $"{d.Path} ({d.Reason})"))}{(others.Count > 20 ? $" and {others.Count - 20} more" : string.Empty)}.";
        }
    }

    private static ReleaseDecision Decide(ProjectInfo project, IReadOnlyList<string> listed, PackCommands packs, bool restricted)
    {
        if (listed.Count > 0)
        {
            var hit = listed.FirstOrDefault(g => NameGlob.Matches(g, project.Path, ignoreCase: true)
                || NameGlob.Matches(g, project.PackageId, ignoreCase: true) || NameGlob.Matches(g, project.Name, ignoreCase: true));
            return new ReleaseDecision(project.Path, hit is not null, hit is not null
                ? $"listed in {PackagesKey}: in {RepositoryConfig.FileName} ({hit})"
                : $"not listed in {PackagesKey}: in {RepositoryConfig.FileName}");
        }

        if (project.IsTestProject)
        {
            return new ReleaseDecision(project.Path, false, "a test project (IsTestProject or Microsoft.NET.Test.Sdk)");
        }

        if (project.Property("IsPackable") is { } packable)
        {
            var packableAt = packable.Location;
            var yes = string.Equals(packable.Value, "true", StringComparison.OrdinalIgnoreCase);
            return new ReleaseDecision(project.Path, yes, $"IsPackable={packable.Value} at {packableAt}");
        }

        if (project.IsTool)
        {
            return new ReleaseDecision(project.Path, true, $"PackAsTool=true at {project.Property("PackAsTool")!.Location}");
        }

        if (project.TargetFrameworks.Count == 0)
        {
            return new ReleaseDecision(project.Path, false, "a build-only project (no target framework)");
        }

        var named = packs.Naming(project);
        if (named is not null)
        {
            return new ReleaseDecision(project.Path, true, $"packed by the command at {named}");
        }

        if (restricted)
        {
            return new ReleaseDecision(project.Path, false, $"not named by the pack commands ({string.Join(", ", packs.Named.Select(n => n.Location).Distinct().Take(3))})");
        }

        var folder = project.Folder.Split('/').FirstOrDefault(s => NonPackageFolders.Contains(s, StringComparer.OrdinalIgnoreCase));
        if (folder is not null)
        {
            return new ReleaseDecision(project.Path, false, $"in a '{folder}' folder (convention; set IsPackable=true to release it)");
        }

        if (project.Value("OutputType") is { } output
            && (output.Equals("Exe", StringComparison.OrdinalIgnoreCase) || output.Equals("WinExe", StringComparison.OrdinalIgnoreCase)))
        {
            return new ReleaseDecision(project.Path, false, $"an executable (OutputType={output}) without PackAsTool");
        }

        return new ReleaseDecision(project.Path, true, "packable by default (IsPackable is not set)");
    }
}
