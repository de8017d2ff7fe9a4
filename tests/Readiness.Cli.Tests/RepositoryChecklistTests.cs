using Readiness.Testing;

namespace Readiness.Cli.Tests;

/// <summary><c>checklist: ci/ours.yml</c> in <c>.readiness.yml</c>: the repository's own checklist, read at the commit.</summary>
public sealed class RepositoryChecklistTests
{
    private static readonly DateTimeOffset When = new(2026, 11, 21, 9, 0, 0, TimeSpan.Zero);

    [Fact]
    public async Task OwnChecklistFile_AddsItsManualItems_AndConfirmingThemMakesTheReleaseReady()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Write(".readiness.yml", "checklist: ci/ours.yml\n")
            .Write("ci/ours.yml", "name: ours\nextends: library\nmanual:\n  - id: soak\n    text: Called 1,000 times in one process without its memory growing.\n")
            .Commit("Our own checklist", When);
        repo.Git("tag", "--force", "--annotate", "v1.2.0", "--message", "1.2.0");

        var (exit, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");
        Assert.Equal(1, exit);
        Assert.Contains("\"checklist\": \"ours\"", output, StringComparison.Ordinal);
        Assert.Contains("\"check\": \"manual.soak\"", output, StringComparison.Ordinal);

        var (confirmed, confirmedOutput, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--confirm", "soak");
        Assert.True(confirmed == 0, confirmedOutput + error);
    }

    [Fact]
    public async Task OwnChecklistFileThatIsMissing_IsAConfigurationErrorAtItsLine()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Write(".readiness.yml", "# ours\nchecklist: ci/missing.yml\n").Commit("Point at a checklist", When);
        var (exit, _, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline");
        Assert.Equal(2, exit);
        Assert.Contains(".readiness.yml:2:", error, StringComparison.Ordinal);
        Assert.Contains("'ci/missing.yml' names no file at the inspected commit", error, StringComparison.Ordinal);

        repo.Write(".readiness.yml", "checklist: ../outside.yml\n").Commit("Point outside", When);
        var (outside, _, outsideError) = await CliHarness.RunAsync(repo.Path, "check", "--offline");
        Assert.Equal(2, outside);
        Assert.Contains("must be a path inside the repository", outsideError, StringComparison.Ordinal);
    }
}
