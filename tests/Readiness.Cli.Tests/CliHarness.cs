using System.Diagnostics;

namespace Readiness.Cli.Tests;

/// <summary>
/// Runs the CLI with captured output: in-process, or — when <c>READINESS_TEST_PROGRAM</c> names a published
/// <c>readiness</c> executable — as that program, so the same end-to-end cases hold the shipped build.
/// </summary>
internal static class CliHarness
{
    /// <summary>The published program the cases run against, or null to run in-process.</summary>
    public static string? PublishedProgram => Environment.GetEnvironmentVariable("READINESS_TEST_PROGRAM") is { Length: > 0 } p ? Path.GetFullPath(p) : null;

    /// <summary>The program started by process-level tests and the hook: the published one, else this build's apphost.</summary>
    public static string Program => PublishedProgram ?? Path.Combine(AppContext.BaseDirectory, OperatingSystem.IsWindows() ? "readiness.exe" : "readiness");

    public static async Task<(int Exit, string Out, string Error)> RunAsync(string currentDirectory, params string[] args) =>
        await RunWithInputAsync(currentDirectory, string.Empty, new Dictionary<string, string>(), args);

    public static async Task<(int Exit, string Out, string Error)> RunWithInputAsync(
        string currentDirectory, string input, IReadOnlyDictionary<string, string> environment, params string[] args) =>
        PublishedProgram is { } program
            ? await RunProcessAsync(program, currentDirectory, input, environment, args)
            : await RunInProcessAsync(currentDirectory, input, environment, args);

    public static async Task<(int Exit, string Out, string Error)> RunInProcessAsync(
        string currentDirectory, string input, IReadOnlyDictionary<string, string> environment, params string[] args)
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        var env = new Dictionary<string, string>(environment) { ["NO_COLOR"] = "1" };
        var console = new CliConsole(output, error, IsTerminal: false, env, currentDirectory, new StringReader(input));
        var exit = await new CliApp(console, TimeProvider.System).RunAsync(args);
        return (exit, output.ToString(), error.ToString());
    }

    /// <summary>Runs <paramref name="program"/> with standard input, output and error redirected, bounded to 60 seconds.</summary>
    public static async Task<(int Exit, string Out, string Error)> RunProcessAsync(
        string program, string currentDirectory, string input, IReadOnlyDictionary<string, string> environment, params string[] args)
    {
        var info = new ProcessStartInfo(program)
        {
            WorkingDirectory = currentDirectory,
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
        };
        foreach (var a in args)
        {
            info.ArgumentList.Add(a);
        }

        foreach (var (name, value) in environment)
        {
            info.Environment[name] = value;
        }

        info.Environment["NO_COLOR"] = "1";
        using var process = Process.Start(info)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        try
        {
            await process.StandardInput.WriteAsync(input);
            process.StandardInput.Close();
        }
        catch (IOException)
        {
            // The program exited without reading its input.
        }

        using var limit = new CancellationTokenSource(TimeSpan.FromSeconds(60));
        await process.WaitForExitAsync(limit.Token);
        return (process.ExitCode, await output, await error);
    }
}
