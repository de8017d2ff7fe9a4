using System.Collections.Concurrent;
using System.Diagnostics;
using System.Globalization;
using System.Net;
using System.Text;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using Readiness.Service;
using Readiness.Service.Storage;
using Readiness.Service.Webhooks;
using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>
/// Signed webhook deliveries fired at the real service (Kestrel on 127.0.0.1, SQLite file, bare mirrors, forge
/// stand-in): answer time p50/p99, time until every job is done, peak memory, and a check that no delivery was lost
/// or counted twice. Arguments: [deliveries=500] [senders=32] [pull requests=10] [pushes per pull request=5].
/// </summary>
public sealed class ServiceBench : IBench
{
    private const string Secret = "bench-webhook-secret";
    private const string Token = "bench-forge-token";
    private const int WarmUpPullRequest = 1000;

    public string Name => "service";

    public string Description => "500 signed deliveries, 32 senders: webhook answer p50/p99, time to drain, peak memory";

    public async Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        var deliveries = Arg(args, 0, 500);
        var senders = Arg(args, 1, 32);
        var pullRequests = Arg(args, 2, 10);
        var pushes = Arg(args, 3, 5);

        await using var forge = await ForgeStandIn.StartAsync();
        forge.AcceptToken(Token);
        using var repo = ReleasePullRequestRepository.Create();
        using var data = new TempDirectory("readiness-bench-");

        // Every pull request gets `pushes` head commits, published one after another as the deliveries go out.
        var heads = new string[pullRequests + 1][];
        for (var pr = 1; pr <= pullRequests; pr++)
        {
            var branch = $"prepare-2.4.0-{pr}";
            repo.Work.Branch(branch, ReleasePullRequestRepository.PullRequestBranch).Checkout(branch);
            heads[pr] = new string[pushes];
            for (var p = 0; p < pushes; p++)
            {
                heads[pr][p] = repo.Work.Write("docs/notes.md", $"pull request {pr}, push {p}\n").Commit($"Notes {pr}.{p}");
            }

            repo.Publish(pr, branch);
        }

        var app = ServiceApp.Build([], b =>
        {
            b.WebHost.UseUrls("http://127.0.0.1:0");
            b.Logging.ClearProviders();
            b.Configuration.AddInMemoryCollection(new Dictionary<string, string?>
            {
                ["Readiness:Forge:ApiUrl"] = forge.BaseUrl.ToString(),
                ["Readiness:Forge:Token"] = Token,
                ["Readiness:Forge:WebhookSecret"] = Secret,
                ["Readiness:DataFolder"] = data.Path,
                ["Readiness:Registry"] = "offline",
                ["Readiness:AllowNonHttpsCloneUrls"] = "true",
                ["Readiness:Worker:PollMilliseconds"] = "200",
                ["Readiness:Worker:Count"] = Environment.GetEnvironmentVariable("BENCH_WORKERS") ?? "2",
            });
        });
        await app.StartAsync(cancellationToken);
        var url = app.Urls.First();
        var jobs = app.Services.GetRequiredService<IJobStore>();
        var runs = app.Services.GetRequiredService<IRunStore>();

        using var handler = new SocketsHttpHandler { MaxConnectionsPerServer = senders, PooledConnectionLifetime = TimeSpan.FromMinutes(5) };
        using var client = new HttpClient(handler) { BaseAddress = new Uri(url) };

