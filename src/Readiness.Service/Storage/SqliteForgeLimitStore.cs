namespace Readiness.Service.Storage;

/// <summary>Rate limits in the SQLite file (one process; kept across restarts).</summary>
public sealed class SqliteForgeLimitStore(SqliteDatabase database) : IForgeLimitStore
{
    public Task<DateTimeOffset?> BlockedUntilAsync(string scope, CancellationToken cancellationToken)
    {
        using var c = database.Open();
        using var q = c.CreateCommand();
        q.CommandText = ForgeLimitSql.Get;
        q.With("@scope", scope);
        return Task.FromResult(q.ExecuteScalar() is long ms ? DateTimeOffset.FromUnixTimeMilliseconds(ms) : (DateTimeOffset?)null);
    }

    public Task BlockAsync(string scope, DateTimeOffset until, CancellationToken cancellationToken) =>
        database.WriteAsync((c, t) =>
        {
            using var command = c.CreateCommand();
            command.Transaction = t;
            command.CommandText = ForgeLimitSql.Block;
            command.With("@scope", scope).With("@until", until.ToUnixTimeMilliseconds());
            return command.ExecuteNonQuery();
        }, cancellationToken);
}
