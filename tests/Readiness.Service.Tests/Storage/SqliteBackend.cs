using Readiness.Service.Storage;
using Readiness.Testing;

namespace Readiness.Service.Tests.Storage;

/// <summary>A real SQLite file in a temporary folder.</summary>
public sealed class SqliteBackend : IStoreBackend
{
    private readonly TempDirectory folder = new("readiness-store-");

    public SqliteBackend()
    {
        Database = new SqliteDatabase(folder.Combine("readiness.db"));
        Database.Initialize();
    }

    public SqliteDatabase Database { get; }

    public IJobStore Jobs(TimeProvider time, JobStoreOptions? options = null) => new SqliteJobStore(Database, time, options);

    public IRunStore Runs(TimeProvider time) => new SqliteRunStore(Database, time);

    public IForgeLimitStore Limits() => new SqliteForgeLimitStore(Database);

    public void Dispose()
    {
        Database.Dispose();
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        folder.Dispose();
    }
}
