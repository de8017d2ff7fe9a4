namespace Readiness.Core.Snapshots;

/// <summary>What to inspect.</summary>
/// <param name="Path">The repository root, any folder inside it, or (for bare mirrors) the git directory.</param>
/// <param name="Ref">Commit, branch or tag; <c>HEAD</c> by default.</param>
/// <param name="Tag">The release tag, when the caller names it.</param>
/// <param name="Worktree">Read the working tree instead of the commit.</param>
public sealed record SnapshotRequest(string Path, string Ref = "HEAD", string? Tag = null, bool Worktree = false);
