using System.Globalization;
using System.Net;
using Octokit;

namespace Readiness.Service.Forge;

/// <summary>
/// Retries forge calls that failed for reasons that pass: a 5xx answer, a transport failure, or a rate limit
/// (403/429 with <c>retry-after</c> or an exhausted <c>x-ratelimit-remaining</c>; the forge's rate-limit docs say to
/// honour <c>retry-after</c>, else wait until <c>x-ratelimit-reset</c>, else back off exponentially from one minute).
/// Waits are capped by the configured maximum.
/// </summary>
public sealed class ForgeRetryPolicy(int maxRetries, TimeSpan maxDelay, TimeProvider time, ILogger<ForgeRetryPolicy> logger)
{
    private static readonly TimeSpan FirstBackoff = TimeSpan.FromSeconds(1);
    private static readonly TimeSpan RateLimitBackoff = TimeSpan.FromMinutes(1);

    /// <summary>How many retries were made (for figures).</summary>
    public long Retries => Interlocked.Read(ref retries);

    private long retries;

    public async Task<T> RunAsync<T>(string what, Func<CancellationToken, Task<T>> call, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(call);
        for (var attempt = 0; ; attempt++)
        {
            TimeSpan delay;
            try
            {
                return await call(cancellationToken).ConfigureAwait(false);
            }
            catch (ApiException e) when (attempt < maxRetries && DelayFor(e.StatusCode, Headers(e), attempt, time.GetUtcNow()) is { } d)
            {
                delay = Cap(d);
                logger.LogWarning("The forge answered {Status} to {What}; retry {Attempt} in {Delay} ms", (int)e.StatusCode, what, attempt + 1, (long)delay.TotalMilliseconds);
            }
            catch (HttpRequestException e) when (attempt < maxRetries)
            {
                delay = Cap(Backoff(FirstBackoff, attempt));
                logger.LogWarning("The forge could not be reached for {What} ({Error}); retry {Attempt} in {Delay} ms", what, e.HttpRequestError, attempt + 1, (long)delay.TotalMilliseconds);
            }

            Interlocked.Increment(ref retries);
            await Task.Delay(delay, time, cancellationToken).ConfigureAwait(false);
        }
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

            return code == 429 ? Backoff(RateLimitBackoff, attempt) : null;
        }

        return null;
    }

    private TimeSpan Cap(TimeSpan delay) => delay > maxDelay ? maxDelay : delay;

    private static TimeSpan Backoff(TimeSpan first, int attempt) => first * Math.Pow(2, Math.Min(attempt, 10));

    private static IReadOnlyDictionary<string, string> Headers(ApiException e) =>
        e.HttpResponse?.Headers ?? new Dictionary<string, string>();

    private static string? Header(IReadOnlyDictionary<string, string> headers, string name) =>
        headers.FirstOrDefault(h => string.Equals(h.Key, name, StringComparison.OrdinalIgnoreCase)).Value?.Trim();
}
