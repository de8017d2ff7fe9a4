using System.Net;
using System.Text.Json;

using NuGet.Configuration;
using NuGet.Versioning;

using Readiness.Core.Registry;

namespace Readiness.Registries;

/// <summary>
/// A NuGet V3 HTTP feed: the service index, then per id the flat container (versions, authoritative), the
/// registration index (id spelling, listed, deprecation) and, when asked, the search service (owners) in parallel. Registration
/// and search are optional: when a feed lacks them or they fail, those facts are unknown (null), never guessed.
/// Credentials come only from the user's NuGet configuration and are sent only to the service index's origin.
/// </summary>
/// <remarks>
/// HTTP goes through <see cref="HttpClient"/> rather than NuGet.Protocol's resources: those retry 5xx answers with
/// back-off past the registry phase's bound, write to the user's NuGet HTTP cache, and report every fault the same
/// way; here a 500, a 401, malformed JSON or a closed port each give their own reason at once. NuGet.Protocol still
/// supplies the service types and their order of preference, NuGet.Configuration the credentials, NuGet.Versioning
/// the version identity.
/// </remarks>
public sealed class NuGetFeedRegistry : IPackageRegistry, IDisposable
{
    private const int MaxPages = 64;
    private const long MaxResponseBytes = 16L * 1024 * 1024;

    private readonly Uri serviceIndexUrl;
    private readonly HttpClient http;
    private readonly bool hasCredentials;
    private readonly bool askOwners;
    private readonly string? configProblem;
    private readonly Lock gate = new();
    private Task<ServiceIndex>? serviceIndex;

    public NuGetFeedRegistry(Uri serviceIndex, RegistryOptions options)
    {
        ArgumentNullException.ThrowIfNull(serviceIndex);
        ArgumentNullException.ThrowIfNull(options);
        if (!serviceIndex.IsAbsoluteUri || serviceIndex.Scheme is not ("http" or "https"))
        {
            throw new ArgumentException($"'{serviceIndex}' is not an http(s) feed address", nameof(serviceIndex));
        }

        // User name and password written into the address are never used (nor shown): credentials come from the
        // user's NuGet configuration only, so an address taken from a repository cannot carry its own.
        serviceIndexUrl = new Uri(serviceIndex.GetComponents(UriComponents.AbsoluteUri & ~UriComponents.UserInfo, UriFormat.UriEscaped));
        Source = FeedUrls.Display(serviceIndexUrl);
        askOwners = options.AskOwners;

        NetworkCredential? credential = null;
        try
        {
            credential = FeedCredentials.Find(serviceIndexUrl, options.NuGetConfigFile);
        }
        catch (NuGetConfigurationException e)
        {
            configProblem = e.Message;
        }

        var handler = new SocketsHttpHandler
        {
            AutomaticDecompression = DecompressionMethods.All,
            ConnectTimeout = options.Timeout,
            PooledConnectionLifetime = TimeSpan.FromMinutes(5),
            MaxAutomaticRedirections = 5,
            PreAuthenticate = true,
        };
        if (credential is not null)
        {
            var origin = new Uri(serviceIndexUrl.GetLeftPart(UriPartial.Authority) + "/");
            handler.Credentials = new CredentialCache { { origin, "Basic", credential } };
            hasCredentials = true;
        }

        // HTTP/2 where the feed offers it (TLS with ALPN): the parallel lookups then share one connection instead of
        // opening one each; plain HTTP and HTTP/1.1-only feeds are asked over HTTP/1.1.
        http = new HttpClient(handler)
        {
            Timeout = options.Timeout,
            MaxResponseContentBufferSize = MaxResponseBytes,
            DefaultRequestVersion = HttpVersion.Version20,
            DefaultVersionPolicy = HttpVersionPolicy.RequestVersionOrLower,
        };
        http.DefaultRequestHeaders.UserAgent.ParseAdd("Readiness/0.1");
    }

    public string Source { get; }

    public async Task<PackageLookup> LookupAsync(string packageId, CancellationToken cancellationToken)
    {
        PackageIds.ThrowIfInvalid(packageId);
        var index = await ServiceIndexAsync(cancellationToken).ConfigureAwait(false);
        var versionsTask = VersionsAsync(index, packageId, cancellationToken);
        var registrationTask = Optional(index.Registrations is { } r ? RegistrationAsync(r, packageId, cancellationToken) : null);
        var searchTask = Optional(askOwners && index.Search is { } s ? SearchAsync(s, packageId, cancellationToken) : null);

        var versions = await versionsTask.ConfigureAwait(false);
        var registration = await registrationTask.ConfigureAwait(false);
        var search = await searchTask.ConfigureAwait(false);
        if (versions is null)
        {
            return new PackageLookup(packageId, false, null, [], Owners: search?.Owners);
        }

        var leaves = registration?.Where(l => NuGetVersion.TryParse(l.Version, out _))
            .GroupBy(l => NuGetVersion.Parse(l.Version))
            .ToDictionary(g => g.Key, g => g.First());
        var published = versions.Select(v =>
        {
            RegistrationLeaf? leaf = null;
            var found = leaves is not null && NuGetVersion.TryParse(v, out var parsed) && leaves.TryGetValue(parsed, out leaf);
            return new PublishedVersion(v, found ? leaf!.Listed : null, found ? leaf!.Deprecated : null);
        }).ToArray();
        var spelled = registration?.Select(l => l.Id).FirstOrDefault(i => i is not null) ?? search?.Id;
        return new PackageLookup(packageId, true, spelled, published, Owners: search?.Owners);
    }

