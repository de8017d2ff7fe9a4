namespace Readiness.Core.Projects;

/// <summary>A project file (or an import) that could not be read: malformed XML, a DTD, too large.</summary>
public sealed record ProjectProblem(string Path, int? Line, string Message);
