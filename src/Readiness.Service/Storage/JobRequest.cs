namespace Readiness.Service.Storage;

/// <summary>What a webhook delivery asks the worker to do: report on one pull request at one head commit.</summary>
/// <param name="Repository">owner/name.</param>
/// <param name="CloneUrl">Where the repository is fetched from.</param>
/// <param name="InstallationId">The app installation, when the service runs as an app.</param>
/// <param name="Number">The pull request's number.</param>
/// <param name="HeadSha">Its head commit.</param>
/// <param name="BaseRef">Its base branch.</param>
/// <param name="Body">Its description (ticked manual items are confirmations).</param>
/// <param name="ReleaseReason">Why it is a release candidate, or null when the worker must look at its changes.</param>
public sealed record JobRequest(
    string Repository,
    string CloneUrl,
    long? InstallationId,
    int Number,
    string HeadSha,
    string BaseRef,
    string? Body,
    string? ReleaseReason);
