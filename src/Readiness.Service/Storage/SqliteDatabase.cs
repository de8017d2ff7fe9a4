using System.Threading.Channels;
using Microsoft.Data.Sqlite;

namespace Readiness.Service.Storage;

/// <summary>
/// The service's SQLite file (WAL mode): deliveries seen, jobs, runs. Writes go through one writer thread in
/// batched transactions; reads run beside them on their own connections.
/// </summary>
public sealed class SqliteDatabase : IDisposable
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
        CREATE TABLE IF NOT EXISTS forge_limits(scope TEXT PRIMARY KEY, until INTEGER NOT NULL);
        """;

    /// <summary>The write-ahead log is truncated when a checkpoint finds it larger than this.</summary>
    public const long DefaultWalLimitBytes = 64L * 1024 * 1024;

    private const int MaxBatch = 128;
    private readonly TimeSpan checkpointEvery;
    private readonly long walLimitBytes;
    private int checkpointing;
    private readonly Channel<IWrite> writes = Channel.CreateUnbounded<IWrite>(new UnboundedChannelOptions { SingleReader = true });
    private readonly string connectionString;
    private readonly Lock gate = new();
    private Thread? writer;
    private Timer? checkpoints;

    public SqliteDatabase(string path, long walLimitBytes = DefaultWalLimitBytes, TimeSpan? checkpointEvery = null)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        Path = path;
        this.walLimitBytes = walLimitBytes;
        this.checkpointEvery = checkpointEvery ?? TimeSpan.FromSeconds(2);
        connectionString = new SqliteConnectionStringBuilder
        {
            DataSource = path,
            Mode = SqliteOpenMode.ReadWriteCreate,
            Pooling = true,
            DefaultTimeout = 30,
        }.ToString();
    }

    private interface IWrite
    {
        /// <summary>Runs inside the batch's transaction; keeps its result until the commit.</summary>
        void Run(SqliteConnection connection, SqliteTransaction transaction);

        void Committed();

        void Failed(Exception error);
    }

    public string Path { get; }

    /// <summary>The write-ahead log's size now (0 when there is none).</summary>
    public long WalBytes => File.Exists(Path + "-wal") ? new FileInfo(Path + "-wal").Length : 0;

    /// <summary>Creates the file and the tables when missing; turns on WAL.</summary>
    public void Initialize()
    {
        Directory.CreateDirectory(System.IO.Path.GetDirectoryName(Path)!);
        using var connection = Open();
        Execute(connection, "PRAGMA journal_mode=WAL;");
        Execute(connection, $"PRAGMA journal_size_limit={walLimitBytes};");
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

    /// <summary>
    /// Runs <paramref name="work"/> in a write transaction. One writer thread takes every write queued meanwhile into
    /// the same transaction (group commit, each write in its own savepoint), so concurrent webhook deliveries share
    /// one commit instead of queueing for one each. The task completes once the transaction is committed.
    /// </summary>
    public Task<T> WriteAsync<T>(Func<SqliteConnection, SqliteTransaction, T> work, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(work);
        cancellationToken.ThrowIfCancellationRequested();
        EnsureWriter();
        var write = new Write<T>(work);
        if (!writes.Writer.TryWrite(write))
        {
            throw new ObjectDisposedException(nameof(SqliteDatabase));
        }

        return write.Task;
    }

    public void Dispose()
    {
        writes.Writer.TryComplete();
        writer?.Join(TimeSpan.FromSeconds(30));
        checkpoints?.Dispose();
        if (writer is not null)
        {
            Checkpoint();
        }
    }

    private static void Execute(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }

    private void EnsureWriter()
    {
        if (writer is not null)
        {
            return;
        }

        lock (gate)
        {
            writer ??= StartWriter();
        }
    }

    private Thread StartWriter()
    {
        var thread = new Thread(WriteLoop) { IsBackground = true, Name = "readiness-db-writer" };
        thread.Start();
        checkpoints = new Timer(_ => Checkpoint(), null, checkpointEvery, checkpointEvery);
        return thread;
    }

    /// <summary>
    /// Copies the write-ahead log into the database file beside the writer (a passive checkpoint waits for no one),
    /// so the writer itself never stops for the file system's flush. A passive checkpoint never shrinks the log, and
    /// under steady load readers keep it from starting over: when the log has grown past the limit, a truncating
    /// checkpoint waits for the readers of the moment and empties it (SQLite's wal_checkpoint(TRUNCATE)).
    /// </summary>
    private void Checkpoint()
    {
        if (Interlocked.Exchange(ref checkpointing, 1) == 1)
        {
            return; // the previous tick still waits for its readers
        }

        try
        {
            using var connection = Open();
            Execute(connection, "PRAGMA wal_checkpoint(PASSIVE);");
            if (WalBytes > walLimitBytes)
            {
                Execute(connection, "PRAGMA wal_checkpoint(TRUNCATE);");
            }
        }
        catch (SqliteException)
        {
            // The next tick tries again.
        }
        finally
        {
            Volatile.Write(ref checkpointing, 0);
        }
    }

    private SqliteConnection OpenWriter()
    {
        var connection = Open();
        Execute(connection, "PRAGMA wal_autocheckpoint=0;");
        return connection;
    }

    private void WriteLoop()
    {
        var batch = new List<IWrite>(MaxBatch);
        SqliteConnection? connection = null;
        try
        {
            while (writes.Reader.WaitToReadAsync().AsTask().GetAwaiter().GetResult())
            {
                batch.Clear();
                while (batch.Count < MaxBatch && writes.Reader.TryRead(out var next))
                {
                    batch.Add(next);
                }

                connection ??= OpenWriter();
                try
                {
                    using var transaction = connection.BeginTransaction(deferred: false);
                    var done = new List<IWrite>(batch.Count);
                    foreach (var write in batch)
                    {
                        Execute(connection, transaction, "SAVEPOINT w");
                        try
                        {
                            write.Run(connection, transaction);
                            Execute(connection, transaction, "RELEASE w");
                            done.Add(write);
                        }
#pragma warning disable CA1031 // one failing write must not fail the others in its batch
                        catch (Exception e)
#pragma warning restore CA1031
                        {
                            Execute(connection, transaction, "ROLLBACK TO w; RELEASE w");
                            write.Failed(e);
                        }
                    }

                    transaction.Commit();
                    done.ForEach(w => w.Committed());
                }
                catch (SqliteException e)
                {
                    batch.ForEach(w => w.Failed(e));
                    connection.Dispose();
                    connection = null;
                }
            }
        }
        finally
        {
            connection?.Dispose();
        }
    }

    private static void Execute(SqliteConnection connection, SqliteTransaction transaction, string sql)
    {
        using var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }

    private sealed class Write<T>(Func<SqliteConnection, SqliteTransaction, T> work) : IWrite
    {
        private readonly TaskCompletionSource<T> completion = new(TaskCreationOptions.RunContinuationsAsynchronously);
        private T? result;

        public Task<T> Task => completion.Task;

        public void Run(SqliteConnection connection, SqliteTransaction transaction) => result = work(connection, transaction);

        public void Committed() => completion.TrySetResult(result!);

        public void Failed(Exception error) => completion.TrySetException(error);
    }
}
