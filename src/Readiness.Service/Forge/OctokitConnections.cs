using Octokit;
using Octokit.Internal;
using Readiness.Service.Configuration;

namespace Readiness.Service.Forge;

/// <summary>Builds API clients for the configured base URL, sharing one HTTP client.</summary>
public sealed class OctokitConnections(ServiceSettings settings) : IDisposable
{
    public static readonly ProductHeaderValue Product = new("readiness", "0.1");
    private readonly HttpClientAdapter http = new(HttpMessageHandlerFactory.CreateDefault);

    public GitHubClient Client(Credentials credentials)
    {
        var connection = new Connection(Product, settings.ForgeApiUrl, new InMemoryCredentialStore(credentials), http, new SimpleJsonSerializer());
        var client = new GitHubClient(connection);
        client.SetRequestTimeout(TimeSpan.FromSeconds(30));
        return client;
    }

    public void Dispose() => http.Dispose();
}
