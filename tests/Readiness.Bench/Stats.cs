using System.Diagnostics;

namespace Readiness.Bench;

/// <summary>Timing helpers: run an action N times and report median, p90 and min in milliseconds.</summary>
public static class Stats
{
    public static IReadOnlyList<double> Time(int runs, Action action)
    {
        ArgumentNullException.ThrowIfNull(action);
        var samples = new List<double>(runs);
        for (var i = 0; i < runs; i++)
        {
            var watch = Stopwatch.StartNew();
            action();
            samples.Add(watch.Elapsed.TotalMilliseconds);
        }

        return samples;
    }

    public static double Percentile(IReadOnlyList<double> samples, double p)
    {
        ArgumentNullException.ThrowIfNull(samples);
        var sorted = samples.Order().ToArray();
        var rank = (int)Math.Ceiling(p * sorted.Length) - 1;
        return sorted[Math.Clamp(rank, 0, sorted.Length - 1)];
    }

    public static string Describe(IReadOnlyList<double> samples) =>
        $"median {Percentile(samples, 0.5):0.0} ms, p90 {Percentile(samples, 0.9):0.0} ms, min {samples.Min():0.0} ms (n={samples.Count})";
}
