using System.Text.Json;
using Readiness.Testing;

namespace Readiness.Cli.Tests;

public sealed class CheckCommandTests
{
    [Fact]
    public async Task ReadyRelease_ExitsZero_AndJsonFollowsTheReportContract()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        var (exit, output, error) = await CliHarness.RunAsync(repo.Path, "check", "--format", "json", "--offline");
        Assert.True(exit == 0, output + error);

        // Reference: design/cli.md, JSON report schema readiness-report/1 (field names and words are the contract).
        using var json = JsonDocument.Parse(output);
        var root = json.RootElement;
        Assert.Equal("readiness-report/1", root.GetProperty("schema").GetString());
        Assert.True(root.GetProperty("ready").GetBoolean());
        var subject = root.GetProperty("subject");
        Assert.Equal(repo.Head, subject.GetProperty("commit").GetString());
        Assert.Equal("v1.2.0", subject.GetProperty("tag").GetString());
        Assert.Equal("1.2.0", subject.GetProperty("version").GetString());
        Assert.Equal("library", subject.GetProperty("checklist").GetString());
        Assert.Equal("commit", subject.GetProperty("inspected").GetString());
        Assert.Equal(0, root.GetProperty("summary").GetProperty("blocking").GetInt32());
        var statuses = root.GetProperty("results").EnumerateArray().Select(r => r.GetProperty("status").GetString()).ToHashSet();
        Assert.Subset(new HashSet<string?> { "pass", "fail", "skip", "manual", "error" }, statuses);
        Assert.Contains(root.GetProperty("results").EnumerateArray(), r =>
            r.GetProperty("check").GetString() == "changelog.has-entry" && r.GetProperty("status").GetString() == "pass");
    }

    [Fact]
    public async Task EntriesStillUnderUnreleased_ExitOne_AndTheReportNamesTheChangelog()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Write("Directory.Build.props", SampleLibrary.DirectoryBuildProps("1.3.0"))
            .Write("CHANGELOG.md", "# Changelog\n\n## [Unreleased]\n\n### Added\n- Merge of sketches.\n\n## [1.2.0] - 2026-11-20\n\n### Added\n- First.\n")
            .Commit("Prepare 1.3.0", new DateTimeOffset(2026, 11, 25, 9, 0, 0, TimeSpan.Zero));
        repo.AnnotatedTag("v1.3.0", "1.3.0\n", new DateTimeOffset(2026, 11, 25, 9, 0, 0, TimeSpan.Zero));
        var (exit, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--format", "json", "--offline");
        Assert.Equal(1, exit);
        using var json = JsonDocument.Parse(output);
        var entry = json.RootElement.GetProperty("results").EnumerateArray().Single(r => r.GetProperty("check").GetString() == "changelog.has-entry");
        Assert.Equal("fail", entry.GetProperty("status").GetString());
        Assert.Equal("block", entry.GetProperty("severity").GetString());
        Assert.Equal("CHANGELOG.md", entry.GetProperty("evidence")[0].GetProperty("path").GetString());
        Assert.Contains("Unreleased", entry.GetProperty("hint").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task OlderTag_IsInspectedAtItsOwnCommit_NotTheWorkingTree()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Write("CHANGELOG.md", "# Changelog\n").Commit("Break the changelog after the release");
        var (exit, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--ref", "v1.2.0", "--format", "json", "--offline");
        Assert.True(exit == 0, output);
        Assert.Contains("\"tag\": \"v1.2.0\"", output, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Worktree_SeesAnUncommittedFix()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Delete("LICENSE").Commit("Lose the license");
        var (before, _, _) = await CliHarness.RunAsync(repo.Path, "check", "--version", "1.2.1", "--offline", "--format", "json");
        Assert.Equal(1, before);
        repo.Write("LICENSE", SampleLibrary.MitLicense);
        var (exit, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--worktree", "--offline", "--format", "json");
        Assert.Contains("\"inspected\": \"worktree\"", output, StringComparison.Ordinal);
        Assert.Contains(JsonDocument.Parse(output).RootElement.GetProperty("results").EnumerateArray(), r =>
            r.GetProperty("check").GetString() == "license.file" && r.GetProperty("status").GetString() == "pass");
        Assert.InRange(exit, 0, 1);
    }

    [Fact]
    public async Task NotARepository_ExitsThree_WithOneClearLine()
    {
        using var folder = new TempDirectory();
        var (exit, _, error) = await CliHarness.RunAsync(folder.Path, "check", "--offline");
        Assert.Equal(3, exit);
        Assert.Single(error.Trim().Split('\n'));
    }

    [Fact]
    public async Task UnknownRevision_ExitsThree()
    {
        using var repo = SampleLibrary.ReadyRelease();
        var (exit, _, error) = await CliHarness.RunAsync(repo.Path, "check", "--ref", "no-such-branch", "--offline");
        Assert.Equal(3, exit);
        Assert.Contains("no-such-branch", error, StringComparison.Ordinal);
    }

    [Fact]
    public async Task BadConfiguration_ExitsTwo_NamingFileLineAndColumn()
    {
        using var repo = SampleLibrary.ReadyRelease();
        repo.Write(".readiness.yml", "checklist: library\nchecks:\n  changelog.present: { severity: sometimes }\n").Commit("Bad config");
        var (exit, _, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline");
        Assert.Equal(2, exit);
        Assert.Contains(".readiness.yml:3:", error, StringComparison.Ordinal);
    }

    [Fact]
    public async Task UnknownOption_ExitsTwo()
    {
        // System.CommandLine lets an optional argument swallow '--bogus' (pitfalls.md); it must still be a usage error.
        using var repo = SampleLibrary.ReadyRelease();
        var (exit, _, error) = await CliHarness.RunAsync(repo.Path, "check", "--bogus");
        Assert.Equal(2, exit);
        Assert.Contains("--bogus", error, StringComparison.Ordinal);
    }

    [Fact]
    public async Task FailOn_WarnAndNever_ChangeOnlyTheExitCode()
    {
        using var repo = SampleLibrary.ReadyRelease();
        repo.Write("src/Bramble.Sketches/Bramble.Sketches.csproj", SampleLibrary.Project.Replace("net10.0", "net6.0", StringComparison.Ordinal)).Commit("Target net6.0");
        repo.AnnotatedTag("v1.2.1", "1.2.1\n");
        repo.Write("Directory.Build.props", SampleLibrary.DirectoryBuildProps("1.2.1"))
            .Write("CHANGELOG.md", SampleLibrary.Changelog(("1.2.1", "2026-11-20"), ("1.2.0", "2026-11-20")));
        var (block, _, _) = await CliHarness.RunAsync(repo.Path, "check", "--worktree", "--version", "1.2.1", "--offline");
        var (warn, _, _) = await CliHarness.RunAsync(repo.Path, "check", "--worktree", "--version", "1.2.1", "--offline", "--fail-on", "warn");
        var (never, _, _) = await CliHarness.RunAsync(repo.Path, "check", "--worktree", "--version", "1.2.1", "--offline", "--fail-on", "never");
        Assert.Equal(1, warn); // net6.0 is out of support: a warn failure (matrix.supported-targets)
        Assert.Equal(0, never);
        Assert.InRange(block, 0, 1);
    }

    [Fact]
    public async Task Output_WritesTheReportAndPrintsASummary()
    {
        using var repo = SampleLibrary.ReadyRelease();
        var file = Path.Combine(repo.Path, "..", Path.GetFileName(repo.Path) + "-report.html");
        var (exit, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--output", file);
        Assert.Equal(0, exit);
        Assert.Contains("READY", output, StringComparison.Ordinal);
        Assert.StartsWith("<!DOCTYPE html>", File.ReadAllText(file), StringComparison.OrdinalIgnoreCase);
        File.Delete(file);
    }
}