    public void Dispose() => http.Dispose();

    private Task<ServiceIndex> ServiceIndexAsync(CancellationToken cancellationToken)
    {
        lock (gate)
        {
            // One fetch per instance; a failed or cancelled one is tried again by the next lookup.
            if (serviceIndex is null || serviceIndex.IsFaulted || serviceIndex.IsCanceled)
            {
                serviceIndex = FetchServiceIndexAsync(cancellationToken);
            }

            return serviceIndex;
        }
    }

    private async Task<ServiceIndex> FetchServiceIndexAsync(CancellationToken cancellationToken)
    {
        using var document = await GetJsonAsync(serviceIndexUrl, notFoundIsNull: false, cancellationToken).ConfigureAwait(false);
        return ServiceIndex.Parse(document!.RootElement, serviceIndexUrl);
    }

    /// <summary>Versions from the flat container; null when the feed does not know the id (404).</summary>
    private async Task<IReadOnlyList<string>?> VersionsAsync(ServiceIndex index, string id, CancellationToken cancellationToken)
    {
        var url = FeedUrls.VersionsIndex(index.PackageBaseAddress, id);
        using var document = await GetJsonAsync(url, notFoundIsNull: true, cancellationToken).ConfigureAwait(false);
        return document is null ? null : FeedDocuments.Versions(document.RootElement, url);
    }

    private async Task<IReadOnlyList<RegistrationLeaf>?> RegistrationAsync(Uri registrations, string id, CancellationToken cancellationToken)
    {
        var url = FeedUrls.RegistrationIndex(registrations, id);
        using var document = await GetJsonAsync(url, notFoundIsNull: true, cancellationToken).ConfigureAwait(false);
        if (document is null)
        {
            return null;
        }

        var pages = FeedDocuments.RegistrationPages(document.RootElement, url);
        if (pages.Count(p => p.Page is not null) > MaxPages)
        {
            throw new FeedException($"{FeedUrls.Display(url)} has more than {MaxPages} registration pages");
        }

        var fetched = await Task.WhenAll(pages.Select(async p =>
        {
            if (p.Leaves is not null)
            {
                return p.Leaves;
            }

            using var page = await GetJsonAsync(p.Page!, notFoundIsNull: false, cancellationToken).ConfigureAwait(false);
            return FeedDocuments.RegistrationPage(page!.RootElement, p.Page!);
        })).ConfigureAwait(false);
        return fetched.SelectMany(l => l).ToArray();
    }

    private async Task<(string? Id, IReadOnlyList<string>? Owners)?> SearchAsync(Uri search, string id, CancellationToken cancellationToken)
    {
        var url = FeedUrls.Search(search, id);
        using var document = await GetJsonAsync(url, notFoundIsNull: true, cancellationToken).ConfigureAwait(false);
        return document is null ? null : FeedDocuments.SearchHit(document.RootElement, id);
    }

    /// <summary>An optional fact: its failure (of any kind) makes it unknown instead of failing the lookup.</summary>
    private static async Task<T?> Optional<T>(Task<T?>? task)
    {
        if (task is null)
        {
            return default;
        }

        try
        {
            return await task.ConfigureAwait(false);
        }
#pragma warning disable CA1031 // optional facts degrade to "unknown"; the authoritative flat container decides the lookup
        catch (Exception)
#pragma warning restore CA1031
        {
            return default;
        }
    }

    private async Task<JsonDocument?> GetJsonAsync(Uri url, bool notFoundIsNull, CancellationToken cancellationToken)
    {
        HttpResponseMessage response;
        try
        {
            response = await http.GetAsync(url, HttpCompletionOption.ResponseContentRead, cancellationToken).ConfigureAwait(false);
        }
        catch (HttpRequestException e)
        {
            throw new FeedException($"the request for {FeedUrls.Display(url)} failed: {e.Message}", e);
        }

        using (response)
        {
            if (notFoundIsNull && response.StatusCode == HttpStatusCode.NotFound)
            {
                return null;
            }

            if (response.StatusCode is HttpStatusCode.Unauthorized or HttpStatusCode.Forbidden)
            {
                throw new FeedException(CredentialsProblem((int)response.StatusCode));
            }

            if (!response.IsSuccessStatusCode)
            {
                throw new FeedException($"HTTP {(int)response.StatusCode} {response.ReasonPhrase} for {FeedUrls.Display(url)}");
            }

            var bytes = await response.Content.ReadAsByteArrayAsync(cancellationToken).ConfigureAwait(false);
            try
            {
                return JsonDocument.Parse(bytes, new JsonDocumentOptions { MaxDepth = 64 });
            }
            catch (JsonException e)
            {
                throw new FeedException($"malformed JSON from {FeedUrls.Display(url)}: {e.Message}", e);
            }
        }
    }

    private string CredentialsProblem(int status)
    {
        var why = hasCredentials
            ? "refused the credentials from your NuGet configuration"
            : "requires credentials, and your NuGet configuration has none for it";
        var config = configProblem is null ? string.Empty : $" (your NuGet configuration could not be read: {configProblem})";
        return $"the feed {why} (HTTP {status}){config}; add them under packageSourceCredentials in your own NuGet "
            + "configuration, never in the repository";
    }
}
