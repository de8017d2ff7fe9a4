using System.ComponentModel;
using System.Diagnostics;

namespace Readiness.Git;

/// <summary>
/// Runs the git executable — the only program the tool runs — with arguments passed one by one (no shell), standard
/// input closed, and a time limit after which the process tree is killed.
/// </summary>
public static class GitCommand
{
    /// <param name="workingDirectory">Where git runs.</param>
    /// <param name="arguments">git's arguments, each passed as given.</param>
    /// <param name="environment">Variables to set; a null value removes the variable from git's environment.</param>
    /// <param name="timeout">How long git may take.</param>
    /// <exception cref="Win32Exception">git could not be started (not installed, not on PATH).</exception>
    public static GitCommandResult Run(
        string workingDirectory,
        IEnumerable<string> arguments,
        IReadOnlyDictionary<string, string?>? environment,
        TimeSpan timeout)
    {
        ArgumentNullException.ThrowIfNull(arguments);
        var start = new ProcessStartInfo("git")
        {
            WorkingDirectory = workingDirectory,
            UseShellExecute = false,
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
        };
        foreach (var argument in arguments)
        {
            start.ArgumentList.Add(argument);
        }

        foreach (var (name, value) in environment ?? new Dictionary<string, string?>())
        {
            if (value is null)
            {
                start.Environment.Remove(name);
            }
            else
            {
                start.Environment[name] = value;
            }
        }

        using var process = Process.Start(start) ?? throw new Win32Exception("git did not start");
        process.StandardInput.Close();
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(timeout))
        {
            try
            {
                process.Kill(entireProcessTree: true);
            }
            catch (InvalidOperationException)
            {
                // It ended on its own meanwhile.
            }

            return new GitCommandResult(-1, string.Empty, string.Empty, TimedOut: true);
        }

        process.WaitForExit();
        return new GitCommandResult(process.ExitCode, stdout.GetAwaiter().GetResult(), stderr.GetAwaiter().GetResult(), TimedOut: false);
    }
}
