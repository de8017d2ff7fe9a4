using Octokit;
using Readiness.Core.Forge;

namespace Readiness.Service.Forge;

/// <summary>
/// The forge port over Octokit: the report comment (found again by its marker) and the commit status. The client's
/// calls take no cancellation token, so each is awaited with one: a stopping service does not wait for the forge.
/// </summary>
public sealed class OctokitForge(OctokitConnections connections, IForgeCredentials credentials, ForgeRetryPolicy retry) : IForge
{
    public async Task<ForgeComment> UpsertCommentAsync(ForgePullRequest pullRequest, string marker, string body, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(pullRequest);
        ArgumentException.ThrowIfNullOrEmpty(marker);
        var repo = pullRequest.Repository;

        // Each try looks for the comment again: a create that failed on the way back may have landed.
        return await retry.RunAsync($"the comment on {pullRequest}", async ct =>
        {
            var client = await ClientAsync(repo, ct).ConfigureAwait(false);
            var comments = await client.Issue.Comment.GetAllForIssue(repo.Owner, repo.Name, pullRequest.Number).WaitAsync(ct).ConfigureAwait(false);
            var existing = comments.Where(c => c.Body is not null && c.Body.Contains(marker, StringComparison.Ordinal))
                .OrderBy(c => c.Id)
                .FirstOrDefault();
            if (existing is null)
            {
                var created = await client.Issue.Comment.Create(repo.Owner, repo.Name, pullRequest.Number, body).WaitAsync(ct).ConfigureAwait(false);
                return new ForgeComment(created.Id, created.HtmlUrl, true);
            }

            if (existing.Body == body)
            {
                return new ForgeComment(existing.Id, existing.HtmlUrl, false);
            }

            var updated = await client.Issue.Comment.Update(repo.Owner, repo.Name, existing.Id, body).WaitAsync(ct).ConfigureAwait(false);
            return new ForgeComment(updated.Id, updated.HtmlUrl, false);
        }, cancellationToken, Scope(repo)).ConfigureAwait(false);
    }

    public async Task SetStatusAsync(ForgeRepository repository, ForgeCommitStatus status, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(repository);
        ArgumentNullException.ThrowIfNull(status);
        var request = new NewCommitStatus
        {
            State = status.State switch
            {
                ForgeCommitState.Success => CommitState.Success,
                ForgeCommitState.Failure => CommitState.Failure,
                ForgeCommitState.Error => CommitState.Error,
                _ => CommitState.Pending,
            },
            Description = ForgeCommitStatus.FitDescription(status.Description),
            TargetUrl = status.TargetUrl,
            Context = status.Context,
        };
        await retry.RunAsync($"the status of {repository}@{status.Sha}", async ct =>
        {
            var client = await ClientAsync(repository, ct).ConfigureAwait(false);
            return await client.Repository.Status.Create(repository.Owner, repository.Name, status.Sha, request).WaitAsync(ct).ConfigureAwait(false);
        }, cancellationToken, Scope(repository)).ConfigureAwait(false);
    }

    /// <summary>Rate limits count per token: per app installation, or the one plain token.</summary>
    private static string Scope(ForgeRepository repository) =>
        repository.InstallationId is { } id ? "installation:" + id.ToString(System.Globalization.CultureInfo.InvariantCulture) : ForgeRetryPolicy.TokenScope;

    private async Task<GitHubClient> ClientAsync(ForgeRepository repository, CancellationToken cancellationToken)
    {
        var token = await credentials.TokenAsync(repository.InstallationId, cancellationToken).ConfigureAwait(false);
        return connections.Client(new Credentials(token));
    }
}
