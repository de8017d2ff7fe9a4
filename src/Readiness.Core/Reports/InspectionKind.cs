namespace Readiness.Core.Reports;

/// <summary>Whether files were read from a commit's object database or from the working tree.</summary>
public enum InspectionKind
{
    Commit,
    Worktree,
}
