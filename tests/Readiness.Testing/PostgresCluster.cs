using System.Diagnostics;
using Npgsql;

namespace Readiness.Testing;

/// <summary>
/// The PostgreSQL server the tests use: the one named by <c>READINESS_TEST_POSTGRES</c> (CI starts it with
/// <c>.ci/postgres</c>), else a throwaway cluster this fixture starts with the same script and stops on dispose.
/// Without either, creating it fails with the reason: PostgreSQL tests never skip silently.
/// </summary>
public sealed class PostgresCluster : IDisposable
{
    public const string Variable = "READINESS_TEST_POSTGRES";
    private readonly string? ownFolder;

    public PostgresCluster()
    {
        var given = Environment.GetEnvironmentVariable(Variable);
        if (!string.IsNullOrWhiteSpace(given))
        {
            ConnectionString = given;
            return;
        }

        // Short and fixed-depth: a Unix socket path may hold at most 107 bytes.
        ownFolder = Path.Combine("/tmp", "readiness-pg-" + Guid.NewGuid().ToString("N")[..10]);
        var started = Script("start", ownFolder);
        if (!started.Succeeded)
        {
            throw new InvalidOperationException(
                $"PostgreSQL tests need {Variable} (a connection string) or PostgreSQL's binaries to start a cluster: {started.Log.Trim()}");
        }

        ConnectionString = started.StdOut.Trim();
    }

    /// <summary>Connects to the server's maintenance database.</summary>
    public string ConnectionString { get; }

    /// <summary>A new, empty database on the server; returns its connection string.</summary>
    public string CreateDatabase()
    {
        var name = "readiness_test_" + Guid.NewGuid().ToString("N")[..12];
        using (var c = new NpgsqlConnection(ConnectionString))
        {
            c.Open();
            using var create = new NpgsqlCommand($"CREATE DATABASE {name}", c);
            create.ExecuteNonQuery();
        }

        return new NpgsqlConnectionStringBuilder(ConnectionString) { Database = name, Pooling = true }.ToString();
    }

    public void Dispose()
    {
        NpgsqlConnection.ClearAllPools();
        if (ownFolder is not null)
        {
            Script("stop", ownFolder);
        }
    }

    private static ProcessResult Script(string command, string folder)
    {
        var start = new ProcessStartInfo("bash", [Path.Combine(RepositoryRoot.Path, ".ci", "postgres"), command, folder])
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
        };
        using var process = Process.Start(start) ?? throw new InvalidOperationException("bash did not start");
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEnd();
        process.WaitForExit();
        return new ProcessResult(process.ExitCode, stdout.Result, stderr);
    }
}
