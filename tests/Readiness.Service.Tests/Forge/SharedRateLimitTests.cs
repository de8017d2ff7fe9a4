using Microsoft.Extensions.Logging.Abstractions;
using Readiness.Core.Forge;
using Readiness.Service.Forge;
using Readiness.Service.Storage;
using Readiness.Service.Tests.Storage;
using Readiness.Testing;

namespace Readiness.Service.Tests.Forge;

/// <summary>A rate limit one instance is told about holds every instance on the same PostgreSQL database.</summary>
[Collection(PostgresCollection.Name)]
public sealed class SharedRateLimitTests(PostgresCluster cluster) : IAsyncLifetime
{
    private static readonly ForgeRepository Repository = new("bramblecote", "sketches", 42);
    private readonly PostgresBackend backend = new(cluster);
    private ForgeStandIn standIn = null!;
    private OctokitConnections connections = null!;

    public async Task InitializeAsync()
    {
        standIn = await ForgeStandIn.StartAsync();
        standIn.AcceptToken("forge-token-Xq81");
        connections = new OctokitConnections(TestSettings.Create(standIn.BaseUrl, "unused"));
    }

    public async Task DisposeAsync()
    {
        connections.Dispose();
        backend.Dispose();
        await standIn.DisposeAsync();
    }

    [Fact]
    public async Task RetryAfterLongerThanAWorkerMayWait_HoldsBothInstances_WithoutAnotherCall()
    {
        // 429 with retry-after (the forge's rate-limit docs): no request before that time, from any instance.
        standIn.FailNext("POST", "/statuses/", 429, new Dictionary<string, string> { ["retry-after"] = "120" });
        var a = Forge(backend.Limits());
        var b = Forge(backend.Limits());
        var status = new ForgeCommitStatus(new string('e', 40), ForgeCommitState.Success, "Ready", null, "readiness");

        var first = await Assert.ThrowsAsync<ForgeRateLimitedException>(() => a.SetStatusAsync(Repository, status, default));
        Assert.InRange(first.Until - DateTimeOffset.UtcNow, TimeSpan.FromSeconds(100), TimeSpan.FromSeconds(121));
        var second = await Assert.ThrowsAsync<ForgeRateLimitedException>(() => b.SetStatusAsync(Repository, status, default));
        Assert.Equal(first.Until.ToUnixTimeMilliseconds(), second.Until.ToUnixTimeMilliseconds());
        Assert.Single(standIn.Calls, c => c.Path.Contains("/statuses/", StringComparison.Ordinal));

        // Another token (installation) is not held.
        await b.SetStatusAsync(Repository with { InstallationId = null }, status, default);
        Assert.Single(standIn.Statuses(status.Sha));
    }

    private OctokitForge Forge(IForgeLimitStore limits) =>
        new(connections, new PlainTokenCredentials("forge-token-Xq81"), new ForgeRetryPolicy(3, TimeSpan.FromSeconds(5), TimeProvider.System, NullLogger<ForgeRetryPolicy>.Instance, limits));
}
