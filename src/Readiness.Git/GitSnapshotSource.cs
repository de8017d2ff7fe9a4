using LibGit2Sharp;

using Readiness.Core.Reports;
using Readiness.Core.Snapshots;

namespace Readiness.Git;

/// <summary>
/// Builds release snapshots from a git repository with LibGit2Sharp: the commit's tree is read straight from the
/// object database (no checkout), tags and the commit signature are read as stored. Nothing from the repository is run.
/// </summary>
public sealed class GitSnapshotSource : ISnapshotSource
{
    static GitSnapshotSource()
    {
        // libgit2 refuses, like git since 2.35.2, a repository owned by another user (CVE-2022-24765). That guard exists
        // because git may run programs named in the repository's configuration; this source only reads objects and
        // never runs anything the repository names, and a service or CI job routinely inspects checkouts made by
        // another account. The switch is process-wide in libgit2, so it is flipped once, here, before any open.
        GlobalSettings.SetOwnerValidation(false);
    }

    public ReleaseSnapshot Open(SnapshotRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        var repository = OpenRepository(request.Path);
        try
        {
            return request.Worktree ? OpenWorktree(repository, request) : OpenCommit(repository, request);
        }
        catch
        {
            repository.Dispose();
            throw;
        }
    }

    internal static string Location(Repository repository) =>
        Path.TrimEndingDirectorySeparator(repository.Info.WorkingDirectory ?? repository.Info.Path);

    private static ReleaseSnapshot OpenCommit(Repository repository, SnapshotRequest request)
    {
        var commit = ResolveCommit(repository, request.Ref);
        var files = CommitFileTree.Create(repository, commit, ownsRepository: true);
        try
        {
            var notes = new List<string>();
            var tags = TagReader.ReachableTags(repository, commit, notes);
            return new ReleaseSnapshot(
                Location(repository),
                commit.Sha,
                request.Ref,
                InspectionKind.Commit,
                files,
                ReleaseTag(repository, request),
                commit.Committer.When,
                CommitSignature(repository, commit),
                tags,
                new GitSignatureVerifier(repository.Info.Path))
            {
                Notes = notes,
            };
        }
        catch
        {
            files.Dispose();
            throw;
        }
    }

    private static ReleaseSnapshot OpenWorktree(Repository repository, SnapshotRequest request)
    {
        using (repository)
        {
            if (repository.Info.IsBare)
            {
                throw new RepositoryInspectionException(
                    $"{Location(repository)} is a bare repository: it has no working tree to inspect; drop --worktree to inspect a commit.");
            }

            var head = ResolveCommit(repository, "HEAD");
            var files = WorkingTreeFileTree.Create(repository);
            var notes = new List<string>();
            var tags = TagReader.ReachableTags(repository, head, notes);
            return new ReleaseSnapshot(
                Location(repository),
                head.Sha,
                request.Ref,
                InspectionKind.Worktree,
                files,
                ReleaseTag(repository, request),
                head.Committer.When,
                null,
                tags,
                null)
            {
                Notes = notes,
            };
        }
    }

    private static Repository OpenRepository(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        var full = Path.GetFullPath(string.IsNullOrEmpty(path) ? "." : path);
        if (!Directory.Exists(full))
        {
            throw new RepositoryInspectionException($"{full} does not exist or is not a folder.");
        }

        var gitDirectory = RepositoryDiscovery.Find(full);
        if (gitDirectory is null)
        {
            throw new RepositoryInspectionException($"{full} is not a git repository (nor any of its parent folders).");
        }

        Repository repository;
        try
        {
            repository = new Repository(gitDirectory);
        }
        catch (LibGit2SharpException e)
        {
            throw new RepositoryInspectionException($"{gitDirectory} could not be opened as a git repository: {OneLine(e.Message)}", e);
        }

        if (repository.Info.IsShallow)
        {
            var location = Location(repository);
            repository.Dispose();

            // A shallow clone holds only the newest commits: older commits and the tags on them are absent, so earlier
            // releases cannot be found and any verdict about them would be built on missing facts.
            throw new RepositoryInspectionException(
                $"{location} is a shallow clone: older commits and their tags are missing; fetch the full history (git fetch --unshallow --tags) and run again.");
        }

        return repository;
    }

