using Microsoft.Data.Sqlite;

namespace Readiness.Service.Storage;

/// <summary>The history of runs in the SQLite file.</summary>
public sealed class SqliteRunStore(SqliteDatabase database, TimeProvider time) : IRunStore
{
    public Task<long> AddAsync(RunRecord run, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(run);
        var now = time.GetUtcNow().ToUnixTimeMilliseconds();
        return database.WriteAsync((c, t) => RunSql.Add(sql => Command(c, t, sql), run, now), cancellationToken);
    }

    public RunRecord? Find(long id)
    {
        using var c = database.Open();
        using var q = Command(c, null, RunSql.Find).With("@id", id);
        using var r = q.ExecuteReader();
        return r.Read() ? RunSql.Read(r) : null;
    }

    public IReadOnlyList<RunRecord> RecentByRepository(int perRepository)
    {
        using var c = database.Open();
        using var q = Command(c, null, RunSql.Recent).With("@n", perRepository);
        using var r = q.ExecuteReader();
        return RunSql.ReadAll(r);
    }

    public long Count()
    {
        using var c = database.Open();
        using var q = Command(c, null, RunSql.Count);
        return (long)q.ExecuteScalar()!;
    }

    private static SqliteCommand Command(SqliteConnection c, SqliteTransaction? t, string sql)
    {
        var command = c.CreateCommand();
        command.Transaction = t;
        command.CommandText = sql;
        return command;
    }
}
