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
    /// Every tag whose commit is <paramref name="commit"/> or one of its ancestors, sorted by name. A tag that cannot
    /// be read (its object or its commit missing, a damaged annotation) is left out with a line in
    /// <paramref name="notes"/> naming it: one broken tag never stops an inspection.
    /// </summary>
    public static IReadOnlyList<TagInfo> ReachableTags(Repository repository, Commit commit, ICollection<string> notes)
    {
        var byCommit = new Dictionary<ObjectId, List<Tag>>();
        foreach (var tag in AllTags(repository, notes))
        {
            if (PeeledCommitId(repository, tag, notes) is { } id)
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
            try
            {
                foreach (var unreachable in repository.Commits.QueryBy(filter))
                {
                    if (byCommit.ContainsKey(unreachable.Id))
                    {
                        notAncestors.Add(unreachable.Id);
                    }
                }
            }
            catch (LibGit2SharpException)
            {
                // Some tagged history is damaged (a parent missing): decide tag by tag instead, leaving out the broken.
                notAncestors = [.. byCommit.Keys.Where(id => !IsAncestor(repository, id, commit, byCommit[id], notes))];
            }

            reachable.AddRange(byCommit.Where(p => !notAncestors.Contains(p.Key)).SelectMany(p => p.Value));
        }

        var infos = new List<TagInfo>(reachable.Count);
        foreach (var tag in reachable)
        {
            try
            {
                if (Read(tag) is { } info)
                {
                    infos.Add(info);
                }
            }
            catch (LibGit2SharpException e)
            {
                notes.Add(BrokenTag(tag.CanonicalName, e));
            }
        }

        return [.. infos.OrderBy(t => t.Name, StringComparer.Ordinal)];
    }

    internal static string BrokenTag(string name, Exception e) =>
        $"Tag {name} could not be read and is left out: {GitSnapshotSource.OneLine(e.Message)}";

    /// <summary>Every tag reference; one whose reference cannot be read is a note, the others are still listed.</summary>
    private static List<Tag> AllTags(Repository repository, ICollection<string> notes)
    {
        var tags = new List<Tag>();
        try
        {
            foreach (var tag in repository.Tags)
            {
                tags.Add(tag);
            }
        }
        catch (LibGit2SharpException e)
        {
            notes.Add($"The repository's tags could not all be listed ({GitSnapshotSource.OneLine(e.Message)}); {tags.Count} were read.");
        }

        return tags;
    }

    private static ObjectId? PeeledCommitId(Repository repository, Tag tag, ICollection<string> notes)
    {
        try
        {
            // The annotation names its target's type, so a Commit can be returned for an object that is absent.
            if (tag.PeeledTarget is not Commit commit)
            {
                return null;
            }

            if (!repository.ObjectDatabase.Contains(commit.Id))
            {
                notes.Add($"Tag {tag.CanonicalName} points at commit {commit.Sha}, which is not in the repository; the tag is left out.");
                return null;
            }

            return commit.Id;
        }
        catch (LibGit2SharpException e)
        {
            // A tag whose target object is missing (e.g. pruned) names no commit that could be an ancestor.
            notes.Add(BrokenTag(tag.CanonicalName, e));
            return null;
        }
    }

    private static bool IsAncestor(Repository repository, ObjectId tagged, Commit commit, List<Tag> tags, ICollection<string> notes)
    {
        try
        {
            return tagged == commit.Id
                || (repository.Lookup<Commit>(tagged) is { } taggedCommit && repository.ObjectDatabase.FindMergeBase(taggedCommit, commit)?.Id == tagged);
        }
        catch (LibGit2SharpException e)
        {
            foreach (var tag in tags)
            {
                notes.Add(BrokenTag(tag.CanonicalName, e));
            }

            return false;
        }
    }
}
