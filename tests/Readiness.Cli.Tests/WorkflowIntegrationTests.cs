using Readiness.Testing;

namespace Readiness.Cli.Tests;

/// <summary>
/// The built program inside a (simulated) CI job: the runner sets GITHUB_ACTIONS=true and names the job summary file
/// in GITHUB_STEP_SUMMARY (workflow-commands and job-summary documentation of the runner).
/// </summary>
public sealed class WorkflowIntegrationTests
{
    private static TestRepository NotReady()
    {
        var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Write("CHANGELOG.md", "# Changelog\n\n## [Unreleased]\n\n### Added\n- Merge of sketches.\n")
            .Commit("Entries still under Unreleased");
        repo.AnnotatedTag("v1.2.1", "1.2.1\n");
        repo.Write("Directory.Build.props", SampleLibrary.DirectoryBuildProps("1.2.1")).Commit("Bump");
        return repo;
    }

    [Fact]
    public void InsideActions_WritesOneAnnotationPerFailure_AndAppendsTheMarkdownSummary()
    {
        using var repo = NotReady();
        using var folder = new TempDirectory();
        var summary = Path.Combine(folder.Path, "step-summary.md");
        File.WriteAllText(summary, "# Earlier step\n");
        var report = Path.Combine(folder.Path, "report.json");
        var env = new Dictionary<string, string?> { ["GITHUB_ACTIONS"] = "true", ["GITHUB_STEP_SUMMARY"] = summary };

        var (exit, output, error) = ProcessTests.RunProgram(ProcessTests.Program, repo.Path, env, "check", "--offline", "--format", "json", "--output", report);

        Assert.True(exit == 1, output + error);
        var annotations = output.Split('\n').Where(l => l.StartsWith("::", StringComparison.Ordinal)).ToList();
        using var json = System.Text.Json.JsonDocument.Parse(File.ReadAllText(report));
        var failures = json.RootElement.GetProperty("results").EnumerateArray()
            .Count(r => r.GetProperty("status").GetString() is "fail" or "error");
        Assert.Equal(failures, annotations.Count);
        Assert.Contains(annotations, l => l.StartsWith("::error file=CHANGELOG.md,line=", StringComparison.Ordinal) && l.Contains("title=changelog.has-entry", StringComparison.Ordinal));
        Assert.All(annotations, l => Assert.DoesNotContain('\r', l));

        var text = File.ReadAllText(summary);
        Assert.StartsWith("# Earlier step\n<!-- readiness-report -->\n", text, StringComparison.Ordinal);
        Assert.Contains("changelog.has-entry", text, StringComparison.Ordinal);
        Assert.Contains("changelog.has-entry", text, StringComparison.Ordinal);
    }

    [Fact]
    public void InsideActions_ReportOnStandardOutput_KeepsAnnotationsOnStandardError()
    {
        using var repo = NotReady();
        var env = new Dictionary<string, string?> { ["GITHUB_ACTIONS"] = "true", ["GITHUB_STEP_SUMMARY"] = null };

        var (exit, output, error) = ProcessTests.RunProgram(ProcessTests.Program, repo.Path, env, "check", "--offline", "--format", "json");

        Assert.Equal(1, exit);
        using var json = System.Text.Json.JsonDocument.Parse(output);
        Assert.Contains("::error file=CHANGELOG.md", error, StringComparison.Ordinal);
    }

    [Fact]
    public void OutsideActions_WritesNoAnnotationAndNoSummary()
    {
        using var repo = NotReady();
        using var folder = new TempDirectory();
        var summary = Path.Combine(folder.Path, "step-summary.md");
        var env = new Dictionary<string, string?> { ["GITHUB_ACTIONS"] = null, ["GITHUB_STEP_SUMMARY"] = summary };

        var (exit, output, error) = ProcessTests.RunProgram(ProcessTests.Program, repo.Path, env, "check", "--offline", "--format", "text");

        Assert.Equal(1, exit);
        Assert.DoesNotContain("::error", output + error, StringComparison.Ordinal);
        Assert.False(File.Exists(summary));
    }
}
