using System.Collections.Concurrent;
using System.Net;
using System.Net.Sockets;
using System.Text;
using System.Text.Json;

using NuGet.Versioning;

namespace Readiness.Testing;

/// <summary>
/// A NuGet V3 feed served by the test on 127.0.0.1 (a free port), following the published protocol
/// (learn.microsoft.com/nuget/api/overview): the service index, the flat container (<c>index.json</c> of versions,
/// lowercase and normalised, listed and unlisted; the <c>.nupkg</c>), the registration index (one inlined page, or a
/// page to fetch) and the search service (owners). Unknown ids give 404. Faults: 500, slow answers, malformed JSON,
/// and Basic authentication required.
/// </summary>
public sealed class LocalHttpFeed : IDisposable
{
    private readonly HttpListener listener;
    private readonly CancellationTokenSource stopping = new();
    private readonly ConcurrentDictionary<string, FeedEntry> packages = new(StringComparer.OrdinalIgnoreCase);
    private readonly ConcurrentQueue<string> requests = new();
    private readonly ConcurrentQueue<string?> authorizations = new();
    private readonly Task loop;

    private LocalHttpFeed(HttpListener listener, int port)
    {
        this.listener = listener;
        Port = port;
        BaseAddress = new Uri($"http://127.0.0.1:{port}/");
        loop = Task.Run(AcceptAsync);
    }

    public int Port { get; }

    public Uri BaseAddress { get; }

    public string ServiceIndexUrl => BaseAddress + "v3/index.json";

    public Uri FlatContainer => new(BaseAddress, "v3-flatcontainer/");

    /// <summary>The fault to apply; <see cref="FaultPaths"/> limits it to paths starting with that text.</summary>
    public FeedFault Fault { get; set; }

    public string FaultPaths { get; set; } = "/";

    /// <summary>How long a <see cref="FeedFault.Slow"/> answer waits.</summary>
    public TimeSpan Delay { get; set; } = TimeSpan.FromSeconds(30);

    /// <summary>Added before every answer, to stand for the network between a user and a real feed.</summary>
    public TimeSpan Latency { get; set; }

    /// <summary>When set, every request needs HTTP Basic authentication with these (401 otherwise).</summary>
    public (string User, string Password)? RequiredCredentials { get; set; }

    public bool WithRegistration { get; set; } = true;

    public bool WithSearch { get; set; } = true;

    /// <summary>Serve the registration pages by address instead of inlined in the index.</summary>
    public bool InlineRegistrationPages { get; set; } = true;

    /// <summary>Where the service index says the resources are; defaults to this feed.</summary>
    public Uri? ResourcesAt { get; set; }

    /// <summary>Every request path and query, in arrival order.</summary>
    public IReadOnlyList<string> Requests => requests.ToArray();

    /// <summary>The Authorization header of every request (null when absent).</summary>
    public IReadOnlyList<string?> Authorizations => authorizations.ToArray();

    /// <summary>A port on 127.0.0.1 that nothing listens on (free a moment ago): connections to it are refused.</summary>
    public static int ClosedPort()
    {
        var probe = new TcpListener(IPAddress.Loopback, 0);
        probe.Start();
        var port = ((IPEndPoint)probe.LocalEndpoint).Port;
        probe.Stop();
        return port;
    }

    public static LocalHttpFeed Start()
    {
        for (var attempt = 0; ; attempt++)
        {
            var port = ClosedPort();
            var listener = new HttpListener();
            listener.Prefixes.Add($"http://127.0.0.1:{port}/");
            try
            {
                listener.Start();
                return new LocalHttpFeed(listener, port);
            }
            catch (HttpListenerException) when (attempt < 5)
            {
                listener.Close();
            }
        }
    }

    /// <summary>Publishes <paramref name="version"/> of <paramref name="id"/> (the first call fixes the id's spelling).</summary>
    public LocalHttpFeed Add(string id, string version, bool listed = true, bool deprecated = false)
    {
        var entry = packages.GetOrAdd(id, _ => new FeedEntry(id));
        lock (entry)
        {
            entry.Versions.Add((version, listed, deprecated));
        }

        return this;
    }

