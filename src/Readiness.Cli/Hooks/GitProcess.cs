using Readiness.Git;

namespace Readiness.Cli.Hooks;

/// <summary>The hook commands' use of git (<see cref="GitCommand"/>): output trimmed, a time limit of 15 seconds.</summary>
public static class GitProcess
{
    public static readonly TimeSpan Timeout = TimeSpan.FromSeconds(15);

    public static (int ExitCode, string Output, string Error) Run(string workingDirectory, params string[] arguments)
    {
        var result = GitCommand.Run(workingDirectory, arguments, null, Timeout);
        return result.TimedOut
            ? (-1, string.Empty, $"git {string.Join(' ', arguments)} did not finish within {Timeout.TotalSeconds:0} s")
            : (result.ExitCode, result.Output.TrimEnd('\n', '\r'), result.Error.TrimEnd('\n', '\r'));
    }

    /// <summary>Runs git and returns its output, or throws with git's own message.</summary>
    public static string Require(string workingDirectory, params string[] arguments)
    {
        var (code, output, error) = Run(workingDirectory, arguments);
        return code == 0 ? output : throw new Core.Snapshots.RepositoryInspectionException($"git {string.Join(' ', arguments)}: {(error.Length > 0 ? error : $"exit code {code}")}");
    }
}
