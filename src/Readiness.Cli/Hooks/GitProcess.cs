using System.Diagnostics;

namespace Readiness.Cli.Hooks;

/// <summary>Runs the git executable (the only program the tool runs) with arguments passed as a list, bounded in time.</summary>
public static class GitProcess
{
    public static readonly TimeSpan Timeout = TimeSpan.FromSeconds(15);

    public static (int ExitCode, string Output, string Error) Run(string workingDirectory, params string[] arguments)
    {
        var info = new ProcessStartInfo("git")
        {
            WorkingDirectory = workingDirectory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
        };
        foreach (var argument in arguments)
        {
            info.ArgumentList.Add(argument);
        }

        using var process = Process.Start(info) ?? throw new InvalidOperationException("git could not be started");
        process.StandardInput.Close();
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(Timeout))
        {
            process.Kill(entireProcessTree: true);
            return (-1, string.Empty, $"git {string.Join(' ', arguments)} did not finish within {Timeout.TotalSeconds:0} s");
        }

        return (process.ExitCode, output.Result.TrimEnd('\n', '\r'), error.Result.TrimEnd('\n', '\r'));
    }

    /// <summary>Runs git and returns its output, or throws with git's own message.</summary>
    public static string Require(string workingDirectory, params string[] arguments)
    {
        var (code, output, error) = Run(workingDirectory, arguments);
        return code == 0 ? output : throw new Core.Snapshots.RepositoryInspectionException($"git {string.Join(' ', arguments)}: {(error.Length > 0 ? error : $"exit code {code}")}");
    }
}
