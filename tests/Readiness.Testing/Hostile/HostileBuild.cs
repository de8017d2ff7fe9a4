namespace Readiness.Testing.Hostile;

/// <summary>What a case's builder gets: the repository, the scale, and a folder beside it (outside the repository).</summary>
public sealed record HostileBuild(TestRepository Repository, int Scale, string Outside)
{
    /// <summary>Multiplies a full-size count down for CI (scale 1 is small; the bench runs at 10).</summary>
    public int Size(int full, int ci) => Scale >= 10 ? full : ci;
}
