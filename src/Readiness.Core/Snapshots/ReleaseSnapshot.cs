using Readiness.Core.Reports;

namespace Readiness.Core.Snapshots;

/// <summary>
/// Everything known about a release candidate before any check runs: built once, read by every check.
/// </summary>
/// <param name="Repository">Where the repository lives (a path or a clone URL), for reports.</param>
/// <param name="Commit">The inspected commit (40 hex digits); for a worktree inspection, HEAD.</param>
/// <param name="Ref">The revision as the user named it.</param>
/// <param name="Inspected">Commit or working tree.</param>
/// <param name="Files">The files of the candidate.</param>
/// <param name="Tag">The release tag, when there is one.</param>
/// <param name="CommitDate">The committer date of the inspected commit.</param>
/// <param name="CommitSignature">The inspected commit's signature block, if signed.</param>
/// <param name="Tags">Every tag whose target commit is the inspected commit or one of its ancestors (release tag included).</param>
/// <param name="Signatures">Verifies signatures with git, when the source can (null for a working tree).</param>
public sealed record ReleaseSnapshot(
    string Repository,
    string Commit,
    string Ref,
    InspectionKind Inspected,
    IFileTree Files,
    TagInfo? Tag,
    DateTimeOffset CommitDate,
    SignatureBlock? CommitSignature,
    IReadOnlyList<TagInfo> Tags,
    ISignatureVerifier? Signatures = null) : IDisposable
{
    /// <summary>What the source could not read and left out (a broken tag, a symlink, a submodule), one line each.</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];

    /// <summary>Releases the repository handle behind <see cref="Files"/>, if it holds one.</summary>
    public void Dispose() => (Files as IDisposable)?.Dispose();
}
