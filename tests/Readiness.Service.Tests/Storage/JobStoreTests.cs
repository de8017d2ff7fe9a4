using Microsoft.Extensions.Time.Testing;
using Readiness.Service.Storage;
using Readiness.Testing;

namespace Readiness.Service.Tests.Storage;

public sealed class JobStoreTests : IDisposable
{
    private static readonly TimeSpan Lease = TimeSpan.FromSeconds(30);
    private readonly TempDirectory folder = new("readiness-jobs-");
    private readonly FakeTimeProvider time = new(new DateTimeOffset(2026, 11, 20, 12, 0, 0, TimeSpan.Zero));
    private readonly Database database;
    private readonly JobStore jobs;

    public JobStoreTests()
    {
        database = new Database(folder.Combine("readiness.db"));
        database.Initialize();
        jobs = new JobStore(database, time);
    }

    [Fact]
    public async Task SameDeliveryTwice_IsRecordedOnce()
    {
        var first = await jobs.RecordDeliveryAsync("d-1", "pull_request", Request(1, "a"), default);
        var second = await jobs.RecordDeliveryAsync("d-1", "pull_request", Request(1, "b"), default);
        Assert.Equal(EnqueueOutcome.Queued, first.Outcome);
        Assert.Equal(EnqueueOutcome.Duplicate, second.Outcome);
        var job = Assert.IsType<Job>(jobs.Find(first.JobId!.Value));
        Assert.Equal(Sha("a"), job.Request.HeadSha);
        Assert.Equal(1, jobs.CountByState()[JobState.Queued]);
    }

    [Fact]
    public async Task TwoEventsForOnePullRequest_CollapseToTheNewestHead()
    {
        var first = await jobs.RecordDeliveryAsync("d-1", "pull_request", Request(1, "a"), default);
        var second = await jobs.RecordDeliveryAsync("d-2", "pull_request", Request(1, "b", body: "edited"), default);
        var other = await jobs.RecordDeliveryAsync("d-3", "pull_request", Request(2, "c"), default);
        Assert.Equal(EnqueueOutcome.Collapsed, second.Outcome);
        Assert.Equal(first.JobId, second.JobId);
        Assert.NotEqual(first.JobId, other.JobId);
        var job = jobs.Find(first.JobId!.Value)!;
        Assert.Equal(Sha("b"), job.Request.HeadSha);
        Assert.Equal("edited", job.Request.Body);
        Assert.Equal(2, job.Deliveries);
    }

    [Fact]
    public async Task EventWhileAJobRuns_QueuesANewJob_ThatWaitsForTheRunningOne()
    {
        await jobs.RecordDeliveryAsync("d-1", "pull_request", Request(1, "a"), default);
        var running = await jobs.ClaimAsync("w1", Lease, default);
        Assert.NotNull(running);
        var newer = await jobs.RecordDeliveryAsync("d-2", "pull_request", Request(1, "b"), default);
        Assert.Equal(EnqueueOutcome.Queued, newer.Outcome);
        Assert.True(jobs.HasNewer(running));

        // Never two jobs of one pull request at once.
        Assert.Null(await jobs.ClaimAsync("w2", Lease, default));
        Assert.True(await jobs.FinishAsync(running.Id, "w1", JobState.Done, null, null, default));
        var next = await jobs.ClaimAsync("w2", Lease, default);
        Assert.Equal(newer.JobId, next?.Id);
        Assert.Equal(Sha("b"), next?.Request.HeadSha);
    }

    [Fact]
    public async Task LeaseRunsOut_AnotherWorkerClaimsTheJob_AndTheFirstCannotFinishIt()
    {
        var queued = await jobs.RecordDeliveryAsync("d-1", "pull_request", Request(1, "a"), default);
        var first = await jobs.ClaimAsync("dead-worker", Lease, default);
        Assert.Equal(queued.JobId, first?.Id);
        Assert.Null(await jobs.ClaimAsync("w2", Lease, default));

        time.Advance(Lease + TimeSpan.FromMilliseconds(1));
        var again = await jobs.ClaimAsync("w2", Lease, default);
        Assert.Equal(queued.JobId, again?.Id);
        Assert.Equal(2, again?.Attempts);
        Assert.False(await jobs.FinishAsync(queued.JobId!.Value, "dead-worker", JobState.Done, null, null, default));
        Assert.False(await jobs.RenewAsync(queued.JobId!.Value, "dead-worker", Lease, default));
        Assert.True(await jobs.FinishAsync(queued.JobId!.Value, "w2", JobState.Done, 5, null, default));
        Assert.Equal(JobState.Done, jobs.Find(queued.JobId!.Value)?.State);
        Assert.Equal(5, jobs.Find(queued.JobId!.Value)?.RunId);
    }

