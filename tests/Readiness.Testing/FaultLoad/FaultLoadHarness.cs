using System.Collections.Concurrent;
using System.Diagnostics;
using System.Globalization;
using System.Security.Cryptography;
using System.Text;

namespace Readiness.Testing.FaultLoad;

/// <summary>
/// Several real service processes on one store, a forge stand-in on 127.0.0.1, signed deliveries from concurrent
/// senders, <c>kill -9</c> of a random instance (then a restart) while jobs run, redeliveries of seen ids and forge
/// faults (500s, a rate limit with retry-after, a hung call). Measures answers and checks the end state on the forge:
/// one comment per pull request, a status on every head, no job failed.
/// </summary>
public sealed class FaultLoadHarness
{
    public const string Secret = "fault-load-webhook-secret";
    public const string Token = "fault-load-forge-token";
    public const string DataFolderVariable = "Readiness__DataFolder";
    private const int RetryAfterSeconds = 2;

    public static async Task<FaultLoadResult> RunAsync(FaultLoadOptions options, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(options);
        await using var forge = await ForgeStandIn.StartAsync().ConfigureAwait(false);
        forge.AcceptToken(Token);
        using var repo = ReleasePullRequestRepository.Create();
        using var data = new TempDirectory("readiness-fault-load-");
        var heads = new Dictionary<int, string>();
        for (var pr = 1; pr <= options.PullRequests; pr++)
        {
            var branch = $"prepare-2.4.0-{pr}";
            repo.Work.Branch(branch, ReleasePullRequestRepository.PullRequestBranch).Checkout(branch);
            repo.Work.Write("docs/notes.md", $"pull request {pr}\n").Commit($"Notes {pr}");
            heads[pr] = repo.Publish(pr, branch);
        }

        using var http = new HttpClient(new SocketsHttpHandler { MaxConnectionsPerServer = options.Senders * 2 }) { Timeout = TimeSpan.FromSeconds(30) };
        var instances = Enumerable.Range(0, options.Instances).Select(i => new ServiceProcess(options.ServiceDll, Environment(options, forge, data, i))).ToList();
        try
        {
            await Task.WhenAll(instances.Select(p => p.StartAsync(http, cancellationToken))).ConfigureAwait(false);
            var injected = InjectFaults(options, forge);

            var answers = new ConcurrentBag<double>();
            var codes = new ConcurrentDictionary<int, int>();
            var refused = 0;
            var next = -1;
            var clock = Stopwatch.StartNew();
            var killing = KillCyclesAsync(options, instances, http, cancellationToken);
            await Task.WhenAll(Enumerable.Range(0, options.Senders).Select(s => Task.Run(async () =>
            {
                int i;
                while ((i = Interlocked.Increment(ref next)) < options.Deliveries)
                {
                    var pr = (i % options.PullRequests) + 1;
                    var (code, ms, misses) = await DeliverAsync(http, instances, i, repo.Payload(i < options.PullRequests ? "opened" : "synchronize", pr, heads[pr]), $"load-{i:D5}", cancellationToken).ConfigureAwait(false);
                    Interlocked.Add(ref refused, misses);
                    answers.Add(ms);
                    codes.AddOrUpdate(code, 1, (_, n) => n + 1);
                }
            }, cancellationToken))).ConfigureAwait(false);

            // Redeliveries of ids already seen: answered as duplicates, no job added.
            var rowsBefore = options.JobsByState().Values.Sum();
            var duplicates = 0;
            for (var i = 0; i < options.Redeliveries; i++)
            {
                var index = i % options.Deliveries;
                var pr = (index % options.PullRequests) + 1;
                var (code, _, misses) = await DeliverAsync(http, instances, i, repo.Payload("synchronize", pr, heads[pr]), $"load-{index:D5}", cancellationToken).ConfigureAwait(false);
                Interlocked.Add(ref refused, misses);
                duplicates += code == 200 ? 1 : 0;
            }

            var extraJobs = options.JobsByState().Values.Sum() - rowsBefore;
            var kills = await killing.ConfigureAwait(false);
            await DrainAsync(options, TimeSpan.FromMinutes(10), cancellationToken).ConfigureAwait(false);
            var drained = clock.Elapsed;

            var comments = forge.AllComments();
            var perPullRequest = comments.GroupBy(c => c.Number).ToDictionary(g => g.Key, g => g.Count());
            var ms = answers.OrderBy(x => x).ToArray();
            return new FaultLoadResult(
                options.Deliveries,
                codes.ToDictionary(kv => kv.Key, kv => kv.Value),
                refused,
                Percentile(ms, 0.5),
                Percentile(ms, 0.99),
                ms.Length == 0 ? 0 : ms[^1],
                kills,
                options.Redeliveries,
                duplicates,
                extraJobs,
                options.PullRequests,
                Enumerable.Range(1, options.PullRequests).Count(pr => !perPullRequest.ContainsKey(pr)),
                perPullRequest.Values.Sum(n => n - 1),
                heads.Count(h => forge.Statuses(h.Value).Count == 0),
                options.JobsByState().GetValueOrDefault("failed"),
                injected,
                CallsSoonerThanRetryAfter(forge.Calls),
                drained.TotalSeconds);
        }
        finally
        {
            instances.ForEach(p => p.Dispose());
        }
    }

