namespace Readiness.Core.Projects;

/// <summary>Every SDK-style project of a release candidate, and the files that could not be read as projects.</summary>
/// <param name="Projects">The projects read.</param>
/// <param name="Problems">Files that could not be read as projects.</param>
/// <param name="Decisions">Which projects the release packs and why (<see cref="PackageSelection"/>); null: every
/// project that is not a test project and not IsPackable=false.</param>
public sealed record ProjectModel(
    IReadOnlyList<ProjectInfo> Projects,
    IReadOnlyList<ProjectProblem> Problems,
    IReadOnlyList<ReleaseDecision>? Decisions = null)
{
    public IEnumerable<ProjectInfo> Packable => Projects.Where(IsReleased);

    public IEnumerable<ProjectInfo> Tests => Projects.Where(p => p.IsTestProject);

    /// <summary>Whether the release packs <paramref name="project"/>.</summary>
    public bool IsReleased(ProjectInfo project)
    {
        ArgumentNullException.ThrowIfNull(project);
        return Decisions is null
            ? project.IsPackable
            : Decisions.Any(d => d.Released && string.Equals(d.Path, project.Path, StringComparison.Ordinal));
    }

    public ProjectInfo? Find(string path) =>
        Projects.FirstOrDefault(p => string.Equals(p.Path, path, StringComparison.OrdinalIgnoreCase));
}
