namespace Readiness.Testing.Hostile;

/// <summary>One run of the program on a hostile case in one format: exit code, output, wall time and peak resident memory.</summary>
public sealed record HostileRun(string Case, string Format, int ExitCode, bool TimedOut, string Output, string Error, TimeSpan Elapsed, long PeakRssBytes)
{
    public double PeakRssMegabytes => PeakRssBytes / (1024.0 * 1024.0);
}
