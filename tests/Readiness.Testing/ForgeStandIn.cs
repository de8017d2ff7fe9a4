using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Http;
using Microsoft.Extensions.Logging;

namespace Readiness.Testing;

/// <summary>
/// A stand-in for the forge's REST API, served by the test on 127.0.0.1 under <c>/api/v3/</c> (where an API client
/// given a custom base URL sends its requests). It implements only what the service uses: issue comments (list,
/// create, update), commit statuses, and app installation tokens. Every request is recorded; failures can be
/// scripted (a 502 before success, a rate limit) and a request can be held until the test lets it go.
/// Status descriptions over 140 characters are refused with 422 as the real API does.
/// </summary>
public sealed partial class ForgeStandIn : IAsyncDisposable
{
    private readonly Lock gate = new();
    private readonly List<ForgeCall> calls = [];
    private readonly List<StandInComment> comments = [];
    private readonly List<StandInStatus> statuses = [];
    private readonly List<(string Method, Regex Path, int Status, Dictionary<string, string> Headers)> failures = [];
    private readonly List<(string Method, Regex Path, TaskCompletionSource Reached, TaskCompletionSource Released)> holds = [];
    private readonly HashSet<string> validTokens = new(StringComparer.Ordinal);
    private readonly WebApplication app;
    private long nextId = 1000;
    private int tokensIssued;

    private ForgeStandIn(WebApplication app)
    {
        this.app = app;
    }

    /// <summary>The base URL to configure the service's API client with (it appends <c>api/v3/</c>).</summary>
    public Uri BaseUrl { get; private set; } = null!;

    /// <summary>The public key app JWTs must verify with; null accepts none.</summary>
    public RSA? AppPublicKey { get; set; }

    /// <summary>The app id the JWT's <c>iss</c> must carry.</summary>
    public string? AppId { get; set; }

    /// <summary>How long issued installation tokens last (one hour, as the forge documents).</summary>
    public TimeSpan TokenLifetime { get; set; } = TimeSpan.FromHours(1);

    /// <summary>The clock for token expiry times.</summary>
    public TimeProvider Time { get; set; } = TimeProvider.System;

    /// <summary>The JWT payloads presented for installation tokens, verified.</summary>
    public List<JsonObject> JwtClaims { get; } = [];

    public IReadOnlyList<ForgeCall> Calls
    {
        get
        {
            lock (gate)
            {
                return calls.ToArray();
            }
        }
    }

    public int TokensIssued => Volatile.Read(ref tokensIssued);

    public static async Task<ForgeStandIn> StartAsync()
    {
        var builder = WebApplication.CreateSlimBuilder();
        builder.Logging.ClearProviders();
        builder.WebHost.UseUrls("http://127.0.0.1:0");
        var app = builder.Build();
        var standIn = new ForgeStandIn(app);
        app.Run(standIn.HandleAsync);
        await app.StartAsync().ConfigureAwait(false);
        standIn.BaseUrl = new Uri(app.Urls.First().TrimEnd('/') + "/");
        return standIn;
    }

    /// <summary>Accepts <paramref name="token"/> on API calls (a plain token the service is configured with).</summary>
    public void AcceptToken(string token)
    {
        lock (gate)
        {
            validTokens.Add(token);
        }
    }

    /// <summary>The next <paramref name="times"/> requests matching answer <paramref name="status"/> with <paramref name="headers"/>.</summary>
    public void FailNext(string method, string pathPattern, int status, IReadOnlyDictionary<string, string>? headers = null, int times = 1)
    {
        lock (gate)
        {
            for (var i = 0; i < times; i++)
            {
                failures.Add((method, new Regex(pathPattern, RegexOptions.CultureInvariant), status, new Dictionary<string, string>(headers ?? new Dictionary<string, string>())));
            }
        }
    }

    /// <summary>
    /// Holds the next matching request: <c>Reached</c> completes when it arrives; it is answered after
    /// <c>Release</c>; if the client goes away first, nothing it asked for happens.
    /// </summary>
    public (Task Reached, Action Release) Hold(string method, string pathPattern)
    {
        var reached = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        var released = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        lock (gate)
        {
            holds.Add((method, new Regex(pathPattern, RegexOptions.CultureInvariant), reached, released));
        }

        return (reached.Task, () => released.TrySetResult());
    }

    public IReadOnlyList<StandInComment> Comments(string owner, string repo, int number)
    {
        lock (gate)
        {
            return comments.Where(c => c.Owner == owner && c.Repo == repo && c.Number == number).ToArray();
        }
    }

    public IReadOnlyList<StandInComment> AllComments()
    {
        lock (gate)
        {
            return comments.ToArray();
        }
    }

    public IReadOnlyList<StandInStatus> Statuses(string? sha = null)
    {
        lock (gate)
        {
            return statuses.Where(s => sha is null || s.Sha == sha).ToArray();
        }
    }

