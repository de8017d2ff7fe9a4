namespace Readiness.Cli.Tests;

/// <summary>Runs the CLI in-process with captured output.</summary>
internal static class CliHarness
{
    public static async Task<(int Exit, string Out, string Error)> RunAsync(string currentDirectory, params string[] args) =>
        await RunWithInputAsync(currentDirectory, string.Empty, new Dictionary<string, string>(), args);

    public static async Task<(int Exit, string Out, string Error)> RunWithInputAsync(
        string currentDirectory, string input, IReadOnlyDictionary<string, string> environment, params string[] args)
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        var env = new Dictionary<string, string>(environment) { ["NO_COLOR"] = "1" };
        var console = new CliConsole(output, error, IsTerminal: false, env, currentDirectory, new StringReader(input));
        var exit = await new CliApp(console, TimeProvider.System).RunAsync(args);
        return (exit, output.ToString(), error.ToString());
    }
}
