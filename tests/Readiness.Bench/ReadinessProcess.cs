using System.Diagnostics;

namespace Readiness.Bench;

/// <summary>Starts the built <c>readiness</c> program as a separate process (process start included in timings).</summary>
public static class ReadinessProcess
{
    public static string AppHost => Path.Combine(AppContext.BaseDirectory, OperatingSystem.IsWindows() ? "readiness.exe" : "readiness");

    public static (string File, string[] Prefix) Command =>
        File.Exists(AppHost) ? (AppHost, []) : ("dotnet", [Path.Combine(AppContext.BaseDirectory, "readiness.dll")]);

    public static int Run(string directory, params string[] args)
    {
        var (file, prefix) = Command;
        var info = new ProcessStartInfo(file) { WorkingDirectory = directory, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in prefix.Concat(args))
        {
            info.ArgumentList.Add(a);
        }

        using var process = Process.Start(info)!;
        process.StandardOutput.ReadToEnd();
        process.StandardError.ReadToEnd();
        process.WaitForExit();
        return process.ExitCode;
    }
}
