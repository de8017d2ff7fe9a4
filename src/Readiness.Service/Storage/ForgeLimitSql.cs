namespace Readiness.Service.Storage;

/// <summary>The rate-limit table's statements, written once for both stores.</summary>
internal static class ForgeLimitSql
{
    public const string Get = "SELECT until FROM forge_limits WHERE scope = @scope";

    public const string Block = """
        INSERT INTO forge_limits(scope, until) VALUES (@scope, @until)
        ON CONFLICT(scope) DO UPDATE SET until = CASE WHEN excluded.until > forge_limits.until THEN excluded.until ELSE forge_limits.until END
        """;
}
