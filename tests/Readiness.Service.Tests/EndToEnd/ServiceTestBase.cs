using Microsoft.Data.Sqlite;
using Readiness.Testing;

namespace Readiness.Service.Tests.EndToEnd;

/// <summary>One forge stand-in, one data folder, one demo repository and one service per test.</summary>
public abstract class ServiceTestBase : IAsyncLifetime
{
    private readonly List<ServiceHost> hosts = [];

    protected ForgeStandIn Forge { get; private set; } = null!;

    protected TempDirectory Data { get; } = new("readiness-service-");

    protected CapturedLogs Logs { get; } = new();

    protected ReleasePullRequestRepository Repo { get; private set; } = null!;

    protected ServiceHost Host { get; private set; } = null!;

    protected virtual string BaseConfig => "checklist: library\n";

    /// <summary>The organisation's checklists, written to a folder the service is configured with.</summary>
    protected virtual IReadOnlyDictionary<string, string> OrganisationChecklists => new Dictionary<string, string>();

    public virtual async Task InitializeAsync()
    {
        Forge = await ForgeStandIn.StartAsync();
        Forge.AcceptToken(ServiceHost.Token);
        Repo = ReleasePullRequestRepository.Create(BaseConfig);
        Host = StartHost();
    }

    public virtual async Task DisposeAsync()
    {
        foreach (var host in hosts)
        {
            await host.DisposeAsync();
        }

        await Forge.DisposeAsync();
        Repo.Dispose();
        SqliteConnection.ClearAllPools();
        Data.Dispose();
    }

    /// <summary>A service on this test's data folder; the first request starts it.</summary>
    protected ServiceHost StartHost(IReadOnlyDictionary<string, string?>? extra = null)
    {
        var settings = new Dictionary<string, string?>(extra ?? new Dictionary<string, string?>());
        if (OrganisationChecklists.Count > 0)
        {
            var folder = Data.Combine("org-checklists");
            Directory.CreateDirectory(folder);
            foreach (var (name, text) in OrganisationChecklists)
            {
                File.WriteAllText(Path.Combine(folder, name + ".yml"), text);
            }

            settings["Readiness:ChecklistFolder"] = folder;
        }

        var host = new ServiceHost(Forge.BaseUrl, Data.Path, Logs, settings);
        hosts.Add(host);
        _ = host.Server;
        return host;
    }

    /// <summary>Disposes <paramref name="host"/> with the test's own hosts.</summary>
    protected void Track(ServiceHost host) => hosts.Add(host);

    protected static async Task WaitUntil(Func<bool> condition, string what, int seconds = 30)
    {
        var until = DateTime.UtcNow.AddSeconds(seconds);
        while (!condition())
        {
            if (DateTime.UtcNow > until)
            {
                throw new TimeoutException("timed out waiting for " + what);
            }

            await Task.Delay(50);
        }
    }
}
