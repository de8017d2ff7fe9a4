namespace Readiness.Core.Snapshots;

/// <summary>Port: builds a <see cref="ReleaseSnapshot"/> from a repository. Implemented by the git adapter.</summary>
public interface ISnapshotSource
{
    /// <summary>Throws <see cref="RepositoryInspectionException"/> when the repository cannot be inspected.</summary>
    ReleaseSnapshot Open(SnapshotRequest request);
}
