namespace Readiness.Core.Projects;

/// <summary>How much a <see cref="ProjectProblem"/> matters to a release.</summary>
public enum ProjectProblemKind
{
    /// <summary>
    /// A project file or an import of the repository that could not be read or evaluated (too large, not UTF-8 or
    /// UTF-16, a DTD, malformed XML, a symbolic link): every fact it holds is unknown, so it is an error of the release.
    /// </summary>
    Unreadable,

    /// <summary>A file read but not understood as an SDK-style project: named in the report's notes.</summary>
    NotUnderstood,

    /// <summary>An import the reader does not follow (outside the repository, missing): named in the report's notes.</summary>
    Skipped,
}