    private static Dictionary<string, string> Environment(FaultLoadOptions options, ForgeStandIn forge, TempDirectory data, int index)
    {
        // One SQLite file is one machine's store: its instances share the caller's data folder; others get their own.
        var folder = options.SharedDataFolder ? options.StoreSettings[DataFolderVariable] : data.Combine($"instance-{index}");
        Directory.CreateDirectory(folder);
        var settings = new Dictionary<string, string>(options.StoreSettings)
        {
            ["Readiness__Forge__ApiUrl"] = forge.BaseUrl.ToString(),
            ["Readiness__Forge__Token"] = Token,
            ["Readiness__Forge__WebhookSecret"] = Secret,
            ["Readiness__Forge__MaxRetries"] = "4",
            ["Readiness__Forge__MaxRetryDelayMilliseconds"] = "5000",
            ["Readiness__Forge__CallTimeoutMilliseconds"] = "2000",
            [DataFolderVariable] = folder,
            ["Readiness__Registry"] = "offline",
            ["Readiness__AllowNonHttpsCloneUrls"] = "true",
            ["Readiness__Worker__LeaseSeconds"] = "4",
            ["Readiness__Worker__PollMilliseconds"] = "200",
            ["Readiness__Worker__QuietMilliseconds"] = "200",
            ["Readiness__Worker__RetryDelayMilliseconds"] = "300",
            ["Readiness__Worker__MaxAttempts"] = "30",
            ["Logging__LogLevel__Default"] = "Warning",
            ["DOTNET_gcServer"] = "0",
        };
        return settings;
    }

    /// <summary>500s on statuses, a 429 with retry-after on the comment list, a call that hangs (the client's timeout cuts it).</summary>
    private static int InjectFaults(FaultLoadOptions options, ForgeStandIn forge)
    {
        if (!options.ForgeFaults)
        {
            return 0;
        }

        forge.FailNext("POST", "/statuses/", 500, times: 8);
        forge.FailNext("PATCH", "/issues/comments/", 502, times: 3);
        forge.FailNext("GET", "/issues/\\d+/comments$", 429, new Dictionary<string, string> { ["retry-after"] = RetryAfterSeconds.ToString(CultureInfo.InvariantCulture) }, times: 2);
        _ = forge.Hold("POST", "/issues/\\d+/comments$"); // never released
        return 8 + 3 + 2 + 1;
    }

    private static async Task<int> KillCyclesAsync(FaultLoadOptions options, List<ServiceProcess> instances, HttpClient http, CancellationToken cancellationToken)
    {
        var every = options.KillEvery ?? TimeSpan.FromMilliseconds(1500);
        var random = new Random(19);
        for (var k = 0; k < options.Kills; k++)
        {
            await Task.Delay(every, cancellationToken).ConfigureAwait(false);
            var victim = instances[random.Next(instances.Count)];
            victim.Kill();
            await Task.Delay(200, cancellationToken).ConfigureAwait(false);
            await victim.StartAsync(http, cancellationToken).ConfigureAwait(false);
        }

        return options.Kills;
    }

    /// <summary>Sends one signed delivery to a running instance, moving on to the next when one is down (a load balancer's retry).</summary>
    private static async Task<(int Code, double Milliseconds, int Refused)> DeliverAsync(
        HttpClient http, List<ServiceProcess> instances, int seed, string payload, string delivery, CancellationToken cancellationToken)
    {
        var body = Encoding.UTF8.GetBytes(payload);
        var signature = "sha256=" + Convert.ToHexStringLower(HMACSHA256.HashData(Encoding.UTF8.GetBytes(Secret), body));
        var refused = 0;
        var until = DateTime.UtcNow.AddSeconds(120);
        for (var attempt = 0; ; attempt++)
        {
            var target = instances[(seed + attempt) % instances.Count];
            using var request = new HttpRequestMessage(HttpMethod.Post, new Uri(target.Url, "hooks/github")) { Content = new ByteArrayContent(body) };
            request.Content.Headers.ContentType = new System.Net.Http.Headers.MediaTypeHeaderValue("application/json");
            request.Headers.Add("X-GitHub-Event", "pull_request");
            request.Headers.Add("X-GitHub-Delivery", delivery);
            request.Headers.Add("X-Hub-Signature-256", signature);
            var watch = Stopwatch.StartNew();
            try
            {
                using var answer = await http.SendAsync(request, cancellationToken).ConfigureAwait(false);
                return ((int)answer.StatusCode, watch.Elapsed.TotalMilliseconds, refused);
            }
            catch (HttpRequestException) when (DateTime.UtcNow < until)
            {
                // The instance was killed (or not yet back): the next one takes the delivery.
                refused++;
                await Task.Delay(50, cancellationToken).ConfigureAwait(false);
            }
        }
    }

    private static async Task DrainAsync(FaultLoadOptions options, TimeSpan timeout, CancellationToken cancellationToken)
    {
        var until = DateTime.UtcNow + timeout;
        var quietRounds = 0;
        while (quietRounds < 3)
        {
            if (DateTime.UtcNow > until)
            {
                throw new TimeoutException("jobs still pending: " + string.Join(", ", options.JobsByState().Select(kv => $"{kv.Key}={kv.Value}")));
            }

            var states = options.JobsByState();
            quietRounds = states.ContainsKey("queued") || states.ContainsKey("running") ? 0 : quietRounds + 1;
            await Task.Delay(200, cancellationToken).ConfigureAwait(false);
        }
    }

    /// <summary>Forge calls answered within the retry-after window of a 429 (a call already in flight may land in the first half second).</summary>
    private static int CallsSoonerThanRetryAfter(IReadOnlyList<ForgeCall> calls)
    {
        var limits = calls.Where(c => c.Status == 429).Select(c => c.At).ToList();
        return calls.Count(c => c.Status != 429 && limits.Any(t => c.At > t.AddMilliseconds(500) && c.At < t.AddSeconds(RetryAfterSeconds)));
    }

    private static double Percentile(double[] sorted, double p) =>
        sorted.Length == 0 ? 0 : sorted[Math.Min(sorted.Length - 1, (int)Math.Ceiling(p * sorted.Length) - 1)];
}
