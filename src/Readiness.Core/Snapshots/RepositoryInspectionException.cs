namespace Readiness.Core.Snapshots;

/// <summary>The repository could not be inspected (not a repository, revision not found, objects missing). Exit code 3.</summary>
public sealed class RepositoryInspectionException(string message, Exception? inner = null) : Exception(message, inner);
