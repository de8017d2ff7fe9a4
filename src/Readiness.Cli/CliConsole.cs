namespace Readiness.Cli;

/// <summary>What the CLI talks to: injected so tests run the commands in-process.</summary>
/// <param name="Out">Standard output.</param>
/// <param name="Error">Standard error.</param>
/// <param name="IsTerminal">Standard output is a terminal (not redirected).</param>
/// <param name="Environment">Environment variables the CLI honours (NO_COLOR, TERM, READINESS_*).</param>
/// <param name="CurrentDirectory">The folder relative paths start from.</param>
/// <param name="Input">Standard input (the pre-push hook reads git's lines from it).</param>
public sealed record CliConsole(
    TextWriter Out,
    TextWriter Error,
    bool IsTerminal,
    IReadOnlyDictionary<string, string> Environment,
    string CurrentDirectory,
    TextReader Input)
{
    public static CliConsole System() => new(
        Console.Out,
        Console.Error,
        !Console.IsOutputRedirected,
        global::System.Environment.GetEnvironmentVariables()
            .Cast<global::System.Collections.DictionaryEntry>()
            .ToDictionary(e => (string)e.Key, e => e.Value as string ?? string.Empty, StringComparer.Ordinal),
        global::System.Environment.CurrentDirectory,
        Console.In);

    public string? Env(string name) => Environment.TryGetValue(name, out var v) && v.Length > 0 ? v : null;

    public string FullPath(string path) => Path.GetFullPath(path, CurrentDirectory);
}
