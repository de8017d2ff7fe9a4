namespace Readiness.Testing.FaultLoad;

/// <summary>The size and faults of one fault-and-load run.</summary>
/// <param name="ServiceDll">The service program (<c>Readiness.Service.dll</c>).</param>
/// <param name="StoreSettings">The store's settings for every instance (a PostgreSQL connection string, or a shared data folder).</param>
/// <param name="SharedDataFolder">Whether all instances use the data folder in <paramref name="StoreSettings"/> (the SQLite file); else each has its own.</param>
/// <param name="JobsByState">Counts the store's job rows by state (for "redeliveries add no job", failed jobs, idle).</param>
public sealed record FaultLoadOptions(
    string ServiceDll,
    IReadOnlyDictionary<string, string> StoreSettings,
    bool SharedDataFolder,
    Func<IReadOnlyDictionary<string, long>> JobsByState,
    int Instances = 3,
    int Deliveries = 500,
    int Senders = 32,
    int PullRequests = 25,
    int Kills = 20,
    int Redeliveries = 100,
    bool ForgeFaults = true,
    TimeSpan? KillEvery = null);
