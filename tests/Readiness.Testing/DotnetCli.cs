using System.Diagnostics;

namespace Readiness.Testing;

/// <summary>
/// Runs the <c>dotnet</c> command line (the host running the tests when known) as a reference tool: quiet, no telemetry,
/// no build servers left behind, bounded in time.
/// </summary>
public static class DotnetCli
{
    private static readonly string[] KeptVariables = ["PATH", "HOME", "DOTNET_ROOT", "TMPDIR", "LANG", "SystemRoot", "USERPROFILE", "TEMP", "TMP"];

    /// <summary>The dotnet host: <c>DOTNET_HOST_PATH</c> when the test runner set it, else <c>dotnet</c> on PATH.</summary>
    public static string Host =>
        Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } host && File.Exists(host) ? host : "dotnet";

    /// <summary>
    /// Runs <c>dotnet ARGS</c> in <paramref name="workingDirectory"/>. <paramref name="cleanEnvironment"/> starts from
    /// only PATH, HOME, DOTNET_ROOT and the temp/locale variables, so the caller's MSBuild settings cannot leak in.
    /// </summary>
    public static ProcessResult Run(
        string workingDirectory,
        IEnumerable<string> args,
        IReadOnlyDictionary<string, string>? environment = null,
        bool cleanEnvironment = false,
        TimeSpan? timeout = null)
    {
        ArgumentNullException.ThrowIfNull(args);
        var start = new ProcessStartInfo(Host)
        {
            WorkingDirectory = workingDirectory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var a in args)
        {
            start.ArgumentList.Add(a);
        }

        if (cleanEnvironment)
        {
            start.Environment.Clear();
            foreach (var name in KeptVariables)
            {
                if (Environment.GetEnvironmentVariable(name) is { } value)
                {
                    start.Environment[name] = value;
                }
            }
        }

        start.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        start.Environment["DOTNET_NOLOGO"] = "1";
        start.Environment["DOTNET_SKIP_FIRST_TIME_EXPERIENCE"] = "1";
        start.Environment["MSBUILDDISABLENODEREUSE"] = "1";
        start.Environment["DOTNET_CLI_USE_MSBUILD_SERVER"] = "0";
        foreach (var (name, value) in environment ?? new Dictionary<string, string>())
        {
            start.Environment[name] = value;
        }

        using var process = Process.Start(start) ?? throw new InvalidOperationException("dotnet could not be started");
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        var limit = timeout ?? TimeSpan.FromMinutes(5);
        if (!process.WaitForExit(limit))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException($"dotnet {string.Join(' ', start.ArgumentList)} did not finish within {limit.TotalSeconds:0} s");
        }

        return new ProcessResult(process.ExitCode, stdout.Result, stderr.Result);
    }
}
