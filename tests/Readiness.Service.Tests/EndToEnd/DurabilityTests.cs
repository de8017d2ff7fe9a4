using Readiness.Service.Storage;

using Readiness.Testing;

namespace Readiness.Service.Tests.EndToEnd;

public sealed class DurabilityTests : ServiceTestBase
{
    [Fact]
    public async Task HostStoppedWhileAJobIsLeased_StartedAgain_TheJobCompletesExactlyOnce()
    {
        var head = Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch);
        var (reached, release) = Forge.Hold("GET", "/issues/1/comments$");
        await Host.DeliverAsync(Repo.Payload("opened", 1, head), "delivery-1");
        await reached.WaitAsync(TimeSpan.FromSeconds(30));
        Assert.Equal(1, Host.Jobs.CountByState()[JobState.Running]);

        await Host.DisposeAsync();
        release();

        var second = StartHost();
        await second.WaitForIdleAsync();
        Assert.Single(Forge.AllComments());
        Assert.Single(Forge.Statuses());
        Assert.Equal(1, second.Runs.Count());
        var job = second.Jobs.Find(1)!;
        Assert.Equal(JobState.Done, job.State);
        Assert.Equal(2, job.Attempts);
    }

    [Fact]
    public async Task LeaseOfAProcessThatDied_RunsOut_AndTheJobIsDoneByTheNextOne()
    {
        var head = Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch);
        await Host.DisposeAsync();

        // What a killed process leaves behind: a job claimed with a lease nobody renews.
        using (var database = new SqliteDatabase(Path.Combine(Data.Path, "readiness.db")))
        {
            database.Initialize();
            var jobs = new SqliteJobStore(database, TimeProvider.System);
            await jobs.RecordDeliveryAsync("delivery-1", "pull_request",
                new JobRequest(ReleasePullRequestRepository.FullName, Repo.CloneUrl, null, 1, head, ReleasePullRequestRepository.ReleaseBranch, null, "release branch"), default);
            Assert.NotNull(await jobs.ClaimAsync("killed-process", TimeSpan.FromSeconds(2), default));
        }

        var next = StartHost();
        await Task.Delay(500);
        Assert.Equal(1, next.Jobs.CountByState()[JobState.Running]);
        Assert.Empty(Forge.AllComments());
        await next.WaitForIdleAsync();
        Assert.Single(Forge.AllComments());
        Assert.Equal(1, next.Runs.Count());
        Assert.Equal(2, next.Jobs.Find(1)!.Attempts);
    }

    [Fact]
    public async Task ForgeDownForEveryRetry_JobIsRetriedLater_ThenDone()
    {
        // 1 try + 3 retries fail inside one attempt; the job goes back to the queue and the next attempt succeeds.
        Forge.FailNext("GET", "/issues/1/comments$", 503, times: 4);
        await Host.DeliverAsync(Repo.Payload("opened", 1, Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch)), "delivery-1");
        await Host.WaitForIdleAsync();
        var job = Host.Jobs.Find(1)!;
        Assert.Equal(JobState.Done, job.State);
        Assert.Equal(2, job.Attempts);
        Assert.Single(Forge.AllComments());
        Assert.Equal(1, Host.Runs.Count());
    }
}
