using Microsoft.Data.Sqlite;

namespace Readiness.Service.Storage;

/// <summary>
/// The service's SQLite file (WAL mode): deliveries seen, jobs, runs. Writes from this process go one at a time;
/// reads run beside them.
/// </summary>
public sealed class Database : IDisposable
{
    private const string Schema = """
        CREATE TABLE IF NOT EXISTS deliveries(
            id TEXT PRIMARY KEY,
            event TEXT NOT NULL,
            received INTEGER NOT NULL,
            job_id INTEGER);
        CREATE TABLE IF NOT EXISTS jobs(
            id INTEGER PRIMARY KEY AUTOINCREMENT,
            repository TEXT NOT NULL,
            clone_url TEXT NOT NULL,
            installation_id INTEGER,
            pr_number INTEGER NOT NULL,
            head_sha TEXT NOT NULL,
            base_ref TEXT NOT NULL,
            body TEXT,
            release_reason TEXT,
            delivery_id TEXT NOT NULL,
            deliveries INTEGER NOT NULL DEFAULT 1,
            state TEXT NOT NULL,
            lease_owner TEXT,
            lease_until INTEGER,
            attempts INTEGER NOT NULL DEFAULT 0,
            not_before INTEGER NOT NULL DEFAULT 0,
            error TEXT,
            run_id INTEGER,
            created INTEGER NOT NULL,
            updated INTEGER NOT NULL);
        CREATE INDEX IF NOT EXISTS jobs_pending ON jobs(state, id);
        CREATE INDEX IF NOT EXISTS jobs_pull_request ON jobs(repository, pr_number, state);
        CREATE TABLE IF NOT EXISTS runs(
            id INTEGER PRIMARY KEY AUTOINCREMENT,
            repository TEXT NOT NULL,
            pr_number INTEGER,
            commit_sha TEXT NOT NULL,
            ref TEXT,
            checklist TEXT,
            verdict TEXT NOT NULL,
            summary TEXT,
            source TEXT NOT NULL,
            job_id INTEGER UNIQUE,
            report_json TEXT,
            report_md TEXT,
            error TEXT,
            waivers_json TEXT,
            created INTEGER NOT NULL);
        CREATE INDEX IF NOT EXISTS runs_repository ON runs(repository, id);
        """;

    private readonly SemaphoreSlim writeGate = new(1, 1);
    private readonly string connectionString;

    public Database(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        Path = path;
        connectionString = new SqliteConnectionStringBuilder
        {
            DataSource = path,
            Mode = SqliteOpenMode.ReadWriteCreate,
            Pooling = true,
            DefaultTimeout = 30,
        }.ToString();
    }

    public string Path { get; }

    /// <summary>Creates the file and the tables when missing; turns on WAL.</summary>
    public void Initialize()
    {
        Directory.CreateDirectory(System.IO.Path.GetDirectoryName(Path)!);
        using var connection = Open();
        Execute(connection, "PRAGMA journal_mode=WAL;");
        Execute(connection, Schema);
    }

    /// <summary>An open connection for reading.</summary>
    public SqliteConnection Open()
    {
        var connection = new SqliteConnection(connectionString);
        connection.Open();
        Execute(connection, "PRAGMA synchronous=NORMAL; PRAGMA busy_timeout=30000;");
        return connection;
    }

    /// <summary>Runs <paramref name="work"/> in an immediate transaction, one writer of this process at a time.</summary>
    public async Task<T> WriteAsync<T>(Func<SqliteConnection, SqliteTransaction, T> work, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(work);
        await writeGate.WaitAsync(cancellationToken).ConfigureAwait(false);
        try
        {
            using var connection = Open();
            using var transaction = connection.BeginTransaction(deferred: false);
            var result = work(connection, transaction);
            transaction.Commit();
            return result;
        }
        finally
        {
            writeGate.Release();
        }
    }

    public void Dispose() => writeGate.Dispose();

    private static void Execute(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }
}
