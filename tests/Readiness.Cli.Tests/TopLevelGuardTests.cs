using Readiness.Testing;

namespace Readiness.Cli.Tests;

/// <summary>The one guard at the top: an unexpected exception is one line naming the input and exit 3 (cli.md).</summary>
public sealed class TopLevelGuardTests
{
    [Fact]
    public async Task UnexpectedException_ExitsThree_WithOneLineNamingTheInput_AndNoStackTrace()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        var (exit, error) = await RunWithFailingOutputAsync(repo.Path, "check", "--offline", "--format", "json", repo.Path);

        Assert.Equal(3, exit);
        var line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains($"could not inspect {repo.Path}", line, StringComparison.Ordinal);
        Assert.Contains("unexpected InvalidOperationException: the output is gone", line, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", error, StringComparison.Ordinal);
    }

    [Fact]
    public async Task UnexpectedException_WithVerbose_AddsTheStackTrace()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        var (exit, error) = await RunWithFailingOutputAsync(repo.Path, "check", "--offline", "--format", "json", "--verbose");

        Assert.Equal(3, exit);
        Assert.Contains("   at ", error, StringComparison.Ordinal);
    }

    [Fact]
    public async Task ConfigurationOverTheSizeLimit_IsAConfigurationError_NamingTheFile()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Write(".readiness.yml", "checklist: library\n# " + new string('x', 2 * 1024 * 1024) + "\n").Commit("Big configuration");

        var (exit, _, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");

        Assert.Equal(2, exit);
        Assert.StartsWith("readiness: .readiness.yml:1:1: the file is", error, StringComparison.Ordinal);
        Assert.Contains("limit", error, StringComparison.Ordinal);
    }

    private static async Task<(int Exit, string Error)> RunWithFailingOutputAsync(string directory, params string[] args)
    {
        using var output = new FailingWriter();
        using var error = new StringWriter();
        var console = new CliConsole(output, error, IsTerminal: false, new Dictionary<string, string> { ["NO_COLOR"] = "1" }, directory, new StringReader(string.Empty));
        var exit = await new CliApp(console, TimeProvider.System).RunAsync(args);
        return (exit, error.ToString());
    }

    /// <summary>An output whose every write fails, as a closed pipe would.</summary>
    private sealed class FailingWriter : StringWriter
    {
        public override void Write(char value) => throw new InvalidOperationException("the output is gone");

        public override void Write(string? value) => throw new InvalidOperationException("the output is gone");

        public override Task WriteAsync(string? value) => throw new InvalidOperationException("the output is gone");

        public override Task WriteAsync(char value) => throw new InvalidOperationException("the output is gone");

        public override Task WriteLineAsync(string? value) => throw new InvalidOperationException("the output is gone");
    }
}