    [Fact]
    public async Task RenewedLease_KeepsTheJob()
    {
        await jobs.RecordDeliveryAsync("d-1", "pull_request", Request(1, "a"), default);
        var job = (await jobs.ClaimAsync("w1", Lease, default))!;
        time.Advance(Lease / 2);
        Assert.True(await jobs.RenewAsync(job.Id, "w1", Lease, default));
        time.Advance(Lease / 2 + TimeSpan.FromSeconds(1));
        Assert.Null(await jobs.ClaimAsync("w2", Lease, default));
    }

    [Fact]
    public async Task RequeuedJob_WaitsForItsDelay()
    {
        await jobs.RecordDeliveryAsync("d-1", "pull_request", Request(1, "a"), default);
        var job = (await jobs.ClaimAsync("w1", Lease, default))!;
        Assert.True(await jobs.RequeueAsync(job.Id, "w1", TimeSpan.FromSeconds(10), "forge down", default));
        Assert.Null(await jobs.ClaimAsync("w1", Lease, default));
        time.Advance(TimeSpan.FromSeconds(10));
        Assert.Equal(job.Id, (await jobs.ClaimAsync("w1", Lease, default))?.Id);
    }

    [Fact]
    public async Task QuietPeriod_DelaysTheJobUntilEventsStop()
    {
        var quiet = new JobStore(database, time, TimeSpan.FromSeconds(2));
        await quiet.RecordDeliveryAsync("d-1", "pull_request", Request(1, "a"), default);
        time.Advance(TimeSpan.FromSeconds(1.5));
        await quiet.RecordDeliveryAsync("d-2", "pull_request", Request(1, "b"), default);
        time.Advance(TimeSpan.FromSeconds(1.5));
        Assert.Null(await quiet.ClaimAsync("w1", Lease, default));
        Assert.Equal(time.GetUtcNow() + TimeSpan.FromSeconds(0.5), quiet.NextDue());
        time.Advance(TimeSpan.FromSeconds(0.5));
        var job = await quiet.ClaimAsync("w1", Lease, default);
        Assert.Equal(Sha("b"), job?.Request.HeadSha);
    }

    [Fact]
    public async Task IgnoredEvent_IsRememberedButQueuesNothing()
    {
        var first = await jobs.RecordDeliveryAsync("d-9", "push", null, default);
        var again = await jobs.RecordDeliveryAsync("d-9", "push", null, default);
        Assert.Equal(EnqueueOutcome.Ignored, first.Outcome);
        Assert.Equal(EnqueueOutcome.Duplicate, again.Outcome);
        Assert.Empty(jobs.CountByState());
    }

    [Fact]
    public async Task ManyConcurrentDeliveries_EachRecordedOnce()
    {
        // 200 deliveries, each sent twice at the same time, for 10 pull requests.
        var tasks = Enumerable.Range(0, 400).Select(i => Task.Run(() =>
            jobs.RecordDeliveryAsync($"d-{i % 200}", "pull_request", Request((i % 200) % 10 + 1, (i % 200).ToString("x", System.Globalization.CultureInfo.InvariantCulture)), default)));
        var results = await Task.WhenAll(tasks);
        Assert.Equal(200, results.Count(r => r.Outcome == EnqueueOutcome.Duplicate));
        Assert.Equal(10, results.Count(r => r.Outcome == EnqueueOutcome.Queued));
        Assert.Equal(190, results.Count(r => r.Outcome == EnqueueOutcome.Collapsed));
        Assert.Equal(10, jobs.CountByState()[JobState.Queued]);
    }

    public void Dispose()
    {
        database.Dispose();
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        folder.Dispose();
    }

    private static string Sha(string seed) => seed.PadLeft(40, '0');

    private static JobRequest Request(int pr, string sha, string? body = null) =>
        new("bramblecote/sketches", "file:///nowhere.git", null, pr, Sha(sha), "main", body, null);
}