    public LocalHttpFeed Owners(string id, params string[] owners)
    {
        packages.GetOrAdd(id, _ => new FeedEntry(id)).OwnerNames = owners;
        return this;
    }

    public void Dispose()
    {
        stopping.Cancel();
        listener.Close();
        try
        {
            loop.Wait(TimeSpan.FromSeconds(5));
        }
        catch (AggregateException)
        {
            // The accept loop ends with the listener.
        }

        stopping.Dispose();
    }

    private async Task AcceptAsync()
    {
        while (!stopping.IsCancellationRequested)
        {
            HttpListenerContext context;
            try
            {
                context = await listener.GetContextAsync().ConfigureAwait(false);
            }
            catch (Exception e) when (e is HttpListenerException or ObjectDisposedException or InvalidOperationException)
            {
                return;
            }

            _ = Task.Run(() => ServeAsync(context));
        }
    }

    private async Task ServeAsync(HttpListenerContext context)
    {
        var response = context.Response;
        try
        {
            var path = context.Request.Url!.AbsolutePath;
            requests.Enqueue(context.Request.Url.PathAndQuery);
            authorizations.Enqueue(context.Request.Headers["Authorization"]);
            if (Latency > TimeSpan.Zero)
            {
                await Task.Delay(Latency, stopping.Token).ConfigureAwait(false);
            }

            if (RequiredCredentials is { } required && !Authorized(context.Request, required))
            {
                response.AddHeader("WWW-Authenticate", "Basic realm=\"feed\"");
                await WriteAsync(response, 401, "{}").ConfigureAwait(false);
                return;
            }

            var fault = path.StartsWith(FaultPaths, StringComparison.Ordinal) ? Fault : FeedFault.None;
            switch (fault)
            {
                case FeedFault.ServerError:
                    await WriteAsync(response, 500, "{\"error\":\"the feed is unwell\"}").ConfigureAwait(false);
                    return;
                case FeedFault.MalformedJson:
                    await WriteAsync(response, 200, "{\"versions\": [\"1.0.0\", ").ConfigureAwait(false);
                    return;
                case FeedFault.Slow:
                    await Task.Delay(Delay, stopping.Token).ConfigureAwait(false);
                    break;
            }

            var (status, body, bytes) = Route(path, context.Request.QueryString["q"]);
            if (bytes is not null)
            {
                response.StatusCode = status;
                response.ContentType = "application/octet-stream";
                await response.OutputStream.WriteAsync(bytes, stopping.Token).ConfigureAwait(false);
                response.Close();
                return;
            }

            await WriteAsync(response, status, body).ConfigureAwait(false);
        }
        catch (Exception e) when (e is OperationCanceledException or HttpListenerException or ObjectDisposedException or IOException)
        {
            response.Abort();
        }
    }

