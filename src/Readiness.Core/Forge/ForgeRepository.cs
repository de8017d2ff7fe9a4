namespace Readiness.Core.Forge;

/// <summary>A repository on the forge.</summary>
/// <param name="Owner">The owner (organisation or user).</param>
/// <param name="Name">The repository's name.</param>
/// <param name="InstallationId">The app installation that may act on it, when the forge uses app installations.</param>
public sealed record ForgeRepository(string Owner, string Name, long? InstallationId = null)
{
    /// <summary>owner/name.</summary>
    public string FullName => $"{Owner}/{Name}";

    public override string ToString() => FullName;
}
