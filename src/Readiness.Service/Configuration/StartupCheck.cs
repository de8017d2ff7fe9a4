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
            services.GetRequiredService<Database>().Initialize();
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or Microsoft.Data.Sqlite.SqliteException)
        {
            throw new ServiceConfigurationException($"{ServiceSettings.Section}:DataFolder", $"{settings.DataFolder} cannot hold the database: {e.Message}");
        }

        logger.LogInformation(
            "Readiness service: data in {DataFolder}, forge API {ApiUrl}, authenticating as {Mode}, release branches {Branches}",
            settings.DataFolder,
            settings.ForgeApiUrl,
            settings.UsesApp ? $"app {settings.AppId}" : "a token",
            string.Join(", ", settings.ReleaseBranches));
        return Task.CompletedTask;
    }

    public Task StopAsync(CancellationToken cancellationToken) => Task.CompletedTask;
}
