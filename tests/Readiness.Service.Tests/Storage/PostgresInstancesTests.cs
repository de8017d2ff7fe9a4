using System.Collections.Concurrent;
using Npgsql;
using Readiness.Service.Storage;
using Readiness.Testing;

namespace Readiness.Service.Tests.Storage;

/// <summary>
/// Several instances on one PostgreSQL database: each instance is its own <see cref="PostgresDatabase"/> (its own
/// connection pool), as separate processes would be.
/// </summary>
[Collection(PostgresCollection.Name)]
public sealed class PostgresInstancesTests(PostgresCluster cluster) : IDisposable
{
    private static readonly TimeSpan Lease = TimeSpan.FromSeconds(30);
    private readonly string connectionString = cluster.CreateDatabase();
    private readonly List<PostgresDatabase> databases = [];

    [Fact]
    public async Task InstancesStartingTogether_MigrateOnce()
    {
        var instances = Enumerable.Range(0, 6).Select(_ => Instance()).ToList();
        var applied = await Task.WhenAll(instances.Select(d => Task.Run(d.Initialize)));
        Assert.Equal(PostgresMigrations.Steps.Count, applied.Sum());
        await using var c = new NpgsqlConnection(connectionString);
        await c.OpenAsync();
        await using var q = new NpgsqlCommand("SELECT COUNT(*) FROM schema_migrations", c);
        Assert.Equal((long)PostgresMigrations.Steps.Count, await q.ExecuteScalarAsync());
        Assert.Equal(0, Instance().Initialize());
    }

    [Fact]
    public async Task ThreeInstancesClaimingAtOnce_TakeEachJobExactlyOnce()
    {
        var stores = Stores(3, new JobStoreOptions(MaxRunningPerRepository: 1000));
        for (var pr = 1; pr <= 90; pr++)
        {
            await stores[pr % 3].RecordDeliveryAsync($"d-{pr}", "pull_request", Request(pr, "a"), default);
        }

        var claimed = new ConcurrentBag<(long Job, string Owner)>();
        var loops = stores.SelectMany((store, i) => Enumerable.Range(0, 6).Select(w => Task.Run(async () =>
        {
            var owner = $"instance-{i}:{w}";
            while (await store.ClaimAsync(owner, Lease, default) is { } job)
            {
                claimed.Add((job.Id, owner));
            }
        })));
        await Task.WhenAll(loops);

        Assert.Equal(90, claimed.Count);
        Assert.Equal(90, claimed.Select(c => c.Job).Distinct().Count());
        Assert.True(claimed.Select(c => c.Owner[..10]).Distinct().Count() > 1, "the work was shared between instances");
        Assert.Equal(90, stores[0].CountByState()[JobState.Running]);
    }

    [Fact]
    public async Task SameDeliveryOnThreeInstances_IsRecordedOnce()
    {
        var stores = Stores(3);
        var results = await Task.WhenAll(Enumerable.Range(0, 30).Select(i => Task.Run(() =>
            stores[i % 3].RecordDeliveryAsync($"d-{i % 10}", "pull_request", Request(i % 10, "a"), default))));
        Assert.Equal(10, results.Count(r => r.Outcome == EnqueueOutcome.Queued));
        Assert.Equal(20, results.Count(r => r.Outcome == EnqueueOutcome.Duplicate));
    }

    [Fact]
    public async Task EventsForOnePullRequestOnTwoInstances_QueueOneJob()
    {
        var stores = Stores(2);
        var results = await Task.WhenAll(Enumerable.Range(0, 40).Select(i => Task.Run(() =>
            stores[i % 2].RecordDeliveryAsync($"d-{i}", "pull_request", Request(7, i.ToString("x", System.Globalization.CultureInfo.InvariantCulture)), default))));
        Assert.Equal(1, results.Count(r => r.Outcome == EnqueueOutcome.Queued));
        Assert.Equal(39, results.Count(r => r.Outcome == EnqueueOutcome.Collapsed));
        Assert.Equal(1, stores[0].CountByState()[JobState.Queued]);
    }

    [Fact]
    public async Task InstancesRacingForOnePullRequest_NeverRunTwoOfItsJobs()
    {
        var time = new Microsoft.Extensions.Time.Testing.FakeTimeProvider(new DateTimeOffset(2026, 11, 20, 12, 0, 0, TimeSpan.Zero));
        var stores = Enumerable.Range(0, 3).Select(_ => (IJobStore)new PostgresJobStore(Initialized(), time)).ToList();
        await stores[0].RecordDeliveryAsync("d-1", "pull_request", Request(1, "a"), default);
        var first = (await stores[0].ClaimAsync("died", Lease, default))!;
        await stores[1].RecordDeliveryAsync("d-2", "pull_request", Request(1, "b"), default);
        time.Advance(Lease + TimeSpan.FromSeconds(1));

        // The expired job and the newer one are both candidates; the database lets one instance run one of them.
        var claims = await Task.WhenAll(Enumerable.Range(0, 12).Select(i => Task.Run(() => stores[i % 3].ClaimAsync($"w{i}", Lease, default))));
        var won = Assert.Single(claims, c => c is not null);
        Assert.Equal(first.Id, won!.Id);
        Assert.Equal(1, stores[2].CountByState()[JobState.Running]);
        Assert.Equal(1, stores[2].CountByState()[JobState.Queued]);
    }

    public void Dispose() => databases.ForEach(d => d.Dispose());

    private PostgresDatabase Instance()
    {
        var database = new PostgresDatabase(connectionString);
        databases.Add(database);
        return database;
    }

    private PostgresDatabase Initialized()
    {
        var database = Instance();
        database.Initialize();
        return database;
    }

    private List<IJobStore> Stores(int count, JobStoreOptions? options = null) =>
        Enumerable.Range(0, count).Select(_ => (IJobStore)new PostgresJobStore(Initialized(), TimeProvider.System, options)).ToList();

    private static JobRequest Request(int pr, string sha) =>
        new("bramblecote/sketches", "file:///nowhere.git", null, pr, sha.PadLeft(40, '0'), "main", null, null);
}
