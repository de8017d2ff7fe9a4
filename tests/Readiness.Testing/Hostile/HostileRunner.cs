using System.Diagnostics;
using System.Globalization;

namespace Readiness.Testing.Hostile;

/// <summary>
/// Builds a <see cref="HostileCase"/> and runs a <c>readiness</c> program on it, <c>check --offline</c> once per
/// format, measuring wall time and peak resident set size (VmHWM of /proc/PID/status, proc(5), sampled while it runs).
/// </summary>
public static class HostileRunner
{
    public static readonly IReadOnlyList<string> Formats = ["text", "markdown", "html", "json"];

    public static IReadOnlyList<HostileRun> Run(string program, HostileCase hostile, int scale, TimeSpan timeout)
    {
        ArgumentNullException.ThrowIfNull(hostile);
        using var repository = SampleLibrary.ReadyRelease("1.2.0");
        var outside = Path.Combine(Path.GetDirectoryName(repository.Path)!, "outside");
        Directory.CreateDirectory(outside);
        hostile.Build(new HostileBuild(repository, scale, outside));
        return [.. Formats.Select(format => RunOnce(program, hostile.Name, repository.Path, format, [.. hostile.Args], timeout))];
    }

    public static HostileRun RunOnce(string program, string name, string directory, string format, string[] extra, TimeSpan timeout)
    {
        var info = new ProcessStartInfo(program) { WorkingDirectory = directory, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in (string[])["check", "--offline", "--format", format, .. extra])
        {
            info.ArgumentList.Add(a);
        }

        info.Environment["NO_COLOR"] = "1";
        info.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        var clock = Stopwatch.StartNew();
        using var process = Process.Start(info)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        long peak = 0;
        var deadline = clock.Elapsed + timeout;
        while (!process.WaitForExit(15))
        {
            peak = Math.Max(peak, PeakRss(process.Id));
            if (clock.Elapsed > deadline)
            {
                process.Kill(entireProcessTree: true);
                process.WaitForExit();
                return new HostileRun(name, format, -1, true, output.Result, error.Result, clock.Elapsed, peak);
            }
        }

        clock.Stop();
        return new HostileRun(name, format, process.ExitCode, false, output.Result, error.Result, clock.Elapsed, peak);
    }

    /// <summary>VmHWM ("peak resident set size", proc(5)) in bytes, or 0 once the process is gone.</summary>
    private static long PeakRss(int pid)
    {
        try
        {
            foreach (var line in File.ReadLines($"/proc/{pid}/status"))
            {
                if (line.StartsWith("VmHWM:", StringComparison.Ordinal))
                {
                    var kb = line["VmHWM:".Length..].Trim().Split(' ')[0];
                    return long.Parse(kb, CultureInfo.InvariantCulture) * 1024;
                }
            }
        }
        catch (IOException)
        {
        }
        catch (UnauthorizedAccessException)
        {
        }

        return 0;
    }
}
