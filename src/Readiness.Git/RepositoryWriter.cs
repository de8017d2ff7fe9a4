using LibGit2Sharp;

namespace Readiness.Git;

/// <summary>
/// Writes a new repository with real commits and tags (used by <c>readiness demo</c>). Never used on a repository
/// the tool inspects.
/// </summary>
public sealed class RepositoryWriter : IDisposable
{
    private readonly Repository repository;
    private readonly string root;

    private RepositoryWriter(string root)
    {
        this.root = root;
        repository = new Repository(Repository.Init(root));
    }

    public string Root => root;

    /// <summary>Creates an empty repository in <paramref name="folder"/> (created if needed) with branch main.</summary>
    public static RepositoryWriter Init(string folder)
    {
        ArgumentNullException.ThrowIfNull(folder);
        Directory.CreateDirectory(folder);
        var writer = new RepositoryWriter(folder);
        writer.repository.Refs.UpdateTarget("HEAD", "refs/heads/main");
        return writer;
    }

    /// <summary>Writes files (repository-relative path → content; null deletes), stages them and commits.</summary>
    public string Commit(IReadOnlyDictionary<string, byte[]?> files, string message, string author, string email, DateTimeOffset when)
    {
        ArgumentNullException.ThrowIfNull(files);
        foreach (var (path, content) in files)
        {
            var full = Path.Combine(root, path.Replace('/', Path.DirectorySeparatorChar));
            if (content is null)
            {
                File.Delete(full);
                Commands.Remove(repository, path);
                continue;
            }

            Directory.CreateDirectory(Path.GetDirectoryName(full)!);
            File.WriteAllBytes(full, content);
            Commands.Stage(repository, path);
        }

        var signature = new Signature(author, email, when);
        return repository.Commit(message, signature, signature, new CommitOptions { AllowEmptyCommit = true }).Sha;
    }

    public void LightweightTag(string name, string commit) => repository.Tags.Add(name, commit);

    public void AnnotatedTag(string name, string commit, string message, string author, string email, DateTimeOffset when) =>
        repository.Tags.Add(name, repository.Lookup(commit), new Signature(author, email, when), message);

    public void Dispose() => repository.Dispose();
}