    private (int Status, string Body, byte[]? Bytes) Route(string path, string? query)
    {
        var resources = ResourcesAt ?? BaseAddress;
        if (path == "/v3/index.json")
        {
            var list = new List<object>
            {
                new Dictionary<string, string> { ["@id"] = new Uri(resources, "v3-flatcontainer/").AbsoluteUri, ["@type"] = "PackageBaseAddress/3.0.0" },
                new Dictionary<string, string> { ["@id"] = new Uri(resources, "api/v2/package").AbsoluteUri, ["@type"] = "PackagePublish/2.0.0" },
            };
            if (WithRegistration)
            {
                list.Add(new Dictionary<string, string> { ["@id"] = new Uri(resources, "v3/registration5-gz-semver2/").AbsoluteUri, ["@type"] = "RegistrationsBaseUrl/3.6.0" });
            }

            if (WithSearch)
            {
                list.Add(new Dictionary<string, string> { ["@id"] = new Uri(resources, "query").AbsoluteUri, ["@type"] = "SearchQueryService/3.5.0" });
            }

            return (200, JsonSerializer.Serialize(new Dictionary<string, object> { ["version"] = "3.0.0", ["resources"] = list }), null);
        }

        var parts = path.Trim('/').Split('/');
        if (parts is ["v3-flatcontainer", var id, "index.json"] && Find(id) is { } entry)
        {
            var versions = entry.Snapshot().Select(v => NuGetVersion.Parse(v.Version).ToNormalizedString().ToLowerInvariant()).Distinct().ToArray();
            return (200, JsonSerializer.Serialize(new { versions }), null);
        }

        if (parts is ["v3-flatcontainer", var nid, var nversion, var file] && Find(nid) is { } nentry
            && nentry.Snapshot().FirstOrDefault(v => NuGetVersion.Parse(v.Version).ToNormalizedString().ToLowerInvariant() == nversion) is { Version: not null } found
            && file == $"{nid}.{nversion}.nupkg")
        {
            return (200, string.Empty, LocalFeedBuilder.Package(nentry.Id, found.Version));
        }

        if (parts is ["v3", "registration5-gz-semver2", var rid, "index.json"] && WithRegistration && Find(rid) is { } rentry)
        {
            var pageUrl = new Uri(resources, $"v3/registration5-gz-semver2/{rid}/page/1.json").AbsoluteUri;
            var leaves = Leaves(rentry);
            object page = InlineRegistrationPages
                ? new Dictionary<string, object> { ["@id"] = pageUrl, ["count"] = leaves.Count, ["items"] = leaves }
                : new Dictionary<string, object> { ["@id"] = pageUrl, ["count"] = leaves.Count };
            return (200, JsonSerializer.Serialize(new Dictionary<string, object> { ["count"] = 1, ["items"] = new[] { page } }), null);
        }

        if (parts is ["v3", "registration5-gz-semver2", var pid, "page", "1.json"] && WithRegistration && Find(pid) is { } pentry)
        {
            return (200, JsonSerializer.Serialize(new Dictionary<string, object> { ["items"] = Leaves(pentry) }), null);
        }

        if (parts is ["query"] && WithSearch)
        {
            var wanted = query?.StartsWith("packageid:", StringComparison.OrdinalIgnoreCase) == true ? query["packageid:".Length..] : null;
            var data = wanted is not null && Find(wanted) is { } sentry
                ? new object[] { new Dictionary<string, object> { ["id"] = sentry.Id, ["version"] = sentry.Snapshot().Last().Version, ["owners"] = sentry.OwnerNames } }
                : [];
            return (200, JsonSerializer.Serialize(new Dictionary<string, object> { ["totalHits"] = data.Length, ["data"] = data }), null);
        }

        return (404, "{}", null);
    }

    private FeedEntry? Find(string lowerId) => packages.TryGetValue(lowerId, out var entry) ? entry : null;

    private static List<object> Leaves(FeedEntry entry) =>
        entry.Snapshot().Select(v =>
        {
            var catalogEntry = new Dictionary<string, object> { ["id"] = entry.Id, ["version"] = v.Version, ["listed"] = v.Listed };
            if (v.Deprecated)
            {
                catalogEntry["deprecation"] = new Dictionary<string, object> { ["reasons"] = new[] { "Legacy" }, ["message"] = "Use a newer version." };
            }

            return (object)new Dictionary<string, object> { ["catalogEntry"] = catalogEntry };
        }).ToList();

    private static bool Authorized(HttpListenerRequest request, (string User, string Password) required)
    {
        var header = request.Headers["Authorization"];
        var expected = "Basic " + Convert.ToBase64String(Encoding.UTF8.GetBytes($"{required.User}:{required.Password}"));
        return string.Equals(header, expected, StringComparison.Ordinal);
    }

    private async Task WriteAsync(HttpListenerResponse response, int status, string body)
    {
        var bytes = Encoding.UTF8.GetBytes(body);
        response.StatusCode = status;
        response.ContentType = "application/json";
        response.ContentLength64 = bytes.Length;
        await response.OutputStream.WriteAsync(bytes, stopping.Token).ConfigureAwait(false);
        response.Close();
    }

    private sealed class FeedEntry(string id)
    {
        public string Id { get; } = id;

        public List<(string Version, bool Listed, bool Deprecated)> Versions { get; } = [];

        public string[] OwnerNames { get; set; } = [];

        public (string Version, bool Listed, bool Deprecated)[] Snapshot()
        {
            lock (this)
            {
                return Versions.ToArray();
            }
        }
    }
}
