namespace Readiness.Core.Projects;

/// <summary>A project file (or an import) that could not be read: malformed XML, a DTD, too large, a symbolic link.</summary>
public sealed record ProjectProblem(string Path, int? Line, string Message, ProjectProblemKind Kind = ProjectProblemKind.Unreadable)
{
    public override string ToString() => Line is { } line ? $"{Path}:{line}: {Message}" : $"{Path}: {Message}";
}
