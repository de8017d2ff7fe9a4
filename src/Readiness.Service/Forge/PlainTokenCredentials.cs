namespace Readiness.Service.Forge;

/// <summary>One configured token for every repository (small setups without an app).</summary>
public sealed class PlainTokenCredentials(string token) : IForgeCredentials
{
    public Task<string> TokenAsync(long? installationId, CancellationToken cancellationToken) => Task.FromResult(token);
}
