using Readiness.Service.Storage;
using Readiness.Service.Tests.Storage;
using Readiness.Testing;
using Readiness.Testing.FaultLoad;
using Xunit.Abstractions;

namespace Readiness.Service.Tests.EndToEnd;

/// <summary>
/// The fault-and-load harness at a small size (the full size runs from tests/Readiness.Bench: <c>fault-load</c>):
/// real service processes killed with SIGKILL while they work, redeliveries and forge faults, on both stores.
/// </summary>
[Collection(PostgresCollection.Name)]
public sealed class FaultLoadTests(PostgresCluster cluster, ITestOutputHelper output)
{
    private static string ServiceDll => Path.Combine(AppContext.BaseDirectory, "Readiness.Service.dll");

    [Fact]
    public async Task TwoInstancesOnPostgres_KilledWhileWorking_LoseAndDuplicateNothing()
    {
        var connection = cluster.CreateDatabase();
        using var database = new PostgresDatabase(connection);
        var jobs = new PostgresJobStore(database, TimeProvider.System);
        var result = await FaultLoadHarness.RunAsync(
            new FaultLoadOptions(
                ServiceDll,
                new Dictionary<string, string> { ["Readiness__PostgresConnection"] = connection },
                SharedDataFolder: false,
                JobsByState: () => jobs.CountByState(),
                Instances: 2,
                Deliveries: 60,
                Senders: 8,
                PullRequests: 6,
                Kills: 3,
                Redeliveries: 20,
                KillEvery: TimeSpan.FromSeconds(2)),
            CancellationToken.None);
        output.WriteLine(result.Describe());
        Assert.True(result.Sound, result.Describe());
        Assert.Equal(3, result.Kills);
    }

    [Fact]
    public async Task OneInstanceOnSqlite_KilledWhileWorking_LosesAndDuplicatesNothing()
    {
        using var data = new TempDirectory("readiness-fault-sqlite-");
        using var database = new SqliteDatabase(data.Combine("readiness.db"));
        var jobs = new SqliteJobStore(database, TimeProvider.System);
        var result = await FaultLoadHarness.RunAsync(
            new FaultLoadOptions(
                ServiceDll,
                new Dictionary<string, string> { [FaultLoadHarness.DataFolderVariable] = data.Path },
                SharedDataFolder: true,
                JobsByState: () => File.Exists(database.Path) ? jobs.CountByState() : new Dictionary<string, long>(),
                Instances: 1,
                Deliveries: 40,
                Senders: 8,
                PullRequests: 4,
                Kills: 2,
                Redeliveries: 10,
                KillEvery: TimeSpan.FromSeconds(2)),
            CancellationToken.None);
        output.WriteLine(result.Describe());
        Assert.True(result.Sound, result.Describe());
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
    }
}
