namespace Readiness.Core.Projects;

/// <summary>Every SDK-style project of a release candidate, and the files that could not be read as projects.</summary>
public sealed record ProjectModel(IReadOnlyList<ProjectInfo> Projects, IReadOnlyList<ProjectProblem> Problems)
{
    public IEnumerable<ProjectInfo> Packable => Projects.Where(p => p.IsPackable);

    public IEnumerable<ProjectInfo> Tests => Projects.Where(p => p.IsTestProject);

    public ProjectInfo? Find(string path) =>
        Projects.FirstOrDefault(p => string.Equals(p.Path, path, StringComparison.OrdinalIgnoreCase));
}