    public async ValueTask DisposeAsync()
    {
        lock (gate)
        {
            foreach (var hold in holds)
            {
                hold.Released.TrySetResult();
            }
        }

        await app.StopAsync().ConfigureAwait(false);
        await app.DisposeAsync().ConfigureAwait(false);
    }

    private async Task HandleAsync(HttpContext context)
    {
        var request = context.Request;
        var path = request.Path.Value ?? string.Empty;
        string body;
        using (var reader = new StreamReader(request.Body, Encoding.UTF8))
        {
            body = await reader.ReadToEndAsync(context.RequestAborted).ConfigureAwait(false);
        }

        var authorization = request.Headers.Authorization.Count > 0 ? request.Headers.Authorization.ToString() : null;
        (Task Wait, TaskCompletionSource Reached)? hold = null;
        (int Status, Dictionary<string, string> Headers)? failure = null;
        lock (gate)
        {
            var h = holds.FindIndex(x => x.Method == request.Method && x.Path.IsMatch(path));
            if (h >= 0)
            {
                hold = (holds[h].Released.Task, holds[h].Reached);
                holds.RemoveAt(h);
            }
        }

        if (hold is { } held)
        {
            held.Reached.TrySetResult();
            try
            {
                await held.Wait.WaitAsync(context.RequestAborted).ConfigureAwait(false);
            }
            catch (OperationCanceledException)
            {
                Record(request.Method, path, body, authorization, 0);
                return;
            }
        }

        if (context.RequestAborted.IsCancellationRequested)
        {
            Record(request.Method, path, body, authorization, 0);
            return;
        }

        lock (gate)
        {
            var f = failures.FindIndex(x => x.Method == request.Method && x.Path.IsMatch(path));
            if (f >= 0)
            {
                failure = (failures[f].Status, failures[f].Headers);
                failures.RemoveAt(f);
            }
        }

        if (failure is { } fail)
        {
            Record(request.Method, path, body, authorization, fail.Status);
            foreach (var (name, value) in fail.Headers)
            {
                context.Response.Headers[name] = value;
            }

            await Answer(context, fail.Status, new JsonObject { ["message"] = fail.Status >= 500 ? "Server Error" : "API rate limit exceeded" }).ConfigureAwait(false);
            return;
        }

        var (status, answer) = Route(request.Method, path, body, authorization);
        Record(request.Method, path, body, authorization, status);
        await Answer(context, status, answer).ConfigureAwait(false);
    }

    private (int Status, JsonNode? Body) Route(string method, string path, string body, string? authorization)
    {
        if (method == "POST" && TokenPath().Match(path) is { Success: true } tokenMatch)
        {
            return IssueToken(long.Parse(tokenMatch.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture), authorization);
        }

        if (!Authorized(authorization))
        {
            return (401, new JsonObject { ["message"] = "Bad credentials" });
        }

        if (CommentsPath().Match(path) is { Success: true } list)
        {
            var (owner, repo, number) = (list.Groups[1].Value, list.Groups[2].Value, int.Parse(list.Groups[3].Value, System.Globalization.CultureInfo.InvariantCulture));
            if (method == "GET")
            {
                return (200, new JsonArray(Comments(owner, repo, number).Select(c => (JsonNode)c.ToJson(BaseUrl)).ToArray()));
            }

            if (method == "POST")
            {
                var text = JsonNode.Parse(body)?["body"]?.GetValue<string>() ?? string.Empty;
                StandInComment created;
                lock (gate)
                {
                    created = new StandInComment(nextId++, owner, repo, number, text, 0);
                    comments.Add(created);
                }

                return (201, created.ToJson(BaseUrl));
            }
        }

        if (method == "PATCH" && CommentPath().Match(path) is { Success: true } one)
        {
            var id = long.Parse(one.Groups[3].Value, System.Globalization.CultureInfo.InvariantCulture);
            var text = JsonNode.Parse(body)?["body"]?.GetValue<string>() ?? string.Empty;
            lock (gate)
            {
                var index = comments.FindIndex(c => c.Id == id && c.Owner == one.Groups[1].Value && c.Repo == one.Groups[2].Value);
                if (index < 0)
                {
                    return (404, new JsonObject { ["message"] = "Not Found" });
                }

                comments[index] = comments[index] with { Body = text, Edits = comments[index].Edits + 1 };
                return (200, comments[index].ToJson(BaseUrl));
            }
        }

        if (method == "POST" && StatusPath().Match(path) is { Success: true } st)
        {
            var json = JsonNode.Parse(body)!;
            var description = json["description"]?.GetValue<string>();
            if (description is { Length: > 140 })
            {
                return (422, new JsonObject { ["message"] = "Validation Failed", ["errors"] = new JsonArray(new JsonObject { ["message"] = "description is too long (maximum is 140 characters)" }) });
            }

            var status = new StandInStatus(
                st.Groups[1].Value,
                st.Groups[2].Value,
                st.Groups[3].Value,
                json["state"]?.GetValue<string>() ?? string.Empty,
                description,
                json["target_url"]?.GetValue<string>(),
                json["context"]?.GetValue<string>() ?? "default");
            long id;
            lock (gate)
            {
                statuses.Add(status);
                id = nextId++;
            }

            return (201, new JsonObject
            {
                ["id"] = id,
                ["state"] = status.State,
                ["description"] = status.Description,
                ["target_url"] = status.TargetUrl,
                ["context"] = status.Context,
                ["url"] = $"{BaseUrl}api/v3/repos/{status.Owner}/{status.Repo}/statuses/{status.Sha}",
                ["created_at"] = "2026-11-20T12:00:00Z",
                ["updated_at"] = "2026-11-20T12:00:00Z",
            });
        }

        return (404, new JsonObject { ["message"] = "Not Found", ["documentation_url"] = "stand-in implements only what the service uses" });
    }

