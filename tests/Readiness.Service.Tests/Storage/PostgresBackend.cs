using Readiness.Service.Storage;
using Readiness.Testing;

namespace Readiness.Service.Tests.Storage;

/// <summary>A new database on the tests' PostgreSQL server, migrated as the service does at start-up.</summary>
public sealed class PostgresBackend : IStoreBackend
{
    public PostgresBackend(PostgresCluster cluster)
    {
        ArgumentNullException.ThrowIfNull(cluster);
        ConnectionString = cluster.CreateDatabase();
        Database = new PostgresDatabase(ConnectionString);
        Database.Initialize();
    }

    private readonly List<PostgresDatabase> others = [];

    public string ConnectionString { get; }

    public PostgresDatabase Database { get; }

    public IJobStore Jobs(TimeProvider time, JobStoreOptions? options = null) => new PostgresJobStore(Database, time, options);

    public IRunStore Runs(TimeProvider time) => new PostgresRunStore(Database, time);

    public IForgeLimitStore Limits()
    {
        var other = new PostgresDatabase(ConnectionString);
        others.Add(other);
        return new PostgresForgeLimitStore(other);
    }

    public void Dispose()
    {
        Database.Dispose();
        others.ForEach(d => d.Dispose());
    }
}
