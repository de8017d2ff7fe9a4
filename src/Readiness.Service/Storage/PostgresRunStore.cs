using Npgsql;

namespace Readiness.Service.Storage;

/// <summary>The history of runs in PostgreSQL.</summary>
public sealed class PostgresRunStore(PostgresDatabase database, TimeProvider time) : IRunStore
{
    public async Task<long> AddAsync(RunRecord run, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(run);
        var now = time.GetUtcNow().ToUnixTimeMilliseconds();
        await using var c = await database.OpenAsync(cancellationToken).ConfigureAwait(false);
        return RunSql.Add(sql => new NpgsqlCommand(sql, c), run, now);
    }

    public RunRecord? Find(long id)
    {
        using var c = database.Open();
        using var q = new NpgsqlCommand(RunSql.Find, c);
        q.With("@id", id);
        using var r = q.ExecuteReader();
        return r.Read() ? RunSql.Read(r) : null;
    }

    public IReadOnlyList<RunRecord> RecentByRepository(int perRepository)
    {
        using var c = database.Open();
        using var q = new NpgsqlCommand(RunSql.Recent, c);
        q.With("@n", (long)perRepository);
        using var r = q.ExecuteReader();
        return RunSql.ReadAll(r);
    }

    public long Count()
    {
        using var c = database.Open();
        using var q = new NpgsqlCommand(RunSql.Count, c);
        return (long)q.ExecuteScalar()!;
    }
}