    private static Commit ResolveCommit(Repository repository, string revision)
    {
        if (string.IsNullOrWhiteSpace(revision))
        {
            throw new RepositoryInspectionException("No revision was given to inspect.");
        }

        if (repository.Info.IsHeadUnborn && !repository.Refs.Any())
        {
            throw new RepositoryInspectionException($"{Location(repository)} is an empty repository: it has no commits yet.");
        }

        GitObject? found;
        try
        {
            found = repository.Lookup(revision);
        }
        catch (LibGit2SharpException e)
        {
            // An object that exists but cannot be parsed fails here too: say so rather than guess what it named.
            throw new RepositoryInspectionException(
                $"Revision '{revision}' could not be resolved in {Location(repository)}: {OneLine(e.Message)}"
                + (e is NotFoundException or AmbiguousSpecificationException ? string.Empty : ". If it names an object of this repository, that object is damaged (git fsck names what is wrong)."),
                e);
        }

        if (found is null)
        {
            throw new RepositoryInspectionException($"Revision '{revision}' was not found in {Location(repository)}.");
        }

        Commit commit;
        try
        {
            commit = found.Peel<Commit>();
        }
        catch (LibGit2SharpException e)
        {
            // A tree or blob cannot be peeled to a commit; an object that cannot be parsed is damaged, whatever it names.
            throw found is Tree or Blob
                ? new RepositoryInspectionException($"Revision '{revision}' names a {(found is Tree ? "tree" : "blob")}, not a commit.", e)
                : new RepositoryInspectionException($"Revision '{revision}' ({found.Sha}) could not be read as a commit: {OneLine(e.Message)}. The repository is damaged (git fsck names what is wrong).", e);
        }

        try
        {
            // Reading the tree and the committer parses the commit object: a damaged one fails here, not later.
            _ = commit.Tree.Sha;
            _ = commit.Committer.When;
            return commit;
        }
        catch (LibGit2SharpException e)
        {
            throw new RepositoryInspectionException($"Commit {commit.Sha} (revision '{revision}') could not be read: {OneLine(e.Message)}. The repository is damaged (git fsck names what is wrong).", e);
        }
    }

    private static TagInfo? ReleaseTag(Repository repository, SnapshotRequest request)
    {
        if (!string.IsNullOrWhiteSpace(request.Tag))
        {
            var named = FindTag(repository, request.Tag.Trim());
            return named is null
                ? throw new RepositoryInspectionException($"Tag '{request.Tag.Trim()}' was not found in {Location(repository)}.")
                : ReadTag(named) ?? throw new RepositoryInspectionException($"Tag '{request.Tag.Trim()}' does not point at a commit.");
        }

        // The ref names a tag itself (git's rev-parse order looks in refs/tags/ before refs/heads/).
        var byRef = request.Ref.StartsWith("refs/tags/", StringComparison.Ordinal) || !request.Ref.StartsWith("refs/", StringComparison.Ordinal)
            ? FindTag(repository, request.Ref)
            : null;
        return byRef is null ? null : ReadTag(byRef);
    }

    private static TagInfo? ReadTag(Tag tag)
    {
        try
        {
            return TagReader.Read(tag);
        }
        catch (LibGit2SharpException e)
        {
            throw new RepositoryInspectionException($"Tag '{tag.FriendlyName}' could not be read: {OneLine(e.Message)}. The repository is damaged (git fsck names what is wrong).", e);
        }
    }

    private static Tag? FindTag(Repository repository, string name)
    {
        try
        {
            return repository.Tags[name];
        }
        catch (LibGit2SharpException)
        {
            // Not a valid reference name (e.g. HEAD~1): it names no tag.
            return null;
        }
    }

    private static SignatureBlock? CommitSignature(Repository repository, Commit commit) =>
        CommitSignatureReader.Read(Path.TrimEndingDirectorySeparator(repository.Info.Path), commit.Sha);

    internal static string OneLine(string message) =>
        string.Join(' ', message.Split(['\r', '\n'], StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));
}
