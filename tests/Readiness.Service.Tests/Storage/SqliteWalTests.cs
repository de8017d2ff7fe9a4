using Readiness.Service.Storage;
using Readiness.Testing;

namespace Readiness.Service.Tests.Storage;

public sealed class SqliteWalTests : IDisposable
{
    private readonly TempDirectory folder = new("readiness-wal-");

    [Fact]
    public async Task WriteAheadLog_StaysBoundedUnderSustainedWrites_WithReadersBeside()
    {
        // SQLite's documentation (wal.html, "Avoiding Excessively Large WAL Files"): passive checkpoints alone let the
        // log grow while readers hold it; a TRUNCATE checkpoint resets it to zero bytes.
        const long Limit = 256 * 1024;
        using var database = new SqliteDatabase(folder.Combine("readiness.db"), Limit, TimeSpan.FromMilliseconds(50));
        database.Initialize();
        var jobs = new SqliteJobStore(database, TimeProvider.System, new JobStoreOptions(MaxQueuedPerRepository: 10_000));
        using var stop = new CancellationTokenSource();
        var readers = Enumerable.Range(0, 2).Select(_ => Task.Run(async () =>
        {
            while (!stop.IsCancellationRequested)
            {
                jobs.CountByState();
                await Task.Delay(1);
            }
        })).ToArray();

        var body = new string('x', 2000);
        for (var i = 0; i < 3000; i++)
        {
            await jobs.RecordDeliveryAsync($"d-{i}", "pull_request", new JobRequest("bramblecote/sketches", "file:///x.git", null, i + 1, new string('a', 40), "main", body, null), default);
        }

        await stop.CancelAsync();
        await Task.WhenAll(readers);

        // About 6 MB went through the log; a checkpoint tick later it is back under the limit.
        var until = DateTime.UtcNow.AddSeconds(20);
        while (database.WalBytes > Limit && DateTime.UtcNow < until)
        {
            await Task.Delay(50);
        }

        Assert.InRange(database.WalBytes, 0, Limit);
        Assert.Equal(3000, jobs.CountByState()[JobState.Queued]);
    }

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        folder.Dispose();
    }
}
