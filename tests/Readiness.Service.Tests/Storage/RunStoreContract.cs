using Microsoft.Extensions.Time.Testing;
using Readiness.Service.Storage;

namespace Readiness.Service.Tests.Storage;

/// <summary>What every run store does; run against SQLite and PostgreSQL by the classes deriving from it.</summary>
public abstract class RunStoreContract : IDisposable
{
    private readonly IStoreBackend backend;
    private readonly FakeTimeProvider time = new(new DateTimeOffset(2026, 11, 20, 12, 0, 0, TimeSpan.Zero));
    private readonly IRunStore runs;

    protected RunStoreContract(IStoreBackend backend)
    {
        this.backend = backend;
        runs = backend.Runs(time);
    }

    [Fact]
    public async Task SecondRunForTheSameJob_ReturnsTheFirst()
    {
        var a = await runs.AddAsync(Run("bramblecote/sketches", jobId: 3), default);
        var b = await runs.AddAsync(Run("bramblecote/sketches", jobId: 3), default);
        Assert.Equal(a, b);
        Assert.Equal(1, runs.Count());
    }

    [Fact]
    public async Task StoredRun_ReadsBackWithWaivers()
    {
        var id = await runs.AddAsync(Run("bramblecote/sketches", waivers: [new Waiver("signing.tag", "key ceremony next week")]), default);
        var run = runs.Find(id)!;
        Assert.Equal("bramblecote/sketches", run.Repository);
        Assert.Equal("{}", run.ReportJson);
        Assert.Equal("md", run.ReportMarkdown);
        Assert.Equal(1, run.PullRequest);
        Assert.Equal(new Waiver("signing.tag", "key ceremony next week"), Assert.Single(run.Waivers));
        Assert.Equal(time.GetUtcNow(), run.Created);
        Assert.Null(runs.Find(id + 1000));
    }

    [Fact]
    public async Task HookRunsWithoutAJob_AreAllKept()
    {
        var a = await runs.AddAsync(Run("bramblecote/sketches", source: RunRecord.FromHook), default);
        var b = await runs.AddAsync(Run("bramblecote/sketches", source: RunRecord.FromHook), default);
        Assert.NotEqual(a, b);
        Assert.Null(runs.Find(b)!.JobId);
        Assert.Empty(runs.Find(b)!.Waivers);
    }

    [Fact]
    public async Task Recent_KeepsTheNewestPerRepository()
    {
        for (var i = 0; i < 5; i++)
        {
            await runs.AddAsync(Run("bramblecote/sketches"), default);
            await runs.AddAsync(Run("bramblecote/lanternfly"), default);
        }

        var recent = runs.RecentByRepository(3);
        Assert.Equal(6, recent.Count);
        Assert.Equal(["bramblecote/lanternfly", "bramblecote/sketches"], recent.Select(r => r.Repository).Distinct());
        Assert.Equal(recent.Where(r => r.Repository == "bramblecote/sketches").Select(r => r.Id).OrderDescending(), recent.Where(r => r.Repository == "bramblecote/sketches").Select(r => r.Id));
        Assert.All(recent, r => Assert.Null(r.ReportJson));
    }

    public void Dispose()
    {
        backend.Dispose();
        GC.SuppressFinalize(this);
    }

    private static RunRecord Run(string repository, long? jobId = null, IReadOnlyList<Waiver>? waivers = null, string source = RunRecord.FromService) =>
        new(0, repository, 1, new string('a', 40), "pull/1", "library", RunRecord.Ready, "0 blocking", source, jobId, "{}", "md", null, waivers ?? [], default);
}
