using Npgsql;

namespace Readiness.Service.Storage;

/// <summary>
/// A PostgreSQL database shared by any number of service instances. <see cref="Initialize"/> applies the missing
/// <see cref="PostgresMigrations"/> steps under a session advisory lock, so instances starting together migrate once.
/// </summary>
public sealed class PostgresDatabase : IDisposable
{
    /// <summary>The advisory lock key of the migrations ("READINES" in ASCII).</summary>
    public const long MigrationLock = 0x5245414449_4E4553;

    private readonly NpgsqlDataSource source;

    public PostgresDatabase(string connectionString)
    {
        ArgumentException.ThrowIfNullOrEmpty(connectionString);
        var builder = new NpgsqlConnectionStringBuilder(connectionString);
        if (!builder.ContainsKey("Timeout"))
        {
            builder.Timeout = 10;
        }

        source = NpgsqlDataSource.Create(builder);
    }

    /// <summary>The highest migration step this version knows.</summary>
    public static int SchemaVersion => PostgresMigrations.Steps[^1].Version;

    /// <summary>Applies the missing steps; returns how many this call applied (0 when another instance did them).</summary>
    public int Initialize()
    {
        using var c = Open();
        Execute(c, null, $"SELECT pg_advisory_lock({MigrationLock})");
        try
        {
            Execute(c, null, "CREATE TABLE IF NOT EXISTS schema_migrations(version INTEGER PRIMARY KEY, applied TIMESTAMPTZ NOT NULL DEFAULT now())");
            using var q = new NpgsqlCommand("SELECT COALESCE(MAX(version), 0) FROM schema_migrations", c);
            var current = (int)q.ExecuteScalar()!;
            var applied = 0;
            foreach (var (version, sql) in PostgresMigrations.Steps.Where(s => s.Version > current))
            {
                using var t = c.BeginTransaction();
                Execute(c, t, sql);
                Execute(c, t, $"INSERT INTO schema_migrations(version) VALUES ({version})");
                t.Commit();
                applied++;
            }

            return applied;
        }
        finally
        {
            Execute(c, null, $"SELECT pg_advisory_unlock({MigrationLock})");
        }
    }

    public NpgsqlConnection Open() => source.OpenConnection();

    public ValueTask<NpgsqlConnection> OpenAsync(CancellationToken cancellationToken) => source.OpenConnectionAsync(cancellationToken);

    public void Dispose() => source.Dispose();

    private static void Execute(NpgsqlConnection c, NpgsqlTransaction? t, string sql)
    {
        using var command = new NpgsqlCommand(sql, c, t);
        command.ExecuteNonQuery();
    }
}