        // Warm-up, not timed: a ping, then one job on a pull request of its own, so that compiling the code paths
        // once (web stack, worker, engine, forge client) does not count as answer time.
        await SendAsync(client, "{\"zen\":\"warm\"}", "warm-up", "ping", cancellationToken);
        var warmHead = repo.Publish(WarmUpPullRequest, ReleasePullRequestRepository.PullRequestBranch);
        var warmClock = Stopwatch.StartNew();
        await Task.WhenAll(Enumerable.Range(0, senders).Select(i =>
            SendAsync(client, repo.Payload("synchronize", WarmUpPullRequest, warmHead), $"warm-up-{i}", "pull_request", cancellationToken)));
        await DrainAsync(jobs, cancellationToken);
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"warm-up              {senders} deliveries and their job after start: {warmClock.Elapsed.TotalSeconds:0.00} s (not counted below)"));

        var answers = new ConcurrentBag<double>();
        var statusCounts = new ConcurrentDictionary<HttpStatusCode, int>();
        var newest = new ConcurrentDictionary<int, (int Index, string Sha)>();
        var next = -1;
        var clock = Stopwatch.StartNew();
        var before = GC.CollectionCount(0);
        await Task.WhenAll(Enumerable.Range(0, senders).Select(_ => Task.Run(async () =>
        {
            int i;
            while ((i = Interlocked.Increment(ref next)) < deliveries)
            {
                var pr = (i % pullRequests) + 1;
                var push = Math.Min(pushes - 1, i / Math.Max(1, deliveries / pushes) % pushes);
                var sha = heads[pr][push];
                var payload = repo.Payload("synchronize", pr, sha);
                var watch = Stopwatch.StartNew();
                var status = await SendAsync(client, payload, $"bench-{i:D5}", "pull_request", cancellationToken);
                answers.Add(watch.Elapsed.TotalMilliseconds);
                statusCounts.AddOrUpdate(status, 1, (_, n) => n + 1);
                newest.AddOrUpdate(pr, (i, sha), (_, old) => old.Index > i ? old : (i, sha));
            }
        }, cancellationToken)));
        var sent = clock.Elapsed;

        // Redeliveries of ids already seen must change nothing.
        var duplicates = 0;
        for (var i = 0; i < Math.Min(50, deliveries); i++)
        {
            var pr = (i % pullRequests) + 1;
            if (await SendAsync(client, repo.Payload("synchronize", pr, heads[pr][0]), $"bench-{i:D5}", "pull_request", cancellationToken) == HttpStatusCode.OK)
            {
                duplicates++;
            }
        }

        await DrainAsync(jobs, cancellationToken);
        var drained = clock.Elapsed;
        var states = jobs.CountByState();
        var recorded = CountDeliveries(Path.Combine(data.Path, "readiness.db"));
        var finalShas = LastRunShas(Path.Combine(data.Path, "readiness.db"));
        var lost = Enumerable.Range(1, pullRequests).Count(pr => !finalShas.TryGetValue(pr, out var s) || s != newest[pr].Sha);
        var comments = forge.AllComments();
        var peak = Process.GetCurrentProcess().PeakWorkingSet64;
        await app.StopAsync(cancellationToken);
        await app.DisposeAsync();
        SqliteConnection.ClearAllPools();

        var ms = answers.ToArray();
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"deliveries sent      {deliveries} by {senders} senders to {pullRequests} pull requests ({pushes} pushes each), in {sent.TotalSeconds:0.00} s"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"answers              {string.Join(", ", statusCounts.OrderBy(kv => kv.Key).Select(kv => $"{(int)kv.Key} x{kv.Value}"))}"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"webhook answer time  p50 {Stats.Percentile(ms, 0.5):0.0} ms, p99 {Stats.Percentile(ms, 0.99):0.0} ms, max {ms.Max():0.0} ms (target: p99 <= 50 ms)"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"all jobs done after  {drained.TotalSeconds:0.00} s from the first delivery"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"jobs (with warm-up)  {string.Join(", ", states.OrderBy(kv => kv.Key, StringComparer.Ordinal).Select(kv => $"{kv.Key} {kv.Value}"))}; runs stored {runs.Count()} (warm-up: 1)"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"deliveries recorded  {recorded.Total} (linked to a job: {recorded.Linked}; warm-up: {senders + 1}); redeliveries answered as duplicates {duplicates}/{Math.Min(50, deliveries)}"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"comments             {comments.Count} (one per pull request expected: {pullRequests} + warm-up); statuses {forge.Statuses().Count}; forge calls {forge.Calls.Count}"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"newest head reported {pullRequests - lost}/{pullRequests} pull requests; lost or stale: {lost}"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"peak working set     {peak / (1024.0 * 1024.0):0} MiB (whole process: service, forge stand-in, git)"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"gen0 collections     {GC.CollectionCount(0) - before}"));
        var ok = recorded.Total == deliveries + senders + 1 && recorded.Linked == deliveries + senders && lost == 0 && comments.Count == pullRequests + 1
            && duplicates == Math.Min(50, deliveries) && !states.ContainsKey(JobState.Failed);
        Console.WriteLine(ok ? "verdict              no delivery lost or duplicated" : "verdict              PROBLEM: see the figures above");
    }

    private static async Task DrainAsync(IJobStore jobs, CancellationToken cancellationToken)
    {
        while (true)
        {
            var counts = jobs.CountByState();
            if (!counts.ContainsKey(JobState.Queued) && !counts.ContainsKey(JobState.Running))
            {
                return;
            }

            await Task.Delay(20, cancellationToken);
        }
    }

    private static async Task<HttpStatusCode> SendAsync(HttpClient client, string payload, string delivery, string eventName, CancellationToken cancellationToken)
    {
        var bytes = Encoding.UTF8.GetBytes(payload);
        using var request = new HttpRequestMessage(HttpMethod.Post, WebhookEndpoint.Path) { Content = new ByteArrayContent(bytes) };
        request.Content.Headers.ContentType = new System.Net.Http.Headers.MediaTypeHeaderValue("application/json");
        request.Headers.Add(WebhookEndpoint.EventHeader, eventName);
        request.Headers.Add(WebhookEndpoint.DeliveryHeader, delivery);
        request.Headers.Add(WebhookSignature.Header, WebhookSignature.Compute(Secret, bytes));
        using var response = await client.SendAsync(request, cancellationToken);
        return response.StatusCode;
    }

    private static (long Total, long Linked) CountDeliveries(string path)
    {
        using var connection = new SqliteConnection($"Data Source={path};Mode=ReadOnly;Pooling=False");
        connection.Open();
        using var q = connection.CreateCommand();
        q.CommandText = "SELECT COUNT(*), COUNT(job_id) FROM deliveries";
        using var r = q.ExecuteReader();
        r.Read();
        return (r.GetInt64(0), r.GetInt64(1));
    }

    private static Dictionary<int, string> LastRunShas(string path)
    {
        using var connection = new SqliteConnection($"Data Source={path};Mode=ReadOnly;Pooling=False");
        connection.Open();
        using var q = connection.CreateCommand();
        q.CommandText = "SELECT pr_number, commit_sha FROM runs WHERE id IN (SELECT MAX(id) FROM runs GROUP BY pr_number)";
        using var r = q.ExecuteReader();
        var result = new Dictionary<int, string>();
        while (r.Read())
        {
            result[r.GetInt32(0)] = r.GetString(1);
        }

        return result;
    }

    private static int Arg(string[] args, int index, int fallback) =>
        args.Length > index && int.TryParse(args[index], NumberStyles.Integer, CultureInfo.InvariantCulture, out var v) && v > 0 ? v : fallback;
}