    private (int, JsonNode) IssueToken(long installation, string? authorization)
    {
        const string Bearer = "Bearer ";
        if (AppPublicKey is null || authorization is null || !authorization.StartsWith(Bearer, StringComparison.OrdinalIgnoreCase))
        {
            return (401, new JsonObject { ["message"] = "A JSON web token could not be decoded" });
        }

        var parts = authorization[Bearer.Length..].Trim().Split('.');
        if (parts.Length != 3)
        {
            return (401, new JsonObject { ["message"] = "A JSON web token could not be decoded" });
        }

        var header = JsonNode.Parse(FromBase64Url(parts[0]));
        var valid = header?["alg"]?.GetValue<string>() == "RS256"
            && AppPublicKey.VerifyData(Encoding.ASCII.GetBytes(parts[0] + "." + parts[1]), FromBase64Url(parts[2]), HashAlgorithmName.SHA256, RSASignaturePadding.Pkcs1);
        var claims = JsonNode.Parse(FromBase64Url(parts[1]))!.AsObject();
        if (!valid || (AppId is not null && claims["iss"]?.ToString() != AppId))
        {
            return (401, new JsonObject { ["message"] = "'Issuer' claim ('iss') must be an Integer" });
        }

        var token = "ghs_standin" + Convert.ToHexStringLower(RandomNumberGenerator.GetBytes(16));
        var expires = Time.GetUtcNow() + TokenLifetime;
        lock (gate)
        {
            JwtClaims.Add(claims);
            validTokens.Add(token);
        }

        Interlocked.Increment(ref tokensIssued);
        return (201, new JsonObject
        {
            ["token"] = token,
            ["expires_at"] = expires.UtcDateTime.ToString("yyyy-MM-ddTHH:mm:ssZ", System.Globalization.CultureInfo.InvariantCulture),
            ["permissions"] = new JsonObject { ["pull_requests"] = "write", ["statuses"] = "write", ["contents"] = "read" },
            ["repository_selection"] = "all",
        });
    }

    private bool Authorized(string? authorization)
    {
        if (authorization is null)
        {
            return false;
        }

        var space = authorization.IndexOf(' ', StringComparison.Ordinal);
        var token = space < 0 ? authorization : authorization[(space + 1)..].Trim();
        lock (gate)
        {
            return validTokens.Contains(token);
        }
    }

    private void Record(string method, string path, string body, string? authorization, int status)
    {
        lock (gate)
        {
            calls.Add(new ForgeCall(method, path, body, authorization, status, DateTimeOffset.UtcNow));
        }
    }

    private static async Task Answer(HttpContext context, int status, JsonNode? body)
    {
        context.Response.StatusCode = status;
        context.Response.ContentType = "application/json; charset=utf-8";
        await context.Response.WriteAsync(body?.ToJsonString() ?? "{}", context.RequestAborted).ConfigureAwait(false);
    }

    private static byte[] FromBase64Url(string text)
    {
        var s = text.Replace('-', '+').Replace('_', '/');
        return Convert.FromBase64String(s.PadRight(s.Length + ((4 - (s.Length % 4)) % 4), '='));
    }

    [GeneratedRegex("^/api/v3/app/installations/([0-9]+)/access_tokens$")]
    private static partial Regex TokenPath();

    [GeneratedRegex("^/api/v3/repos/([^/]+)/([^/]+)/issues/([0-9]+)/comments$")]
    private static partial Regex CommentsPath();

    [GeneratedRegex("^/api/v3/repos/([^/]+)/([^/]+)/issues/comments/([0-9]+)$")]
    private static partial Regex CommentPath();

    [GeneratedRegex("^/api/v3/repos/([^/]+)/([^/]+)/statuses/([0-9a-f]{40})$")]
    private static partial Regex StatusPath();
}
