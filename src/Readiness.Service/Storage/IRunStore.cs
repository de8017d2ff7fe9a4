namespace Readiness.Service.Storage;

/// <summary>The history of runs, in SQLite (<see cref="SqliteRunStore"/>) or PostgreSQL (<see cref="PostgresRunStore"/>).</summary>
public interface IRunStore
{
    /// <summary>Stores a run; a second run for the same job returns the first one's id instead.</summary>
    Task<long> AddAsync(RunRecord run, CancellationToken cancellationToken);

    RunRecord? Find(long id);

    /// <summary>The newest runs of each repository (without report bodies), repositories by name.</summary>
    IReadOnlyList<RunRecord> RecentByRepository(int perRepository);

    long Count();
}
