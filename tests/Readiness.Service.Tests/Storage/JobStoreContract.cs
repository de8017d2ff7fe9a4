using Microsoft.Extensions.Time.Testing;
using Readiness.Service.Storage;

namespace Readiness.Service.Tests.Storage;

/// <summary>What every job store does; run against SQLite and PostgreSQL by the classes deriving from it.</summary>
public abstract class JobStoreContract : IDisposable
{
    private static readonly TimeSpan Lease = TimeSpan.FromSeconds(30);
    private readonly IStoreBackend backend;
    private readonly FakeTimeProvider time = new(new DateTimeOffset(2026, 11, 20, 12, 0, 0, TimeSpan.Zero));
    private readonly IJobStore jobs;

    protected JobStoreContract(IStoreBackend backend)
    {
        this.backend = backend;
        jobs = backend.Jobs(time);
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
    public async Task JobThatKillsEveryWorker_FailsAtTheAttemptLimit_WithAClearStatus()
    {
        var limited = backend.Jobs(time, new JobStoreOptions(MaxAttempts: 3));
        var queued = await limited.RecordDeliveryAsync("d-1", "pull_request", Request(1, "a"), default);
        for (var attempt = 1; attempt <= 3; attempt++)
        {
            var claimed = await limited.ClaimAsync($"worker-{attempt}", Lease, default);
            Assert.Equal(JobState.Running, claimed?.State);
            Assert.Equal(attempt, claimed?.Attempts);
            time.Advance(Lease + TimeSpan.FromSeconds(1)); // the worker died: nobody renews
        }

        var given = await limited.ClaimAsync("worker-4", Lease, default);
        Assert.Equal(queued.JobId, given?.Id);
        Assert.Equal(JobState.Failed, given?.State);
        Assert.Equal(3, given?.Attempts);
        Assert.Contains("lease ran out", given?.Error, StringComparison.Ordinal);
        Assert.Null(await limited.ClaimAsync("worker-5", Lease, default));
        Assert.Equal(JobState.Failed, limited.Find(queued.JobId!.Value)?.State);
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
        var quiet = backend.Jobs(time, new JobStoreOptions(TimeSpan.FromSeconds(2)));
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
    public async Task EventsThatNeverStop_StillRunOnceTheQuietCapPasses()
    {
        var quiet = backend.Jobs(time, new JobStoreOptions(TimeSpan.FromSeconds(2), MaxQuietPeriod: TimeSpan.FromSeconds(10)));
        for (var i = 0; i < 12; i++)
        {
            await quiet.RecordDeliveryAsync($"d-{i}", "pull_request", Request(1, i.ToString("x", System.Globalization.CultureInfo.InvariantCulture)), default);
            time.Advance(TimeSpan.FromSeconds(1));
        }

        // 12 s of events one second apart: without the cap the job would still wait; the cap ends 10 s after the first.
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
    public async Task FullRepositoryQueue_RefusesWithoutRecording_AndOtherRepositoriesStillQueue()
    {
        var bounded = backend.Jobs(time, new JobStoreOptions(MaxQueuedPerRepository: 2));
        Assert.Equal(EnqueueOutcome.Queued, (await bounded.RecordDeliveryAsync("d-1", "pull_request", Request(1, "a"), default)).Outcome);
        Assert.Equal(EnqueueOutcome.Queued, (await bounded.RecordDeliveryAsync("d-2", "pull_request", Request(2, "b"), default)).Outcome);
        Assert.Equal(EnqueueOutcome.QueueFull, (await bounded.RecordDeliveryAsync("d-3", "pull_request", Request(3, "c"), default)).Outcome);

        // An event for a pull request already queued still collapses; another repository has its own room.
        Assert.Equal(EnqueueOutcome.Collapsed, (await bounded.RecordDeliveryAsync("d-4", "pull_request", Request(1, "d"), default)).Outcome);
        Assert.Equal(EnqueueOutcome.Queued, (await bounded.RecordDeliveryAsync("d-5", "pull_request", Request(3, "e", repository: "bramblecote/lanternfly"), default)).Outcome);

        // The refused delivery was not remembered: its redelivery is taken once there is room.
        await bounded.ClaimAsync("w1", Lease, default);
        Assert.Equal(EnqueueOutcome.Queued, (await bounded.RecordDeliveryAsync("d-3", "pull_request", Request(3, "c"), default)).Outcome);
    }

    [Fact]
    public async Task BusyRepository_LeavesWorkersForOthers()
    {
        var fair = backend.Jobs(time, new JobStoreOptions(MaxRunningPerRepository: 2));
        for (var pr = 1; pr <= 5; pr++)
        {
            await fair.RecordDeliveryAsync($"busy-{pr}", "pull_request", Request(pr, "a"), default);
        }

        await fair.RecordDeliveryAsync("other-1", "pull_request", Request(1, "b", repository: "bramblecote/lanternfly"), default);
        var claimed = new List<Job>();
        while (await fair.ClaimAsync("w", Lease, default) is { } job)
        {
            claimed.Add(job);
        }

        Assert.Equal(2, claimed.Count(j => j.Request.Repository == "bramblecote/sketches"));
        Assert.Single(claimed, j => j.Request.Repository == "bramblecote/lanternfly");
    }

    [Fact]
    public async Task QueueStatus_GivesDepthAndTheOldestWaitingJobsAge()
    {
        Assert.Equal(new QueueStatus(0, 0, null), jobs.Status());
        await jobs.RecordDeliveryAsync("d-1", "pull_request", Request(1, "a"), default);
        time.Advance(TimeSpan.FromSeconds(40));
        await jobs.RecordDeliveryAsync("d-2", "pull_request", Request(2, "b"), default);
        await jobs.RecordDeliveryAsync("d-3", "pull_request", Request(3, "c"), default);
        time.Advance(TimeSpan.FromSeconds(2));
        await jobs.ClaimAsync("w1", Lease, default);
        Assert.Equal(new QueueStatus(2, 1, TimeSpan.FromSeconds(2)), jobs.Status());
    }

    [Fact]
    public async Task Prune_RemovesOldDeliveriesAndFinishedJobs_KeepsWaitingOnes()
    {
        await jobs.RecordDeliveryAsync("old-1", "pull_request", Request(1, "a"), default);
        var done = (await jobs.ClaimAsync("w1", Lease, default))!;
        await jobs.FinishAsync(done.Id, "w1", JobState.Done, null, null, default);
        await jobs.RecordDeliveryAsync("old-2", "pull_request", Request(2, "b"), default);
        time.Advance(TimeSpan.FromDays(31));
        await jobs.RecordDeliveryAsync("new-1", "push", null, default);

        Assert.Equal(3, await jobs.PruneAsync(TimeSpan.FromDays(30), default)); // two deliveries, one finished job
        Assert.Null(jobs.Find(done.Id));
        Assert.Equal(1, jobs.CountByState()[JobState.Queued]);
        Assert.Equal(EnqueueOutcome.Duplicate, (await jobs.RecordDeliveryAsync("new-1", "push", null, default)).Outcome);
    }

    [Fact]
    public async Task RateLimit_RecordedByOneInstance_IsSeenByAnother_AndALaterOneStays()
    {
        var one = backend.Limits();
        var other = backend.Limits();
        var until = time.GetUtcNow().AddMinutes(2);
        Assert.Null(await other.BlockedUntilAsync("installation:42", default));
        await one.BlockAsync("installation:42", until, default);
        await other.BlockAsync("installation:42", until.AddMinutes(-1), default);
        Assert.Equal(until, await other.BlockedUntilAsync("installation:42", default));
        Assert.Null(await one.BlockedUntilAsync("token", default));
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
        backend.Dispose();
        GC.SuppressFinalize(this);
    }

    protected static string Sha(string seed) => seed.PadLeft(40, '0');

    protected static JobRequest Request(int pr, string sha, string? body = null, string repository = "bramblecote/sketches") =>
        new(repository, "file:///nowhere.git", null, pr, Sha(sha), "main", body, null);
}
