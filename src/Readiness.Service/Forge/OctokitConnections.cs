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
        var connection = new Connection(Product, ApiBase(settings.ForgeApiUrl), new InMemoryCredentialStore(credentials), http, new SimpleJsonSerializer());
        return new GitHubClient(connection);
    }

    /// <summary>
    /// The API root: the public forge's API host as given; any other server under <c>/api/v3/</c>, as the API client
    /// does when it builds its own connection from a base URL (pitfalls.md).
    /// </summary>
    public static Uri ApiBase(Uri configured)
    {
        ArgumentNullException.ThrowIfNull(configured);
        return configured.Host == "api.github.com" || configured.AbsolutePath.EndsWith("/api/v3/", StringComparison.Ordinal)
            ? configured
            : new Uri(configured, "/api/v3/");
    }

    public void Dispose() => http.Dispose();
}
