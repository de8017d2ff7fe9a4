using Readiness.Core.Configuration;
using Readiness.Service.Configuration;
using Readiness.Service.Storage;
using Readiness.Service.Worker;

namespace Readiness.Service.Webhooks;

/// <summary>
/// <c>POST /hooks/github</c>: checks the signature, records the delivery once, queues a job for release-relevant
/// pull request events and answers at once; the worker does the rest.
/// </summary>
public sealed class WebhookEndpoint(ServiceSettings settings, IJobStore jobs, JobSignal signal, ILogger<WebhookEndpoint> logger) : IDisposable
{
    public const string Path = "/hooks/github";
    public const string EventHeader = "X-GitHub-Event";
    public const string DeliveryHeader = "X-GitHub-Delivery";

    /// <summary>The forge caps payloads at 25 MB; pull request payloads are far smaller.</summary>
    public const int MaxBodyBytes = 5 * 1024 * 1024;

    /// <summary>
    /// Bodies read at once before their signature is known: memory for unsigned floods stays under this many times
    /// <see cref="MaxBodyBytes"/>; a request without a well-formed signature header is refused before any is read.
    /// </summary>
    public const int MaxUnverifiedReads = 16;

    private readonly SemaphoreSlim unverifiedReads = new(MaxUnverifiedReads, MaxUnverifiedReads);

    public async Task<IResult> HandleAsync(HttpContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var cancellationToken = context.RequestAborted;
        var delivery = context.Request.Headers[DeliveryHeader].ToString();
        var signature = context.Request.Headers[WebhookSignature.Header].ToString();
        if (!WebhookSignature.IsWellFormed(signature))
        {
            logger.LogWarning("Refused delivery {Delivery}: {Problem}", Safe(delivery), signature.Length == 0 ? "no signature" : "malformed signature");
            return Unsigned();
        }

        if (!await unverifiedReads.WaitAsync(TimeSpan.FromSeconds(5), cancellationToken).ConfigureAwait(false))
        {
            context.Response.Headers.RetryAfter = "5";
            return Results.Json(new { error = "too many deliveries are being read; retry" }, statusCode: StatusCodes.Status503ServiceUnavailable);
        }

        byte[]? body;
        bool signed;
        try
        {
            body = await ReadBodyAsync(context.Request, cancellationToken).ConfigureAwait(false);
            signed = body is not null && WebhookSignature.Verify(settings.WebhookSecret, body, signature);
        }
        finally
        {
            unverifiedReads.Release();
        }

        if (body is null)
        {
            return Results.Json(new { error = $"the body is larger than {MaxBodyBytes} bytes" }, statusCode: StatusCodes.Status413PayloadTooLarge);
        }

        if (!signed)
        {
            logger.LogWarning("Refused delivery {Delivery}: {Problem}", Safe(delivery), "wrong signature");
            return Unsigned();
        }

        var eventName = context.Request.Headers[EventHeader].ToString();
        if (delivery.Length is 0 or > 200 || eventName.Length is 0 or > 100)
        {
            return Results.Json(new { error = $"{DeliveryHeader} and {EventHeader} are required" }, statusCode: StatusCodes.Status400BadRequest);
        }

        JobRequest? request = null;
        if (eventName == "pull_request")
        {
            var pr = PullRequestEvent.Parse(body, out var problem);
            if (pr is null)
            {
                return Results.Json(new { error = problem }, statusCode: StatusCodes.Status400BadRequest);
            }

            if (CloneUrlProblem(pr.CloneUrl) is { } cloneProblem)
            {
                logger.LogWarning("Refused delivery {Delivery}: {Problem}", Safe(delivery), cloneProblem);
                return Results.Json(new { error = cloneProblem }, statusCode: StatusCodes.Status400BadRequest);
            }

            if (PullRequestEvent.RelevantActions.Contains(pr.Action))
            {
                request = new JobRequest(pr.FullName, pr.CloneUrl, pr.InstallationId, pr.Number, pr.HeadSha, pr.BaseRef, pr.Body, Reason(pr));
            }
        }

        var (outcome, jobId) = await jobs.RecordDeliveryAsync(delivery, eventName, request, cancellationToken).ConfigureAwait(false);
        switch (outcome)
        {
            case EnqueueOutcome.Duplicate:
                return Results.Json(new { status = "duplicate" }, statusCode: StatusCodes.Status200OK);
            case EnqueueOutcome.QueueFull:
                logger.LogWarning("Refused delivery {Delivery}: the queue of {Repository} is full", Safe(delivery), request?.Repository);
                context.Response.Headers.RetryAfter = "60";
                return Results.Json(new { error = $"the queue of {request?.Repository} is full; redeliver later" }, statusCode: StatusCodes.Status503ServiceUnavailable);
            case EnqueueOutcome.Ignored:
                return Results.Json(new { status = eventName == "ping" ? "pong" : "ignored" }, statusCode: StatusCodes.Status202Accepted);
            default:
                signal.Notify();
                return Results.Json(new { status = outcome == EnqueueOutcome.Queued ? "queued" : "collapsed", job = jobId }, statusCode: StatusCodes.Status202Accepted);
        }
    }

    /// <summary>
    /// Why the service will not clone from <paramref name="url"/>: credentials in it (they would be stored), an https
    /// host other than the forge's (the token would go there), or a non-https URL where those are not allowed.
    /// </summary>
    private string? CloneUrlProblem(string url)
    {
        if (!Uri.TryCreate(url, UriKind.Absolute, out var uri))
        {
            return "repository.clone_url is not an absolute URL";
        }

        if (uri.UserInfo.Length > 0)
        {
            return "repository.clone_url must not carry credentials";
        }

        if (uri.Scheme == Uri.UriSchemeHttps)
        {
            return string.Equals(uri.Host, settings.CloneHost, StringComparison.OrdinalIgnoreCase)
                ? null
                : $"repository.clone_url must be on the forge's host {settings.CloneHost}";
        }

        return settings.AllowNonHttpsCloneUrls ? null : "repository.clone_url must be an https URL";
    }

    public void Dispose() => unverifiedReads.Dispose();

    private static IResult Unsigned() =>
        Results.Json(new { error = "missing or wrong X-Hub-Signature-256" }, statusCode: StatusCodes.Status401Unauthorized);

    /// <summary>Why the event itself makes the pull request a release candidate, or null when its changes must decide.</summary>
    private string? Reason(PullRequestEvent pr)
    {
        if (settings.ReleaseBranches.FirstOrDefault(p => NameGlob.Matches(p, pr.BaseRef)) is { } pattern)
        {
            return $"the base branch {pr.BaseRef} matches the release branches '{pattern}'";
        }

        return pr.Labels.Contains(settings.ReleaseLabel, StringComparer.OrdinalIgnoreCase) ? $"it carries the label '{settings.ReleaseLabel}'" : null;
    }

    private static async Task<byte[]?> ReadBodyAsync(HttpRequest request, CancellationToken cancellationToken)
    {
        if (request.ContentLength > MaxBodyBytes)
        {
            return null;
        }

        using var buffer = new MemoryStream();
        var chunk = new byte[16 * 1024];
        int read;
        while ((read = await request.Body.ReadAsync(chunk, cancellationToken).ConfigureAwait(false)) > 0)
        {
            if (buffer.Length + read > MaxBodyBytes)
            {
                return null;
            }

            buffer.Write(chunk, 0, read);
        }

        return buffer.ToArray();
    }

    private static string Safe(string text) =>
        new(text.Take(100).Select(c => char.IsAsciiLetterOrDigit(c) || c == '-' ? c : '_').ToArray());
}
