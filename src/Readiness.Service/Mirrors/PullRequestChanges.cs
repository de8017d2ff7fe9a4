using LibGit2Sharp;
using Readiness.Core.Snapshots;

namespace Readiness.Service.Mirrors;

/// <summary>What a pull request changes: the paths that differ between the merge base and the head commit.</summary>
/// <param name="BaseCommit">The base branch's tip.</param>
/// <param name="MergeBase">The best common ancestor of the base branch and the head commit.</param>
/// <param name="Paths">Changed paths (added, modified, deleted, both sides of a rename), sorted.</param>
public sealed record PullRequestChanges(string BaseCommit, string MergeBase, IReadOnlyList<string> Paths)
{
    /// <summary>Compares trees in the mirror; no checkout. Throws <see cref="RepositoryInspectionException"/> for missing objects.</summary>
    public static PullRequestChanges Compute(string mirrorPath, string baseBranch, string headSha)
    {
        ArgumentNullException.ThrowIfNull(baseBranch);
        using var repo = new Repository(mirrorPath);
        var baseCommit = repo.Lookup<Commit>("refs/heads/" + baseBranch)
            ?? throw new RepositoryInspectionException($"the base branch {baseBranch} is not in the mirror");
        var head = repo.Lookup<Commit>(headSha)
            ?? throw new RepositoryInspectionException($"the head commit {headSha} is not in the mirror");
        var mergeBase = repo.ObjectDatabase.FindMergeBase(baseCommit, head) ?? baseCommit;
        var changes = repo.Diff.Compare<TreeChanges>(mergeBase.Tree, head.Tree);
        var paths = changes.SelectMany(c => new[] { c.Path, c.OldPath })
            .Where(p => !string.IsNullOrEmpty(p))
            .Distinct(StringComparer.Ordinal)
            .Order(StringComparer.Ordinal)
            .ToArray();
        return new PullRequestChanges(baseCommit.Sha, mergeBase.Sha, paths);
    }
}
