namespace Readiness.Bench;

/// <summary>One named benchmark: prints its own figures. Found by reflection; add a class to add a bench.</summary>
public interface IBench
{
    string Name { get; }

    string Description { get; }

    Task RunAsync(string[] args, CancellationToken cancellationToken);
}
