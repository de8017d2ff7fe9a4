using Npgsql;

namespace Readiness.Service.Storage;

/// <summary>Rate limits in PostgreSQL: what one instance was told, all instances honour.</summary>
public sealed class PostgresForgeLimitStore(PostgresDatabase database) : IForgeLimitStore
{
    public async Task<DateTimeOffset?> BlockedUntilAsync(string scope, CancellationToken cancellationToken)
    {
        await using var c = await database.OpenAsync(cancellationToken).ConfigureAwait(false);
        await using var q = new NpgsqlCommand(ForgeLimitSql.Get, c);
        q.With("@scope", scope);
        return await q.ExecuteScalarAsync(cancellationToken).ConfigureAwait(false) is long ms ? DateTimeOffset.FromUnixTimeMilliseconds(ms) : null;
    }

    public async Task BlockAsync(string scope, DateTimeOffset until, CancellationToken cancellationToken)
    {
        await using var c = await database.OpenAsync(cancellationToken).ConfigureAwait(false);
        await using var command = new NpgsqlCommand(ForgeLimitSql.Block, c);
        command.With("@scope", scope).With("@until", until.ToUnixTimeMilliseconds());
        await command.ExecuteNonQueryAsync(cancellationToken).ConfigureAwait(false);
    }
}
