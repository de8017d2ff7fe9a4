using System.Collections.Concurrent;
using System.Security.Cryptography;
using Octokit;
using Readiness.Service.Configuration;

namespace Readiness.Service.Forge;

/// <summary>
/// Installation tokens of an app: asked for with an RS256 JWT (<c>POST /app/installations/{id}/access_tokens</c>)
/// and cached until five minutes before they expire (they last one hour).
/// </summary>
public sealed class AppInstallationCredentials : IForgeCredentials, IDisposable
{
    public static readonly TimeSpan RenewBefore = TimeSpan.FromMinutes(5);

    private readonly ConcurrentDictionary<long, (string Token, DateTimeOffset ExpiresAt)> cache = new();
    private readonly SemaphoreSlim gate = new(1, 1);
    private readonly ServiceSettings settings;
    private readonly OctokitConnections connections;
    private readonly ForgeRetryPolicy retry;
    private readonly SecretRedactor redactor;
    private readonly TimeProvider time;
    private readonly RSA key;

    public AppInstallationCredentials(ServiceSettings settings, OctokitConnections connections, ForgeRetryPolicy retry, SecretRedactor redactor, TimeProvider time)
    {
        ArgumentNullException.ThrowIfNull(settings);
        this.settings = settings;
        this.connections = connections;
        this.retry = retry;
        this.redactor = redactor;
        this.time = time;
        key = RSA.Create();
        key.ImportFromPem(settings.AppPrivateKeyPem);
    }

    public async Task<string> TokenAsync(long? installationId, CancellationToken cancellationToken)
    {
        if (installationId is not { } id)
        {
            throw new InvalidOperationException("the delivery names no app installation, so there is no token to act with");
        }

        if (Cached(id) is { } token)
        {
            return token;
        }

        await gate.WaitAsync(cancellationToken).ConfigureAwait(false);
        try
        {
            if (Cached(id) is { } again)
            {
                return again;
            }

            var jwt = AppJwt.Create(settings.AppId!, key, time.GetUtcNow());
            var client = connections.Client(new Credentials(jwt, AuthenticationType.Bearer));
            var issued = await retry.RunAsync(
                $"installation token for {id}",
                ct => client.GitHubApps.CreateInstallationToken(id).WaitAsync(ct),
                cancellationToken).ConfigureAwait(false);
            redactor.Add(issued.Token);
            cache[id] = (issued.Token, issued.ExpiresAt);
            return issued.Token;
        }
        finally
        {
            gate.Release();
        }
    }

    public void Dispose()
    {
        key.Dispose();
        gate.Dispose();
    }

    private string? Cached(long id) =>
        cache.TryGetValue(id, out var entry) && entry.ExpiresAt - RenewBefore > time.GetUtcNow() ? entry.Token : null;
}
