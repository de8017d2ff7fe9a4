using Readiness.Testing;

namespace Readiness.Cli.Tests;

/// <summary>Option values that name nothing are usage errors (exit 2) with a clear line, never a silent guess.</summary>
public sealed class OptionValueTests
{
    [Theory]
    [InlineData("--version", "--offline")]
    [InlineData("--tag", "--worktree")]
    [InlineData("--checklist", "--format")]
    public async Task AnOptionThatTakesAValue_NeverSwallowsTheNextOption(string option, string next)
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        var (exit, output, error) = await CliHarness.RunAsync(repo.Path, "check", option, next, "--offline");
        Assert.Equal(2, exit);
        Assert.Contains($"{option} needs a value, but the next word is the option {next}", error, StringComparison.Ordinal);
        Assert.Equal(string.Empty, output);
    }

    [Fact]
    public async Task AValueFollowedByAnOption_KeepsBoth()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        var (exit, output, error) = await CliHarness.RunAsync(repo.Path, "check", "--version", "1.2.0", "--offline", "--format", "json");
        Assert.True(exit == 0, output + error);
        Assert.Contains("\"version\": \"1.2.0\"", output, StringComparison.Ordinal);
    }

    [Fact]
    public async Task RegistryFolderThatDoesNotExist_IsAUsageError()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        var (exit, output, error) = await CliHarness.RunAsync(repo.Path, "check", "--registry", "no-such-feed");
        Assert.Equal(2, exit);
        Assert.Contains("--registry no-such-feed: no such folder", error, StringComparison.Ordinal);
        Assert.Equal(string.Empty, output);
    }

    [Fact]
    public async Task ConfirmOfAnUnknownItem_IsAUsageError_WithTheNearestItem()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Write("ci/ours.yml", "name: ours\nextends: library\nmanual:\n  - id: soak\n    text: Called 1,000 times without its memory growing.\n    severity: warn\n")
            .Commit("Our checklist", new DateTimeOffset(2026, 11, 21, 9, 0, 0, TimeSpan.Zero));
        var checklist = Path.Combine(repo.Path, "ci", "ours.yml");

        var (exit, _, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--checklist", checklist, "--confirm", "soka");
        Assert.Equal(2, exit);
        Assert.Contains("--confirm soka: checklist ours has no manual item 'soka'; did you mean 'soak'?", error, StringComparison.Ordinal);

        var (confirmed, output, confirmedError) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--checklist", checklist, "--confirm", "soak", "--format", "json");
        Assert.True(confirmed is 0 or 1, confirmedError);
        Assert.Contains("\"manual.soak\"", output, StringComparison.Ordinal);

        var (none, _, noneError) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--confirm", "soak");
        Assert.Equal(2, none);
        Assert.Contains("(it has no manual items)", noneError, StringComparison.Ordinal);
    }
}
