using System.Collections.Concurrent;
using LibGit2Sharp;
using Readiness.Core.Snapshots;

namespace Readiness.Service.Mirrors;

/// <summary>
/// One bare mirror per repository under the data folder, fetched before each job (branches, tags and the forge's
/// pull request heads). Nothing is checked out. One fetch per repository at a time.
/// </summary>
public sealed class MirrorStore(string folder, string tokenHost)
{
    private static readonly string[] RefSpecs =
    [
        "+refs/heads/*:refs/heads/*",
        "+refs/tags/*:refs/tags/*",
        "+refs/pull/*/head:refs/pull/*/head",
    ];

    private readonly ConcurrentDictionary<string, SemaphoreSlim> gates = new(StringComparer.Ordinal);

    /// <summary>The mirror's git directory for <paramref name="fullName"/> (owner/name).</summary>
    public string PathOf(string fullName)
    {
        ArgumentNullException.ThrowIfNull(fullName);
        var parts = fullName.Split('/');
        if (parts.Length != 2 || parts.Any(p => p.Length == 0 || p is "." or ".." || p.IndexOfAny(Path.GetInvalidFileNameChars()) >= 0))
        {
            throw new ArgumentException($"'{fullName}' is not owner/name", nameof(fullName));
        }

        return Path.Combine(folder, parts[0], parts[1] + ".git");
    }

    /// <summary>
    /// Creates the mirror when missing and fetches it from <paramref name="cloneUrl"/>. <paramref name="token"/> is
    /// offered only to HTTPS remotes on <c>tokenHost</c> (<see cref="OffersToken"/>). Throws <see cref="RepositoryInspectionException"/> when the fetch fails.
    /// </summary>
    public async Task<string> UpdateAsync(string fullName, string cloneUrl, string? token, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(cloneUrl);
        var path = PathOf(fullName);
        var gate = gates.GetOrAdd(path, _ => new SemaphoreSlim(1, 1));
        await gate.WaitAsync(cancellationToken).ConfigureAwait(false);
        try
        {
            var offered = OffersToken(cloneUrl, tokenHost) ? token : null;
            return await Task.Run(() => Fetch(path, cloneUrl, offered, cancellationToken), cancellationToken).ConfigureAwait(false);
        }
        finally
        {
            gate.Release();
        }
    }

    private static string Fetch(string path, string cloneUrl, string? token, CancellationToken cancellationToken)
    {
        try
        {
            if (!Repository.IsValid(path))
            {
                Directory.CreateDirectory(path);
                Repository.Init(path, isBare: true);
            }

            using var repo = new Repository(path);
            var remote = repo.Network.Remotes["origin"];
            if (remote is null)
            {
                repo.Network.Remotes.Add("origin", cloneUrl);
            }
            else if (remote.Url != cloneUrl)
            {
                repo.Network.Remotes.Update("origin", r => r.Url = cloneUrl);
            }

            var options = new FetchOptions
            {
                Prune = true,
                TagFetchMode = TagFetchMode.None,
                OnTransferProgress = _ => !cancellationToken.IsCancellationRequested,
            };
            if (token is not null)
            {
                options.CredentialsProvider = (_, _, _) => new UsernamePasswordCredentials { Username = "x-access-token", Password = token };
            }

            Commands.Fetch(repo, "origin", RefSpecs, options, "readiness mirror fetch");
            return path;
        }
        catch (LibGit2SharpException e)
        {
            cancellationToken.ThrowIfCancellationRequested();
            throw new RepositoryInspectionException($"could not fetch {Redact(cloneUrl)}: {e.Message}", e);
        }
    }

    /// <summary>Whether the forge's token may go to <paramref name="cloneUrl"/>: https, on the forge's own host, no credentials of its own.</summary>
    public static bool OffersToken(string cloneUrl, string tokenHost) =>
        Uri.TryCreate(cloneUrl, UriKind.Absolute, out var uri)
        && uri.Scheme == Uri.UriSchemeHttps
        && uri.UserInfo.Length == 0
        && string.Equals(uri.Host, tokenHost, StringComparison.OrdinalIgnoreCase);

    /// <summary>A clone URL without any user information it may carry.</summary>
    public static string Redact(string url) =>
        Uri.TryCreate(url, UriKind.Absolute, out var uri) && uri.UserInfo.Length > 0
            ? new UriBuilder(uri) { UserName = string.Empty, Password = string.Empty }.Uri.ToString()
            : url;
}
