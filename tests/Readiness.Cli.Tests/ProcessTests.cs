using System.Diagnostics;
using Readiness.Testing;

namespace Readiness.Cli.Tests;

/// <summary>The built program as a separate process: exit codes and the redirected-output default format.</summary>
public sealed class ProcessTests
{
    public static string Program => CliHarness.Program;

    public static (int Exit, string Out, string Error) Run(string directory, params string[] args) => RunProgram(Program, directory, args);

    /// <summary>Runs a readiness program (this build's, or an installed one) without colour, bounded to 60 seconds.</summary>
    public static (int Exit, string Out, string Error) RunProgram(string program, string directory, params string[] args) =>
        RunProgram(program, directory, new Dictionary<string, string?>(), args);

    /// <summary>As above, with <paramref name="environment"/> set on top of this process's (a null value removes one).</summary>
    public static (int Exit, string Out, string Error) RunProgram(string program, string directory, IReadOnlyDictionary<string, string?> environment, params string[] args)
    {
        ArgumentNullException.ThrowIfNull(environment);
        var info = new ProcessStartInfo(program) { WorkingDirectory = directory, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in args)
        {
            info.ArgumentList.Add(a);
        }

        info.Environment["NO_COLOR"] = "1";
        foreach (var (name, value) in environment)
        {
            if (value is null)
            {
                info.Environment.Remove(name);
            }
            else
            {
                info.Environment[name] = value;
            }
        }

        using var process = Process.Start(info)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        Assert.True(process.WaitForExit(60_000), "readiness did not finish within 60 s");
        return (process.ExitCode, output.Result, error.Result);
    }

    [Fact]
    public void Check_AsAProcess_WritesPlainTextWhenRedirected_AndExitsOneWhenNotReady()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Delete("CHANGELOG.md").Commit("Drop the changelog");
        repo.AnnotatedTag("v1.2.1", "1.2.1\n");
        var (exit, output, _) = Run(repo.Path, "check", "--offline", "--version", "1.2.1");
        Assert.Equal(1, exit);
        // Piped output (a CI log) is plain text: no Markdown marker, no terminal escapes, the verdict first and last.
        Assert.StartsWith("NOT READY  ", output, StringComparison.Ordinal);
        Assert.DoesNotContain("<!-- readiness-report -->", output, StringComparison.Ordinal);
        Assert.DoesNotContain('\u001b', output);
        Assert.StartsWith("NOT READY: 1.2.1 — ", output.TrimEnd('\n').Split('\n')[^1], StringComparison.Ordinal);
        Assert.Contains("changelog.present", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_AsAProcess_OutsideARepository_ExitsThree()
    {
        using var folder = new TempDirectory();
        var (exit, _, error) = Run(folder.Path, "check", "--offline");
        Assert.Equal(3, exit);
        Assert.Contains("not a git repository", error, StringComparison.OrdinalIgnoreCase);
    }
}
