using Readiness.Testing;

namespace Readiness.Cli.Tests;

/// <summary>The pre-push hook with real git pushing to real bare repositories on disk (POSIX sh hooks).</summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class HookTests : IDisposable
{
    private readonly TestRepository repo = SampleLibrary.ReadyRelease("1.2.0");
    private readonly TestRepository remote = TestRepository.Bare();
    private readonly TempDirectory scratch = new();

    public HookTests()
    {
        repo.Git("remote", "add", "origin", remote.Path);
    }

    private string Trace => scratch.Combine("trace.log");

    private Dictionary<string, string> Env(string? waive = null)
    {
        var env = new Dictionary<string, string> { ["READINESS_HOOK_TRACE"] = Trace, ["READINESS_OFFLINE"] = "1", ["NO_COLOR"] = "1" };
        if (waive is not null)
        {
            env["READINESS_WAIVE"] = waive;
        }

        return env;
    }

    private async Task InstallAsync(string? command = null)
    {
        var env = new Dictionary<string, string> { ["READINESS_COMMAND"] = command ?? ProcessTests.Program };
        var (exit, output, error) = await CliHarness.RunWithInputAsync(repo.Path, string.Empty, env, "hook", "install");
        Assert.True(exit == 0, output + error);
    }

    private GitResult Push(params string[] args) => GitCli.TryRun(repo.Path, ["push", .. args], Env());

    private GitResult PushWith(Dictionary<string, string> env, params string[] args) => GitCli.TryRun(repo.Path, ["push", .. args], env);

    private string RemoteTags() => remote.Git("tag", "--list");

    private void MakeNotReadyTag(string tag = "v1.3.0")
    {
        // The version moves on but the changelog entries stay under Unreleased: changelog.has-entry blocks.
        repo.Write("Directory.Build.props", SampleLibrary.DirectoryBuildProps(tag[1..]))
            .Write("CHANGELOG.md", "# Changelog\n\n## [Unreleased]\n\n### Added\n- More sketches.\n\n## [1.2.0] - 2026-11-20\n\n### Added\n- First.\n")
            .Commit("Prepare " + tag, new DateTimeOffset(2026, 11, 26, 9, 0, 0, TimeSpan.Zero));
        repo.AnnotatedTag(tag, tag + "\n", new DateTimeOffset(2026, 11, 26, 9, 0, 0, TimeSpan.Zero));
    }

    [Fact]
    public async Task OrdinaryBranchPush_IsAccepted_WithoutStartingDotNet()
    {
        // A command that cannot run: if the hook tried to start readiness, the push would fail.
        await InstallAsync(scratch.Combine("no-such-readiness"));
        var result = Push("origin", "main");
        Assert.True(result.Succeeded, result.StdErr);
        var trace = File.ReadAllText(Trace);
        Assert.Contains("decision: ordinary push, .NET not started", trace, StringComparison.Ordinal);
        Assert.DoesNotContain("decision: run", trace, StringComparison.Ordinal);
    }

    [Fact]
    public async Task NotReadyTag_IsRejected_AndTheRemoteDoesNotGetIt()
    {
        await InstallAsync();
        MakeNotReadyTag();
        var result = Push("origin", "main", "v1.3.0");
        Assert.False(result.Succeeded);
        Assert.Contains("changelog.has-entry", result.StdErr, StringComparison.Ordinal);
        Assert.Contains("CHANGELOG.md:", result.StdErr, StringComparison.Ordinal);
        Assert.DoesNotContain("CHANGELOG.md, CHANGELOG.md", result.StdErr, StringComparison.Ordinal);
        // The summary is worded as in every report: verdict, then "N blocking; N fail, N error, N manual, N skip, N pass".
        Assert.Matches(@"readiness: v1\.3\.0 \([0-9a-f]{7}\) NOT READY — [1-9][0-9]* blocking; [0-9]+ fail, [0-9]+ error, [0-9]+ manual, [0-9]+ skip, [0-9]+ pass", result.StdErr);

        // The way to the full report names the tag, so it judges the same version and signature as the hook did.
        Assert.Contains("full report: readiness check --ref v1.3.0 --format html", result.StdErr, StringComparison.Ordinal);
        Assert.DoesNotContain("v1.3.0", RemoteTags(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task TagPatternOfTheTaggedCommit_IsHonoured_WhenTheWorktreeHasNoConfiguration()
    {
        // The engine reads .readiness.yml from the pushed commit; the shell filter must not let that tag slip through
        // because the checked-out branch has no such file.
        await InstallAsync();
        var when = new DateTimeOffset(2026, 11, 26, 9, 0, 0, TimeSpan.Zero);
        repo.Write(".readiness.yml", "tag-pattern: 'rel-{version}'\n")
            .Write("Directory.Build.props", SampleLibrary.DirectoryBuildProps("1.3.0"))
            .Write("CHANGELOG.md", "# Changelog\n\n## [Unreleased]\n\n### Added\n- More sketches.\n\n## [1.2.0] - 2026-11-20\n\n### Added\n- First.\n")
            .Commit("Prepare rel-1.3.0", when);
        repo.AnnotatedTag("rel-1.3.0", "rel-1.3.0\n", when);
        repo.Git("rm", "-q", ".readiness.yml");
        repo.Commit("Drop the configuration again", when);

        var result = Push("origin", "rel-1.3.0");
        Assert.False(result.Succeeded);
        Assert.Contains("changelog.has-entry", result.StdErr, StringComparison.Ordinal);
        Assert.Contains("release tag rel-1.3.0 (pattern of the tagged commit)", File.ReadAllText(Trace), StringComparison.Ordinal);
        Assert.Equal(string.Empty, RemoteTags().Trim());
    }

    [Fact]
    public async Task ReadyTag_IsAccepted()
    {
        await InstallAsync();
        var result = Push("origin", "main", "v1.2.0");
        Assert.True(result.Succeeded, result.StdErr);
        Assert.Contains("v1.2.0", RemoteTags(), StringComparison.Ordinal);
        Assert.Contains("READY", result.StdErr, StringComparison.Ordinal);
    }

    [Fact]
    public async Task SeveralRefsInOnePush_OneNotReady_RejectsThePush()
    {
        await InstallAsync();
        MakeNotReadyTag();
        var result = Push("origin", "main", "v1.2.0", "v1.3.0");
        Assert.False(result.Succeeded);
        Assert.Equal(string.Empty, RemoteTags().Trim());
        var trace = File.ReadAllText(Trace);
        Assert.Contains("release tag v1.2.0", trace, StringComparison.Ordinal);
        Assert.Contains("release tag v1.3.0", trace, StringComparison.Ordinal);
    }

    [Fact]
    public async Task TagDeletion_IsNotChecked()
    {
        await InstallAsync();
        Assert.True(Push("origin", "v1.2.0").Succeeded);
        var result = Push("origin", ":refs/tags/v1.2.0");
        Assert.True(result.Succeeded, result.StdErr);
        // githooks: a delete is sent as "(delete) 000…0 refs/tags/v1.2.0 <oid>" (standards.md §7).
        Assert.Contains("skip delete refs/tags/v1.2.0", File.ReadAllText(Trace), StringComparison.Ordinal);
    }

    [Fact]
    public async Task NoVerify_SkipsTheHook()
    {
        await InstallAsync();
        MakeNotReadyTag();
        var result = Push("--no-verify", "origin", "v1.3.0");
        Assert.True(result.Succeeded, result.StdErr);
        Assert.Contains("v1.3.0", RemoteTags(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Waiver_WithReason_LetsThePushThrough_AndLeavesATrace()
    {
        await InstallAsync();
        MakeNotReadyTag();
        var env = Env("changelog.has-entry: notes go out with the announcement");
        var result = PushWith(env, "origin", "v1.3.0");
        Assert.True(result.Succeeded, result.StdErr);
        Assert.Contains("waived changelog.has-entry", result.StdErr, StringComparison.Ordinal);
        var log = File.ReadAllText(Path.Combine(repo.GitDirectory, "readiness", "waivers.log"));
        Assert.Contains("changelog.has-entry\tnotes go out with the announcement", log, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Waiver_NamingNoCheck_StopsThePush_AndSuggestsTheNearestId()
    {
        await InstallAsync();
        MakeNotReadyTag();
        var result = PushWith(Env("changelog.has-entyr: notes go out with the announcement"), "origin", "v1.3.0");
        Assert.False(result.Succeeded);
        Assert.Contains("READINESS_WAIVE names 'changelog.has-entyr', which is not a check; did you mean 'changelog.has-entry'?", result.StdErr, StringComparison.Ordinal);
        Assert.Equal(string.Empty, RemoteTags().Trim());
    }

    [Fact]
    public async Task Install_HonoursCoreHooksPath_ChainsAnExistingHook_IsIdempotent_AndUninstallRestores()
    {
        var hooks = scratch.Combine("shared-hooks");
        Directory.CreateDirectory(hooks);
        repo.Git("config", "core.hooksPath", hooks);
        var marker = scratch.Combine("earlier-hook-ran");
        var earlier = Path.Combine(hooks, "pre-push");
        File.WriteAllText(earlier, $"#!/bin/sh\necho ran >> '{marker}'\ncat > /dev/null\nexit 0\n");
        File.SetUnixFileMode(earlier, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);

        await InstallAsync();
        await InstallAsync();
        Assert.True(File.Exists(Path.Combine(hooks, "pre-push.readiness-chained")));
        Assert.Contains("Readiness pre-push hook", File.ReadAllText(Path.Combine(hooks, "pre-push")), StringComparison.Ordinal);

        Assert.True(Push("origin", "main").Succeeded);
        Assert.Single(File.ReadAllLines(marker));

        // Either failing blocks: the earlier hook now refuses.
        File.WriteAllText(earlier + ".readiness-chained", "#!/bin/sh\ncat > /dev/null\necho 'earlier hook says no' >&2\nexit 1\n");
        var refused = Push("origin", "v1.2.0");
        Assert.False(refused.Succeeded);
        Assert.Contains("earlier hook says no", refused.StdErr, StringComparison.Ordinal);

        var (status, statusOut, _) = await CliHarness.RunAsync(repo.Path, "hook", "status");
        Assert.Equal(0, status);
        Assert.Contains("chained", statusOut, StringComparison.Ordinal);
        Assert.DoesNotContain("differs from the hook", statusOut, StringComparison.Ordinal);

        // A copy left by an earlier version (or edited by hand) still works, and status says how to refresh it.
        File.AppendAllText(Path.Combine(hooks, "pre-push"), "# edited\n");
        var (_, edited, _) = await CliHarness.RunAsync(repo.Path, "hook", "status");
        Assert.Contains("differs from the hook this readiness ships", edited, StringComparison.Ordinal);

        var (exit, _, _) = await CliHarness.RunAsync(repo.Path, "hook", "uninstall");
        Assert.Equal(0, exit);
        Assert.Contains("earlier hook says no", File.ReadAllText(Path.Combine(hooks, "pre-push")), StringComparison.Ordinal);
        Assert.False(File.Exists(Path.Combine(hooks, "pre-push.readiness-chained")));
    }

    [Fact]
    public async Task Uninstall_InOneHooksFolder_KeepsTheCommandThatAHookInAnotherFolderNeeds()
    {
        // Installed twice: in the git directory's hooks/ and, after core.hooksPath is set, in that folder too.
        await InstallAsync();
        var shared = scratch.Combine("team-hooks");
        Directory.CreateDirectory(shared);
        repo.Git("config", "core.hooksPath", shared);
        await InstallAsync();

        var (exit, output, _) = await CliHarness.RunAsync(repo.Path, "hook", "uninstall");
        Assert.Equal(0, exit);
        Assert.Contains("kept the recorded readiness command", output, StringComparison.Ordinal);

        // Back to the git directory's hooks/: that hook still finds its command (git config --get exits 0) and works.
        repo.Git("config", "--unset", "core.hooksPath");
        Assert.Equal(ProcessTests.Program, repo.Git("config", "--get", "readiness.command").Trim());
        var (status, statusOut, _) = await CliHarness.RunAsync(repo.Path, "hook", "status");
        Assert.True(status == 0, statusOut);
        MakeNotReadyTag();
        Assert.True(Push("origin", "main").Succeeded);
        Assert.False(Push("origin", "v1.3.0").Succeeded);

        // The last one removed takes the recorded command with it.
        var (lastExit, lastOut, _) = await CliHarness.RunAsync(repo.Path, "hook", "uninstall");
        Assert.Equal(0, lastExit);
        Assert.DoesNotContain("kept the recorded", lastOut, StringComparison.Ordinal);
        Assert.False(GitCli.TryRun(repo.Path, ["config", "--get", "readiness.command"], new Dictionary<string, string>()).Succeeded);
    }

    [Fact]
    public async Task Status_NamesAHookWhoseCommandCannotBeFound_AsUnhealthy()
    {
        await InstallAsync(scratch.Combine("moved-away", "readiness"));
        var (exit, output, _) = await CliHarness.RunAsync(repo.Path, "hook", "status");
        Assert.Equal(1, exit);
        Assert.Contains("NOT FOUND", output, StringComparison.Ordinal);

        // No recorded command and no `readiness` on PATH: the shell hook would stop every release push.
        repo.Git("config", "--unset", "readiness.command");
        // A PATH that holds git (the program needs it) but no readiness.
        var onlyGit = scratch.Combine("only-git");
        Directory.CreateDirectory(onlyGit);
        var git = Hooks.HookInstaller.CommandOnPath("git") ?? throw new InvalidOperationException("git is not on PATH");
        File.CreateSymbolicLink(Path.Combine(onlyGit, "git"), git);
        var env = new Dictionary<string, string> { ["PATH"] = onlyGit };
        var (pathExit, pathOut, _) = await CliHarness.RunWithInputAsync(repo.Path, string.Empty, env, "hook", "status");
        Assert.Equal(1, pathExit);
        Assert.Contains("not on PATH", pathOut, StringComparison.Ordinal);
    }

    [Fact]
    public void PrePushInput_FollowsGitsDocumentedFormat()
    {
        // Reference: githooks(5) pre-push — "<local ref> SP <local oid> SP <remote ref> SP <remote oid> LF";
        // a delete carries "(delete)" and an all-zero local oid; a new remote ref an all-zero remote oid.
        var zero = new string('0', 40);
        var oid = new string('a', 40);
        var (refs, errors) = Hooks.PushedRef.Parse($"refs/heads/master {oid} refs/heads/foreign {zero}\n(delete) {zero} refs/heads/x {oid}\nbroken line\n");
        Assert.Single(errors);
        Assert.Equal(2, refs.Count);
        Assert.True(refs[0].IsNew);
        Assert.Equal("foreign", refs[0].BranchName);
        Assert.True(refs[1].IsDelete);
    }

    public void Dispose()
    {
        repo.Dispose();
        remote.Dispose();
        scratch.Dispose();
    }
}
