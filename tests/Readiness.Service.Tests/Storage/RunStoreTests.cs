using Microsoft.Extensions.Time.Testing;
using Readiness.Service.Storage;
using Readiness.Testing;

namespace Readiness.Service.Tests.Storage;

public sealed class RunStoreTests : IDisposable
{
    private readonly TempDirectory folder = new("readiness-runs-");
    private readonly FakeTimeProvider time = new(new DateTimeOffset(2026, 11, 20, 12, 0, 0, TimeSpan.Zero));
    private readonly Database database;
    private readonly RunStore runs;

    public RunStoreTests()
    {
        database = new Database(folder.Combine("readiness.db"));
        database.Initialize();
        runs = new RunStore(database, time);
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
        Assert.Equal(new Waiver("signing.tag", "key ceremony next week"), Assert.Single(run.Waivers));
        Assert.Equal(time.GetUtcNow(), run.Created);
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
        database.Dispose();
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        folder.Dispose();
    }

    private static RunRecord Run(string repository, long? jobId = null, IReadOnlyList<Waiver>? waivers = null) =>
        new(0, repository, 1, new string('a', 40), "pull/1", "library", RunRecord.Ready, "0 blocking", RunRecord.FromService, jobId, "{}", "md", null, waivers ?? [], default);
}
