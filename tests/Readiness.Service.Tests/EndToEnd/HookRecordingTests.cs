using System.Diagnostics;
using System.Text.RegularExpressions;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.DependencyInjection;
using Readiness.Service.Storage;
using Readiness.Testing;

namespace Readiness.Service.Tests.EndToEnd;

/// <summary>
/// The pre-push hook records its runs with the service: the real service listening on a real port on 127.0.0.1, a
/// real repository pushing with git to a real bare remote through the hook that <c>readiness hook install</c> put
/// there, and the built <c>readiness</c> program (copied into this project's output by its project reference).
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed partial class HookRecordingTests : IAsyncLifetime
{
    private const string WrongToken = "wrong-token-Hm44-do-not-log";
    private const string Reason = "notes go out with the announcement";

    private readonly TempDirectory data = new("readiness-service-");
    private readonly TempDirectory scratch = new();
    private readonly CapturedLogs logs = new();
    private readonly TestRepository repo = SampleLibrary.ReadyRelease("1.2.0");
    private readonly TestRepository remote = TestRepository.Bare();
    private ForgeStandIn forge = null!;
    private ServiceHost host = null!;
    private string serviceUrl = null!;

    private static string Readiness => Path.Combine(AppContext.BaseDirectory, "readiness");

    private string WaiversLog => Path.Combine(repo.GitDirectory, "readiness", "waivers.log");

    public async Task InitializeAsync()
    {
        forge = await ForgeStandIn.StartAsync();
        host = new ServiceHost(forge.BaseUrl, data.Path, logs);
        host.UseKestrel(0);
        host.StartServer();
        serviceUrl = host.Services.GetRequiredService<IServer>().Features.Get<IServerAddressesFeature>()!.Addresses.First().TrimEnd('/');

        repo.Git("remote", "add", "origin", remote.Path);
        var (exit, output, error) = RunReadiness(repo.Path, new Dictionary<string, string> { ["READINESS_COMMAND"] = Readiness }, "hook", "install");
        Assert.True(exit == 0, output + error);

        // The version moves on but the changelog entries stay under Unreleased: changelog.has-entry blocks.
        repo.Write("Directory.Build.props", SampleLibrary.DirectoryBuildProps("1.3.0"))
            .Write("CHANGELOG.md", "# Changelog\n\n## [Unreleased]\n\n### Added\n- More sketches.\n\n## [1.2.0] - 2026-11-20\n\n### Added\n- First.\n")
            .Commit("Prepare v1.3.0", new DateTimeOffset(2026, 11, 26, 9, 0, 0, TimeSpan.Zero));
        repo.AnnotatedTag("v1.3.0", "v1.3.0\n", new DateTimeOffset(2026, 11, 26, 9, 0, 0, TimeSpan.Zero));
    }

    public async Task DisposeAsync()
    {
        await host.DisposeAsync();
        await forge.DisposeAsync();
        SqliteConnection.ClearAllPools();
        repo.Dispose();
        remote.Dispose();
        scratch.Dispose();
        data.Dispose();
    }

    [Fact]
    public async Task WaivedPush_IsRecorded_WithTheTokenFileNamedInGitConfig()
    {
        // What a push from a tool that passes no environment relies on: both settings in git config.
        var tokenFile = scratch.Combine("service-token");
        File.WriteAllText(tokenFile, ServiceHost.ApiToken + "\n");
        repo.Git("config", "readiness.service", serviceUrl);
        repo.Git("config", "readiness.serviceTokenFile", tokenFile);

        var push = Push(new Dictionary<string, string> { ["READINESS_WAIVE"] = "changelog.has-entry: " + Reason }, "origin", "main", "v1.3.0");

        Assert.True(push.Succeeded, push.StdErr);
        Assert.Contains("v1.3.0", remote.Git("tag", "--list"), StringComparison.Ordinal);
        var recorded = RecordedLine().Match(push.StdErr);
        Assert.True(recorded.Success, push.StdErr);
        Assert.Equal(serviceUrl, recorded.Groups["service"].Value);
        var run = host.Runs.Find(long.Parse(recorded.Groups["id"].Value, System.Globalization.CultureInfo.InvariantCulture))!;
        Assert.Equal(1, host.Runs.Count());
        Assert.Equal(RunRecord.FromHook, run.Source);
        Assert.Equal(repo.Sha("v1.3.0^{commit}"), run.Commit);
        Assert.Equal("v1.3.0", run.Ref);
        Assert.Equal(RunRecord.NotReady, run.Verdict);

        // A local path is not owner/name: the run carries the remote URL as git gave it to the hook.
        Assert.Equal(remote.Path, run.Repository);
        Assert.Equal(new Waiver("changelog.has-entry", Reason), Assert.Single(run.Waivers));

        // The page the line points at is served, over the same socket the hook used.
        using var client = new HttpClient();
        var page = await client.GetStringAsync(new Uri(serviceUrl + $"/runs/{run.Id}"));
        Assert.Contains(Reason, page, StringComparison.Ordinal);
        Assert.DoesNotContain(ServiceHost.ApiToken, push.StdOut + push.StdErr, StringComparison.Ordinal);
        Assert.DoesNotContain(ServiceHost.ApiToken, File.ReadAllText(WaiversLog), StringComparison.Ordinal);
    }

    [Fact]
    public void WrongToken_LeavesTheVerdictAlone_SaysSoOnce_AndNeverShowsTheToken()
    {
        var env = new Dictionary<string, string> { ["READINESS_SERVICE_URL"] = serviceUrl, ["READINESS_SERVICE_TOKEN"] = WrongToken };

        var blocked = Push(env, "origin", "v1.3.0");
        Assert.False(blocked.Succeeded);
        Assert.Contains("readiness: push blocked", blocked.StdErr, StringComparison.Ordinal);
        Assert.DoesNotContain("v1.3.0", remote.Git("tag", "--list"), StringComparison.Ordinal);

        env["READINESS_WAIVE"] = "changelog.has-entry: " + Reason;
        var waived = Push(env, "origin", "v1.3.0");
        Assert.True(waived.Succeeded, waived.StdErr);
        Assert.Contains("v1.3.0", remote.Git("tag", "--list"), StringComparison.Ordinal);

        foreach (var push in new[] { blocked, waived })
        {
            var line = Assert.Single(push.StdErr.Split('\n'), l => l.Contains("record", StringComparison.Ordinal));
            Assert.Equal($"readiness: could not record the run with {serviceUrl}: the service answered 401 Unauthorized (a valid bearer token is required)", line.TrimEnd('\r'));
            Assert.DoesNotContain(WrongToken, push.StdOut + push.StdErr, StringComparison.Ordinal);
        }

        Assert.Equal(0, host.Runs.Count());
        Assert.Contains(Reason, File.ReadAllText(WaiversLog), StringComparison.Ordinal);
        Assert.DoesNotContain(WrongToken, File.ReadAllText(WaiversLog), StringComparison.Ordinal);
        Assert.DoesNotContain(logs.Lines, l => l.Contains(WrongToken, StringComparison.Ordinal));
    }

    [GeneratedRegex(@"^readiness: recorded at (?<service>\S+)/runs/(?<id>\d+)\r?$", RegexOptions.Multiline | RegexOptions.CultureInvariant)]
    private static partial Regex RecordedLine();

    private GitResult Push(Dictionary<string, string> env, params string[] args)
    {
        env["READINESS_OFFLINE"] = "1";
        env["NO_COLOR"] = "1";
        return GitCli.TryRun(repo.Path, ["push", .. args], env);
    }

    private static (int Exit, string Out, string Error) RunReadiness(string directory, IReadOnlyDictionary<string, string> env, params string[] args)
    {
        Assert.True(File.Exists(Readiness), $"the readiness program is missing from {AppContext.BaseDirectory}");
        var info = new ProcessStartInfo(Readiness) { WorkingDirectory = directory, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var arg in args)
        {
            info.ArgumentList.Add(arg);
        }

        foreach (var (name, value) in env)
        {
            info.Environment[name] = value;
        }

        using var process = Process.Start(info)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        Assert.True(process.WaitForExit(60_000), "readiness did not finish within 60 s");
        return (process.ExitCode, output.Result, error.Result);
    }
}
