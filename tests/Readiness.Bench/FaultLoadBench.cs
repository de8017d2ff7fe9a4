using System.Globalization;
using Readiness.Service.Storage;
using Readiness.Testing;
using Readiness.Testing.FaultLoad;

namespace Readiness.Bench;

/// <summary>
/// The fault-and-load harness at full size: arguments [store=postgres|sqlite] [deliveries=500] [senders=32]
/// [instances=3 (1 for sqlite)] [kills=20] [redeliveries=100]. PostgreSQL comes from READINESS_TEST_POSTGRES, else a
/// throwaway cluster is started (.ci/postgres).
/// </summary>
public sealed class FaultLoadBench : IBench
{
    public string Name => "fault-load";

    public string Description => "3 instances on one PostgreSQL (or 1 on SQLite), 500 deliveries at 32 senders, 20 kill -9 cycles, 100 redeliveries, forge faults";

    public async Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        var store = args.Length > 0 ? args[0] : "postgres";
        var postgres = store != "sqlite";
        var deliveries = Arg(args, 1, 500);
        var senders = Arg(args, 2, 32);
        var instances = Arg(args, 3, postgres ? 3 : 1);
        var kills = Arg(args, 4, 20);
        var redeliveries = Arg(args, 5, 100);
        var dll = Path.Combine(AppContext.BaseDirectory, "Readiness.Service.dll");

        FaultLoadResult result;
        if (postgres)
        {
            using var cluster = new PostgresCluster();
            var connection = cluster.CreateDatabase();
            using var database = new PostgresDatabase(connection);
            var jobs = new PostgresJobStore(database, TimeProvider.System);
            result = await FaultLoadHarness.RunAsync(
                new FaultLoadOptions(dll, new Dictionary<string, string> { ["Readiness__PostgresConnection"] = connection }, false, () => jobs.CountByState(),
                    instances, deliveries, senders, Kills: kills, Redeliveries: redeliveries),
                cancellationToken);
        }
        else
        {
            using var data = new TempDirectory("readiness-bench-sqlite-");
            using var database = new SqliteDatabase(data.Combine("readiness.db"));
            var jobs = new SqliteJobStore(database, TimeProvider.System);
            result = await FaultLoadHarness.RunAsync(
                new FaultLoadOptions(dll, new Dictionary<string, string> { [FaultLoadHarness.DataFolderVariable] = data.Path }, true,
                    () => File.Exists(database.Path) ? jobs.CountByState() : new Dictionary<string, long>(),
                    instances, deliveries, senders, Kills: kills, Redeliveries: redeliveries),
                cancellationToken);
            Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        }

        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"store                {(postgres ? "PostgreSQL" : "SQLite")}, {instances} instance(s)"));
        Console.WriteLine(result.Describe());
    }

    private static int Arg(string[] args, int index, int fallback) =>
        args.Length > index && int.TryParse(args[index], NumberStyles.Integer, CultureInfo.InvariantCulture, out var v) && v > 0 ? v : fallback;
}
