namespace Readiness.Core.Forge;

/// <summary>
/// Port: what the service asks of the forge hosting a pull request. Implemented outside Core (an HTTP API adapter);
/// checks never see it.
/// </summary>
public interface IForge
{
    /// <summary>
    /// Creates the pull request's report comment, or updates the one already there (found by <paramref name="marker"/>
    /// in its body). Never leaves two comments carrying the marker behind when there was at most one before.
    /// </summary>
    Task<ForgeComment> UpsertCommentAsync(ForgePullRequest pullRequest, string marker, string body, CancellationToken cancellationToken);

    /// <summary>Sets a commit status on the pull request's head commit.</summary>
    Task SetStatusAsync(ForgeRepository repository, ForgeCommitStatus status, CancellationToken cancellationToken);
}
