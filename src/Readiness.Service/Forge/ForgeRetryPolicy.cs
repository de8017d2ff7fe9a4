using System.Globalization;
using System.Net;
using Readiness.Service.Storage;

namespace Readiness.Service.Forge;

/// <summary>
/// Retries forge calls that failed for reasons that pass: a 5xx answer, a transport failure, a call that took longer
/// than its timeout, or a rate limit (403/429 with <c>retry-after</c> or an exhausted <c>x-ratelimit-remaining</c>;
/// the forge's rate-limit docs say to honour <c>retry-after</c>, else wait until <c>x-ratelimit-reset</c>, else wait at
/// least one minute, backing off exponentially; a 403 without rate-limit headers is the secondary limit).
/// A rate limit is recorded in <see cref="IForgeLimitStore"/> so every instance waits for it; a wait longer than the
/// configured maximum is not slept through but thrown as <see cref="ForgeRateLimitedException"/> (the job is
/// requeued until then), so nothing is retried sooner than the forge allows.
/// </summary>
public sealed class ForgeRetryPolicy(
    int maxRetries,
    TimeSpan maxDelay,
    TimeProvider time,
    ILogger<ForgeRetryPolicy> logger,
    IForgeLimitStore? limits = null,
    TimeSpan? callTimeout = null)
{
    /// <summary>The scope of calls made with the plain token (an app's calls are scoped by installation).</summary>
    public const string TokenScope = "token";

    private static readonly TimeSpan FirstBackoff = TimeSpan.FromSeconds(1);
    private static readonly TimeSpan RateLimitBackoff = TimeSpan.FromMinutes(1);
    private readonly TimeSpan timeout = callTimeout ?? TimeSpan.FromSeconds(15);

    /// <summary>How many retries were made (for figures).</summary>
    public long Retries => Interlocked.Read(ref retries);

    private long retries;

    public async Task<T> RunAsync<T>(string what, Func<CancellationToken, Task<T>> call, CancellationToken cancellationToken, string scope = TokenScope)
    {
        ArgumentNullException.ThrowIfNull(call);
        for (var attempt = 0; ; attempt++)
        {
            await WaitForLimitAsync(what, scope, cancellationToken).ConfigureAwait(false);
            TimeSpan delay;
            using var callCancel = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
            callCancel.CancelAfter(timeout);
            try
            {
                return await call(callCancel.Token).ConfigureAwait(false);
            }
            catch (Octokit.ApiException e) when (DelayFor(e.StatusCode, Headers(e), attempt, time.GetUtcNow()) is { } d)
            {
                if ((int)e.StatusCode is 403 or 429)
                {
                    var until = time.GetUtcNow() + d;
                    if (limits is not null)
                    {
                        await limits.BlockAsync(scope, until, CancellationToken.None).ConfigureAwait(false);
                    }

                    if (d > maxDelay || attempt >= maxRetries)
                    {
                        logger.LogWarning("The forge's rate limit ({Status}) holds {What} for {Delay} ms: the job waits in the queue", (int)e.StatusCode, what, (long)d.TotalMilliseconds);
                        throw new ForgeRateLimitedException(what, until);
                    }
                }
                else if (attempt >= maxRetries)
                {
                    throw;
                }

                delay = Cap(d);
                logger.LogWarning("The forge answered {Status} to {What}; retry {Attempt} in {Delay} ms", (int)e.StatusCode, what, attempt + 1, (long)delay.TotalMilliseconds);
            }
            catch (HttpRequestException e) when (attempt < maxRetries)
            {
                delay = Cap(Backoff(FirstBackoff, attempt));
                logger.LogWarning("The forge could not be reached for {What} ({Error}); retry {Attempt} in {Delay} ms", what, e.HttpRequestError, attempt + 1, (long)delay.TotalMilliseconds);
            }
            catch (OperationCanceledException) when (!cancellationToken.IsCancellationRequested)
            {
                // The call's own timeout: a hung forge must not hold the worker.
                if (attempt >= maxRetries)
                {
                    throw new TimeoutException($"the forge did not answer {what} within {(long)timeout.TotalMilliseconds} ms");
                }

                delay = Cap(Backoff(FirstBackoff, attempt));
                logger.LogWarning("The forge did not answer {What} within {Timeout} ms; retry {Attempt} in {Delay} ms", what, (long)timeout.TotalMilliseconds, attempt + 1, (long)delay.TotalMilliseconds);
            }

            Interlocked.Increment(ref retries);
            await Task.Delay(delay, time, cancellationToken).ConfigureAwait(false);
        }
    }

    /// <summary>Waits out a limit another call (or instance) recorded, or hands the job back when it is too long.</summary>
    private async Task WaitForLimitAsync(string what, string scope, CancellationToken cancellationToken)
    {
        if (limits is null || await limits.BlockedUntilAsync(scope, cancellationToken).ConfigureAwait(false) is not { } until)
        {
            return;
        }

        var wait = until - time.GetUtcNow();
        if (wait <= TimeSpan.Zero)
        {
            return;
        }

        if (wait > maxDelay)
        {
            throw new ForgeRateLimitedException(what, until);
        }

        await Task.Delay(wait, time, cancellationToken).ConfigureAwait(false);
    }

    /// <summary>How long to wait before retrying an answer, or null when retrying would not help.</summary>
    internal static TimeSpan? DelayFor(HttpStatusCode status, IReadOnlyDictionary<string, string> headers, int attempt, DateTimeOffset now)
    {
        var code = (int)status;
        var retryAfter = Header(headers, "retry-after") is { } ra && long.TryParse(ra, NumberStyles.Integer, CultureInfo.InvariantCulture, out var seconds) && seconds >= 0
            ? TimeSpan.FromSeconds(seconds)
            : (TimeSpan?)null;
        if (code >= 500)
        {
            return retryAfter ?? Backoff(FirstBackoff, attempt);
        }

        if (code is 403 or 429)
        {
            if (retryAfter is { } wait)
            {
                return wait;
            }

            if (Header(headers, "x-ratelimit-remaining") == "0"
                && Header(headers, "x-ratelimit-reset") is { } reset
                && long.TryParse(reset, NumberStyles.Integer, CultureInfo.InvariantCulture, out var epoch))
            {
                var until = DateTimeOffset.FromUnixTimeSeconds(epoch) - now;
                return until > TimeSpan.Zero ? until : TimeSpan.Zero;
            }

            // 429 without retry-after, or 403 with no rate-limit headers at all (the secondary limit): at least a minute.
            return code == 429 || Header(headers, "x-ratelimit-remaining") is null ? Backoff(RateLimitBackoff, attempt) : null;
        }

        return null;
    }

    private TimeSpan Cap(TimeSpan delay) => delay > maxDelay ? maxDelay : delay;

    private static TimeSpan Backoff(TimeSpan first, int attempt) => first * Math.Pow(2, Math.Min(attempt, 10));

    private static IReadOnlyDictionary<string, string> Headers(Octokit.ApiException e) =>
        e.HttpResponse?.Headers ?? new Dictionary<string, string>();

    private static string? Header(IReadOnlyDictionary<string, string> headers, string name) =>
        headers.FirstOrDefault(h => string.Equals(h.Key, name, StringComparison.OrdinalIgnoreCase)).Value?.Trim();
}
