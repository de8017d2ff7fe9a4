using LibGit2Sharp;

using Readiness.Core.Snapshots;

namespace Readiness.Git;

/// <summary>Reads tags as <see cref="TagInfo"/> records.</summary>
internal static class TagReader
{
    /// <summary>The tag's facts, or null when it does not (peeled) point at a commit.</summary>
    public static TagInfo? Read(Tag tag)
    {
        if (tag.PeeledTarget is not Commit commit)
        {
            return null;
        }

        if (!tag.IsAnnotated)
        {
            return new TagInfo(tag.FriendlyName, commit.Sha, false, null, null, null, null);
        }

        var annotation = tag.Annotation;
        var (message, signature) = SignatureBlock.SplitTagMessage(annotation.Message ?? string.Empty);
        var tagger = annotation.Tagger;
        return new TagInfo(
            tag.FriendlyName,
            commit.Sha,
            true,
            tagger?.When,
            tagger is null ? null : $"{tagger.Name} <{tagger.Email}>",
            message,
            signature);
    }

    /// <summary>
    /// Every tag whose commit is <paramref name="commit"/> or one of its ancestors, sorted by name.
    /// </summary>
    public static IReadOnlyList<TagInfo> ReachableTags(Repository repository, Commit commit)
    {
        var byCommit = new Dictionary<ObjectId, List<Tag>>();
        foreach (var tag in repository.Tags)
        {
            if (PeeledCommitId(tag) is { } id)
            {
                if (!byCommit.TryGetValue(id, out var list))
                {
                    byCommit[id] = list = [];
                }

                list.Add(tag);
            }
        }

        var reachable = new List<Tag>();
        if (byCommit.Count > 0)
        {
            // One walk inside libgit2: commits reachable from any tagged commit but not from the inspected one. A tagged
            // commit that the walk yields is not an ancestor; every other one is. Only those non-ancestors cross into
            // managed code, so a long linear history costs one native walk, not ten thousand commit objects.
            var filter = new CommitFilter
            {
                IncludeReachableFrom = byCommit.Keys.ToArray(),
                ExcludeReachableFrom = commit,
                SortBy = CommitSortStrategies.None,
            };
            var notAncestors = new HashSet<ObjectId>();
            foreach (var unreachable in repository.Commits.QueryBy(filter))
            {
                if (byCommit.ContainsKey(unreachable.Id))
                {
                    notAncestors.Add(unreachable.Id);
                }
            }

            reachable.AddRange(byCommit.Where(p => !notAncestors.Contains(p.Key)).SelectMany(p => p.Value));
        }

        return reachable
            .Select(Read)
            .OfType<TagInfo>()
            .OrderBy(t => t.Name, StringComparer.Ordinal)
            .ToArray();
    }

    private static ObjectId? PeeledCommitId(Tag tag)
    {
        try
        {
            return tag.PeeledTarget is Commit commit ? commit.Id : null;
        }
        catch (LibGit2SharpException)
        {
            // A tag whose target object is missing (e.g. pruned) names no commit that could be an ancestor.
            return null;
        }
    }
}
