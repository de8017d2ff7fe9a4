using Readiness.Service.Storage;

namespace Readiness.Service.Configuration;

/// <summary>Reads the settings and prepares the data folder and the database before anything else starts.</summary>
public sealed class StartupCheck(IServiceProvider services, ILogger<StartupCheck> logger) : IHostedService
{
    public Task StartAsync(CancellationToken cancellationToken)
    {
        var settings = services.GetRequiredService<ServiceSettings>();
        try
        {
            Directory.CreateDirectory(settings.DataFolder);
            Directory.CreateDirectory(settings.MirrorFolder);
            if (settings.PostgresConnection is null)
            {
                services.GetRequiredService<SqliteDatabase>().Initialize();
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or Microsoft.Data.Sqlite.SqliteException)
        {
            throw new ServiceConfigurationException($"{ServiceSettings.Section}:DataFolder", $"{settings.DataFolder} cannot hold the database: {e.Message}");
        }

        if (settings.PostgresConnection is not null)
        {
            try
            {
                var applied = services.GetRequiredService<PostgresDatabase>().Initialize();
                logger.LogInformation("PostgreSQL schema at version {Version} ({Applied} steps applied now)", PostgresDatabase.SchemaVersion, applied);
            }
            catch (Exception e) when (e is Npgsql.NpgsqlException or TimeoutException or System.Net.Sockets.SocketException)
            {
                throw new ServiceConfigurationException($"{ServiceSettings.Section}:PostgresConnection", $"the database cannot be reached or migrated: {e.Message}");
            }
        }

        logger.LogInformation(
            "Readiness service: data in {DataFolder} ({Store}), forge API {ApiUrl}, authenticating as {Mode}, release branches {Branches}",
            settings.DataFolder,
            settings.PostgresConnection is null ? "SQLite" : "PostgreSQL",
            settings.ForgeApiUrl,
            settings.UsesApp ? $"app {settings.AppId}" : "a token",
            string.Join(", ", settings.ReleaseBranches));
        return Task.CompletedTask;
    }

    public Task StopAsync(CancellationToken cancellationToken) => Task.CompletedTask;
}
