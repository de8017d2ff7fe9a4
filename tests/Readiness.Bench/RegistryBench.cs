using System.Diagnostics;
using Readiness.Core.Engine;
using Readiness.Registries;
using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>
/// The registry phase for 20 package ids against a V3 feed served on 127.0.0.1: cold (empty on-disk cache, new
/// connections) and warm (answers cached on disk), beside one plain round trip to the same feed. Measured twice: on
/// bare loopback, and with a fixed latency added to every answer to stand for the network to a real feed. Targets:
/// warm at most 50 ms; cold about one round trip for all ids together (they are looked up in parallel), after the
/// one round trip for the service index.
/// </summary>
public sealed class RegistryBench : IBench
{
    private const int Ids = 20;

    public string Name => "registry";

    public string Description => $"registry phase for {Ids} ids on a local HTTP feed, cold and warm cache";

    public async Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        var runs = args.Length > 0 && int.TryParse(args[0], out var n) ? n : 15;
        var config = Path.Combine(Path.GetTempPath(), $"readiness-bench-{Guid.NewGuid():N}.config");
        await File.WriteAllTextAsync(config, "<configuration><packageSources><clear /></packageSources></configuration>", cancellationToken);
        try
        {
            await MeasureAsync(TimeSpan.Zero, runs, config, cancellationToken);
            await MeasureAsync(TimeSpan.FromMilliseconds(50), Math.Max(3, runs / 2), config, cancellationToken);
        }
        finally
        {
            File.Delete(config);
        }
    }

    private static async Task MeasureAsync(TimeSpan latency, int runs, string config, CancellationToken cancellationToken)
    {
        using var feed = LocalHttpFeed.Start();
        feed.Latency = latency;
        var ids = Enumerable.Range(1, Ids).Select(i => $"Bramble.Sketches.Part{i:00}").ToArray();
        foreach (var id in ids)
        {
            foreach (var version in new[] { "1.0.0", "1.1.0", "2.0.0-beta.1", "2.0.0", "2.1.3" })
            {
                feed.Add(id, version);
            }
        }

        var cacheRoot = Path.Combine(Path.GetTempPath(), $"readiness-bench-cache-{Guid.NewGuid():N}");
        try
        {
            // One round trip: a GET of the service index on an open connection.
            using var http = new HttpClient();
            await http.GetStringAsync(feed.ServiceIndexUrl, cancellationToken);
            var roundTrip = await TimeAsync(runs, () => http.GetStringAsync(feed.ServiceIndexUrl, cancellationToken));

            var options = new RegistryOptions { NuGetConfigFile = config };
            var folder = 0;
            async Task Phase(RegistryOptions o)
            {
                var registry = RegistryFactory.Create(feed.ServiceIndexUrl, o);
                try
                {
                    var facts = await RegistryPhase.GatherAsync(registry, ids, RegistryPhase.DefaultTimeout, cancellationToken);
                    if (facts.Packages.Values.Any(p => !p.Available || !p.Exists))
                    {
                        throw new InvalidOperationException("the bench feed did not answer every id");
                    }
                }
                finally
                {
                    (registry as IDisposable)?.Dispose();
                }
            }

            // Warm-up of the code paths (JIT), not of the cache: each cold run gets a fresh, empty cache folder.
            await Phase(options with { CacheFolder = Path.Combine(cacheRoot, "warmup") });
            var cold = await TimeAsync(runs, () => Phase(options with { CacheFolder = Path.Combine(cacheRoot, $"cold{folder++}") }));
            var warmFolder = Path.Combine(cacheRoot, "warm");
            await Phase(options with { CacheFolder = warmFolder });
            var requestsBefore = feed.Requests.Count;
            var warm = await TimeAsync(runs, () => Phase(options with { CacheFolder = warmFolder }));
            var warmRequests = feed.Requests.Count - requestsBefore;
            var sequential = await TimeAsync(Math.Max(3, runs / 3), async () =>
            {
                using var registry = new NuGetFeedRegistry(new Uri(feed.ServiceIndexUrl), options with { NoCache = true });
                foreach (var id in ids)
                {
                    await registry.LookupAsync(id, cancellationToken);
                }
            });

            var rtt = Stats.Percentile(roundTrip, 0.5);
            Console.WriteLine($"-- added latency per answer: {latency.TotalMilliseconds:0} ms");
            Console.WriteLine($"one round trip (service index GET, open connection): {Stats.Describe(roundTrip)}");
            Console.WriteLine($"cold phase, {Ids} ids in parallel (empty cache, new client): {Stats.Describe(cold)}"
                + (latency > TimeSpan.Zero ? $" = {Stats.Percentile(cold, 0.5) / rtt:0.0} round trips (service index, then all ids at once)" : string.Empty));
            Console.WriteLine($"warm phase, {Ids} ids from the disk cache: {Stats.Describe(warm)}; feed requests: {warmRequests}");
            Console.WriteLine($"for comparison, {Ids} ids one after another (no cache): {Stats.Describe(sequential)}"
                + (latency > TimeSpan.Zero ? $" = {Stats.Percentile(sequential, 0.5) / rtt:0.0} round trips" : string.Empty));
            Console.WriteLine($"target warm <= 50 ms: {(Stats.Percentile(warm, 0.5) <= 50 ? "met" : "MISSED")} (median)");
        }
        finally
        {
            if (Directory.Exists(cacheRoot))
            {
                Directory.Delete(cacheRoot, recursive: true);
            }
        }
    }

    private static async Task<IReadOnlyList<double>> TimeAsync(int runs, Func<Task> action)
    {
        var samples = new List<double>(runs);
        for (var i = 0; i < runs; i++)
        {
            var watch = Stopwatch.StartNew();
            await action();
            samples.Add(watch.Elapsed.TotalMilliseconds);
        }

        return samples;
    }
}
