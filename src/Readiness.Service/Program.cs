using System.Net.Sockets;
using Readiness.Service.Configuration;
using Readiness.Service.Storage;

namespace Readiness.Service;

/// <summary>
/// <c>dotnet run --project src/Readiness.Service</c>: listens on http://127.0.0.1:5080 unless told otherwise.
/// <c>... -- import-sqlite FILE</c> copies a SQLite database into the configured PostgreSQL one.
/// Exit codes: 0 stopped normally; 2 a setting is missing or wrong (one line names it); 3 the address to listen on
/// is in use or cannot be bound (one line names it); 4 the import failed.
/// </summary>
public sealed class Program
{
    public const int ConfigurationError = 2;
    public const int CannotListen = 3;
    public const int ImportFailed = 4;

    private Program()
    {
    }

    public static async Task<int> Main(string[] args)
    {
        ArgumentNullException.ThrowIfNull(args);
        try
        {
            if (args is ["import-sqlite", ..])
            {
                return Import(args);
            }

            var app = ServiceApp.Build(args);
            await app.RunAsync().ConfigureAwait(false);
            return 0;
        }
        catch (ServiceConfigurationException e)
        {
            await Console.Error.WriteLineAsync("readiness service: " + e.Message).ConfigureAwait(false);
            return ConfigurationError;
        }
        catch (IOException e) when (e.InnerException is SocketException or Microsoft.AspNetCore.Connections.AddressInUseException
            || e.Message.Contains("address already in use", StringComparison.OrdinalIgnoreCase))
        {
            // Kestrel: "Failed to bind to address http://127.0.0.1:5080: address already in use."
            await Console.Error.WriteLineAsync($"readiness service: cannot listen: {FirstLine(e.Message)} (set another address with --urls or the environment variable ASPNETCORE_URLS)").ConfigureAwait(false);
            return CannotListen;
        }
    }

    private static int Import(string[] args)
    {
        if (args.Length < 2)
        {
            Console.Error.WriteLine("usage: import-sqlite FILE (the PostgreSQL database comes from Readiness:PostgresConnection)");
            return ConfigurationError;
        }

        var app = ServiceApp.Build(args[2..]);
        var settings = app.Services.GetRequiredService<ServiceSettings>();
        if (settings.PostgresConnection is null)
        {
            throw new ServiceConfigurationException($"{ServiceSettings.Section}:PostgresConnection", "missing: import-sqlite copies into the PostgreSQL database this names");
        }

        try
        {
            var database = app.Services.GetRequiredService<PostgresDatabase>();
            database.Initialize();
            var counts = SqliteImport.Run(Path.GetFullPath(args[1]), database);
            Console.WriteLine($"imported {counts["deliveries"]} deliveries, {counts["jobs"]} jobs and {counts["runs"]} runs from {args[1]}");
            return 0;
        }
        catch (Exception e) when (e is InvalidOperationException or FileNotFoundException or Npgsql.NpgsqlException or Microsoft.Data.Sqlite.SqliteException)
        {
            Console.Error.WriteLine("readiness service: import-sqlite: " + FirstLine(e.Message));
            return ImportFailed;
        }
    }

    private static string FirstLine(string text) => text.Split('\n')[0].Trim();
}
