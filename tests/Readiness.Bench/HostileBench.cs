using System.Globalization;
using Readiness.Testing.Hostile;

namespace Readiness.Bench;

/// <summary>
/// Runs the hostile corpus (every case, every format) through a readiness program and prints, per case, the exits,
/// the slowest run and the peak resident memory, then the problem counts by kind. Full size by default; the test
/// suite runs the same cases small.
/// </summary>
public sealed class HostileBench : IBench
{
    public string Name => "hostile";

    public string Description => "hostile corpus at full size: crashes, hangs, memory, leaks, fail-open [--program P] [--scale N] [--only NAME]";

    public Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        var program = Option(args, "--program") ?? ReadinessProcess.AppHost;
        var scale = int.Parse(Option(args, "--scale") ?? "10", CultureInfo.InvariantCulture);
        var only = Option(args, "--only");
        var timeout = TimeSpan.FromSeconds(int.Parse(Option(args, "--timeout") ?? "120", CultureInfo.InvariantCulture));
        var kinds = new Dictionary<string, int>(StringComparer.Ordinal);
        HostileRun? slowest = null;
        HostileRun? largest = null;
        var cases = HostileCorpus.All.Where(c => only is null || c.Name.Contains(only, StringComparison.Ordinal)).ToList();
        Console.WriteLine($"program {program}, scale {scale}, {cases.Count} cases x {HostileRunner.Formats.Count} formats");
        foreach (var hostile in cases)
        {
            IReadOnlyList<HostileRun> runs;
            try
            {
                runs = HostileRunner.Run(program, hostile, scale, timeout);
            }
            catch (InvalidOperationException e)
            {
                Console.WriteLine($"{hostile.Name,-36} could not build: {e.Message}");
                continue;
            }

            var problems = runs.SelectMany(r => HostileVerdict.Problems(hostile, r).Select(p => (r.Format, p.Kind, p.Detail))).ToList();
            foreach (var kind in problems.Select(p => p.Kind).Distinct())
            {
                kinds[kind] = kinds.GetValueOrDefault(kind) + 1;
            }

            var slow = runs.MaxBy(r => r.Elapsed)!;
            var big = runs.MaxBy(r => r.PeakRssBytes)!;
            slowest = slowest is null || slow.Elapsed > slowest.Elapsed ? slow : slowest;
            largest = largest is null || big.PeakRssBytes > largest.PeakRssBytes ? big : largest;
            var exits = string.Join(",", runs.Select(r => r.TimedOut ? "T" : r.ExitCode.ToString(CultureInfo.InvariantCulture)));
            Console.WriteLine($"{hostile.Name,-36} exits {exits,-12} {slow.Elapsed.TotalSeconds,6:F2} s {big.PeakRssMegabytes,7:F0} MB  {string.Join("; ", problems.Select(p => p.Kind).Distinct())}");
            foreach (var (format, kind, detail) in problems.DistinctBy(p => p.Kind))
            {
                Console.WriteLine($"    {kind} ({format}): {detail}");
            }
        }

        Console.WriteLine("cases with a problem, by kind: " + (kinds.Count == 0 ? "none" : string.Join(", ", kinds.OrderBy(k => k.Key, StringComparer.Ordinal).Select(k => $"{k.Key} {k.Value}"))));
        if (slowest is not null && largest is not null)
        {
            Console.WriteLine($"slowest: {slowest.Case} ({slowest.Format}) {slowest.Elapsed.TotalSeconds:F2} s; largest: {largest.Case} ({largest.Format}) {largest.PeakRssMegabytes:F0} MB");
        }

        return Task.CompletedTask;
    }

    private static string? Option(string[] args, string name)
    {
        var at = Array.IndexOf(args, name);
        return at >= 0 && at + 1 < args.Length ? args[at + 1] : null;
    }
}
