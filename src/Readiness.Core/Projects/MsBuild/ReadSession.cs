using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>What one <see cref="StaticProjectReader.Read"/> shares between projects: parsed files and the file set.</summary>
internal sealed class ReadSession(IFileTree tree)
{
    private readonly Dictionary<string, ProjectProblem> importProblems = new(StringComparer.Ordinal);

    public FileSet Files { get; } = new(tree);

    public ProjectXmlCache Xml { get; } = new(tree);

    /// <summary>Conditions parsed once per read: the same few recur in every project.</summary>
    public Dictionary<string, ConditionParser.Node?> Conditions { get; } = new(StringComparer.Ordinal);

    public IEnumerable<ProjectProblem> ImportProblems => importProblems.Values;

    public void ReportImportProblem(ProjectProblem problem) => importProblems.TryAdd(problem.Kind == ProjectProblemKind.Unreadable ? problem.Path : problem.ToString(), problem);
}
