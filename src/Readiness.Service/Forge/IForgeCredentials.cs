namespace Readiness.Service.Forge;

/// <summary>The token to present to the forge (API and git) for a repository's installation.</summary>
public interface IForgeCredentials
{
    Task<string> TokenAsync(long? installationId, CancellationToken cancellationToken);
}
