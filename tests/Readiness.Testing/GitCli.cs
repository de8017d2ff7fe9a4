using System.Diagnostics;

namespace Readiness.Testing;

/// <summary>
/// Runs the <c>git</c> command line for tests, independent of the machine's global and system configuration:
/// identity, dates and signing settings come from the caller, never from ~/.gitconfig.
/// </summary>
public static class GitCli
{
    public const string UserName = "Bramblecote Dev";

    public const string UserEmail = "dev@bramblecote.example";

    private static readonly TimeSpan Timeout = TimeSpan.FromSeconds(60);

    /// <summary>Runs git and returns its exit code and output; never throws for a non-zero exit.</summary>
    public static GitResult TryRun(
        string workingDirectory,
        IEnumerable<string> args,
        IReadOnlyDictionary<string, string>? environment = null,
        string? stdin = null)
    {
        ArgumentNullException.ThrowIfNull(workingDirectory);
        ArgumentNullException.ThrowIfNull(args);
        var start = new ProcessStartInfo("git")
        {
            WorkingDirectory = workingDirectory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
        };

        // Per-invocation identity and settings: the machine's own git configuration must not matter.
        foreach (var arg in (string[])["-c", $"user.name={UserName}", "-c", $"user.email={UserEmail}",
                     "-c", "commit.gpgsign=false", "-c", "tag.gpgsign=false", "-c", "init.defaultBranch=main",
                     "-c", "core.autocrlf=false", "-c", "advice.detachedHead=false"])
        {
            start.ArgumentList.Add(arg);
        }

        foreach (var arg in args)
        {
            start.ArgumentList.Add(arg);
        }

        foreach (var name in (string[])["GIT_DIR", "GIT_WORK_TREE", "GIT_INDEX_FILE", "GIT_OBJECT_DIRECTORY",
                     "GIT_ALTERNATE_OBJECT_DIRECTORIES", "GIT_NAMESPACE", "GIT_CEILING_DIRECTORIES",
                     "GIT_AUTHOR_DATE", "GIT_COMMITTER_DATE", "GIT_AUTHOR_NAME", "GIT_AUTHOR_EMAIL",
                     "GIT_COMMITTER_NAME", "GIT_COMMITTER_EMAIL"])
        {
            start.Environment.Remove(name);
        }

        start.Environment["GIT_CONFIG_NOSYSTEM"] = "1";
        start.Environment["GIT_CONFIG_GLOBAL"] = OperatingSystem.IsWindows() ? "NUL" : "/dev/null";
        start.Environment["GIT_TERMINAL_PROMPT"] = "0";
        start.Environment["GIT_PAGER"] = "cat";
        start.Environment["LC_ALL"] = "C";
        start.Environment["GIT_AUTHOR_NAME"] = UserName;
        start.Environment["GIT_AUTHOR_EMAIL"] = UserEmail;
        start.Environment["GIT_COMMITTER_NAME"] = UserName;
        start.Environment["GIT_COMMITTER_EMAIL"] = UserEmail;
        foreach (var (name, value) in environment ?? new Dictionary<string, string>())
        {
            start.Environment[name] = value;
        }

        using var process = Process.Start(start) ?? throw new InvalidOperationException("git could not be started.");
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (stdin is not null)
        {
            process.StandardInput.Write(stdin);
        }

        process.StandardInput.Close();
        if (!process.WaitForExit(Timeout))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException($"git {string.Join(' ', start.ArgumentList)} did not finish within {Timeout.TotalSeconds} s.");
        }

        process.WaitForExit();
        return new GitResult(process.ExitCode, stdout.GetAwaiter().GetResult(), stderr.GetAwaiter().GetResult());
    }

    /// <summary>Runs git and returns its standard output; throws with git's error output on a non-zero exit.</summary>
    public static string Run(
        string workingDirectory,
        IEnumerable<string> args,
        IReadOnlyDictionary<string, string>? environment = null,
        string? stdin = null)
    {
        var list = args.ToArray();
        var result = TryRun(workingDirectory, list, environment, stdin);
        return result.Succeeded
            ? result.StdOut
            : throw new InvalidOperationException(
                $"git {string.Join(' ', list)} exited with {result.ExitCode}: {result.StdErr.Trim()}");
    }

    /// <summary>A date in the form git reads from GIT_AUTHOR_DATE / GIT_COMMITTER_DATE (ISO 8601 with offset).</summary>
    public static string FormatDate(DateTimeOffset date) =>
        date.ToString("yyyy-MM-dd'T'HH:mm:sszzz", System.Globalization.CultureInfo.InvariantCulture);
}
