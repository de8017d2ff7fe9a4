using System.Net;
using Readiness.Service.Forge;

namespace Readiness.Service.Tests.Forge;

public sealed class ForgeRetryPolicyTests
{
    private static readonly DateTimeOffset Now = new(2026, 11, 20, 12, 0, 0, TimeSpan.Zero);

    // The forge's rate-limit docs (standards.md §8): honour retry-after; else wait until x-ratelimit-reset
    // when x-ratelimit-remaining is 0; 403 or 429 signal the limit.
    [Theory]
    [InlineData(403)]
    [InlineData(429)]
    public void RateLimitWithRetryAfter_WaitsThatLong(int status) =>
        Assert.Equal(TimeSpan.FromSeconds(7), ForgeRetryPolicy.DelayFor((HttpStatusCode)status, Headers(("Retry-After", "7")), 0, Now));

    [Fact]
    public void ExhaustedRateLimit_WaitsUntilReset()
    {
        var reset = Now.AddSeconds(42).ToUnixTimeSeconds().ToString(System.Globalization.CultureInfo.InvariantCulture);
        Assert.Equal(TimeSpan.FromSeconds(42), ForgeRetryPolicy.DelayFor(HttpStatusCode.Forbidden, Headers(("x-ratelimit-remaining", "0"), ("x-ratelimit-reset", reset)), 0, Now));
    }

    [Fact]
    public void ForbiddenWithoutRateLimitHeaders_IsTheSecondaryLimit_WaitsAtLeastAMinute()
    {
        // The forge's rate-limit docs (standards.md §8): for the secondary limit without retry-after or reset, wait
        // at least one minute, backing off exponentially.
        Assert.Equal(TimeSpan.FromMinutes(1), ForgeRetryPolicy.DelayFor(HttpStatusCode.Forbidden, Headers(), 0, Now));
        Assert.Equal(TimeSpan.FromMinutes(4), ForgeRetryPolicy.DelayFor(HttpStatusCode.Forbidden, Headers(), 2, Now));
    }

    [Fact]
    public void ServerError_BacksOffExponentially()
    {
        Assert.Equal(TimeSpan.FromSeconds(1), ForgeRetryPolicy.DelayFor(HttpStatusCode.BadGateway, Headers(), 0, Now));
        Assert.Equal(TimeSpan.FromSeconds(4), ForgeRetryPolicy.DelayFor(HttpStatusCode.ServiceUnavailable, Headers(), 2, Now));
    }

    [Theory]
    [InlineData(400)]
    [InlineData(401)]
    [InlineData(403)]
    [InlineData(404)]
    [InlineData(422)]
    public void ClientErrorWithoutRateLimit_IsNotRetried(int status) =>
        Assert.Null(ForgeRetryPolicy.DelayFor((HttpStatusCode)status, Headers(("x-ratelimit-remaining", "4999")), 0, Now));

    private static Dictionary<string, string> Headers(params (string Name, string Value)[] headers) =>
        headers.ToDictionary(h => h.Name, h => h.Value);
}
