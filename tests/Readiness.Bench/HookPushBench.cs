using Readiness.Cli;
using Readiness.Cli.Demo;
using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>
/// Time of <c>git push</c> of an ordinary branch to a local bare remote without a hook, with an empty hook (the floor any
/// pre-push hook pays: git starting <c>/bin/sh</c>) and with the Readiness hook (interleaved, median of many runs), and of
/// a release-tag push of the demo repository (offline registry).
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class HookPushBench : IBench
{
    public string Name => "hook-push";

    public string Description => "git push with and without the pre-push hook; release-tag push of the demo";

    public async Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        var runs = args.Length > 0 ? int.Parse(args[0], System.Globalization.CultureInfo.InvariantCulture) : 30;
        using var plain = SampleLibrary.ReadyRelease();
        using var empty = SampleLibrary.ReadyRelease();
        using var hooked = SampleLibrary.ReadyRelease();
        using var plainRemote = TestRepository.Bare();
        using var emptyRemote = TestRepository.Bare();
        using var hookedRemote = TestRepository.Bare();
        plain.Git("remote", "add", "origin", plainRemote.Path);
        empty.Git("remote", "add", "origin", emptyRemote.Path);
        hooked.Git("remote", "add", "origin", hookedRemote.Path);
        WriteEmptyHook(empty.GitDirectory);
        await InstallAsync(hooked.Path, cancellationToken);

        var without = new List<double>();
        var floor = new List<double>();
        var with = new List<double>();
        var env = new Dictionary<string, string> { ["READINESS_OFFLINE"] = "1" };
        for (var i = 0; i < runs; i++)
        {
            foreach (var (repo, samples) in new[] { (plain, without), (empty, floor), (hooked, with) })
            {
                repo.Write("notes.txt", $"run {i}\n").Commit($"Note {i}");
                var watch = System.Diagnostics.Stopwatch.StartNew();
                GitCli.Run(repo.Path, ["push", "-q", "origin", "main"], env);
                samples.Add(watch.Elapsed.TotalMilliseconds);
            }
        }

        Console.WriteLine($"branch push without hook: {Stats.Describe(without)}");
        Console.WriteLine($"branch push, empty hook:  {Stats.Describe(floor)}");
        Console.WriteLine($"branch push with hook:    {Stats.Describe(with)}");
        var median = Stats.Percentile(without, 0.5);
        Console.WriteLine($"added by an empty hook (median): {Stats.Percentile(floor, 0.5) - median:0.0} ms");
        Console.WriteLine($"added by the Readiness hook (median): {Stats.Percentile(with, 0.5) - median:0.0} ms");

        // The scripts alone, started the way git starts a hook (an executable file with git's line on standard input),
        // interleaved: what the Readiness script adds over the cheapest possible hook, without git's own variance.
        var line = $"refs/heads/main {hooked.Sha("HEAD")} refs/heads/main {new string('0', 40)}\n";
        var emptyScript = new List<double>();
        var readinessScript = new List<double>();
        for (var i = 0; i < runs * 3; i++)
        {
            emptyScript.Add(TimeScript(Path.Combine(empty.GitDirectory, "hooks", "pre-push"), hooked.Path, line));
            readinessScript.Add(TimeScript(Path.Combine(hooked.GitDirectory, "hooks", "pre-push"), hooked.Path, line));
        }

        Console.WriteLine($"empty hook script alone:     {Stats.Describe(emptyScript)}");
        Console.WriteLine($"Readiness hook script alone: {Stats.Describe(readinessScript)}");
        Console.WriteLine($"script cost over an empty hook (median): {Stats.Percentile(readinessScript, 0.5) - Stats.Percentile(emptyScript, 0.5):0.00} ms");

        using var folder = new TempDirectory();
        var demo = folder.Combine("bramble-sketches");
        DemoRepository.Create(demo);
        using var demoRemote = TestRepository.Bare();
        GitCli.Run(demo, ["remote", "add", "origin", demoRemote.Path]);
        GitCli.Run(demo, ["push", "-q", "origin", "main"]);
        await InstallAsync(demo, cancellationToken);
        var tagPush = Stats.Time(Math.Max(5, runs / 3), () => GitCli.TryRun(demo, ["push", "-q", "origin", "v2.4.0"], env));
        Console.WriteLine($"release-tag push of the demo (blocked, offline): {Stats.Describe(tagPush)}");
    }

    private static async Task InstallAsync(string repository, CancellationToken cancellationToken)
    {
        var (file, prefix) = ReadinessProcess.Command;
        var command = prefix.Length == 0 ? file : WriteLauncher(repository, file, prefix);
        var console = new CliConsole(TextWriter.Null, Console.Error, false, new Dictionary<string, string> { ["READINESS_COMMAND"] = command }, repository, TextReader.Null);
        await new CliApp(console, TimeProvider.System).RunAsync(["hook", "install"], cancellationToken);
    }

    private static double TimeScript(string script, string workingDirectory, string input)
    {
        var info = new System.Diagnostics.ProcessStartInfo(script) { WorkingDirectory = workingDirectory, RedirectStandardInput = true };
        info.ArgumentList.Add("origin");
        info.ArgumentList.Add("file:///remote.git");
        var watch = System.Diagnostics.Stopwatch.StartNew();
        using var process = System.Diagnostics.Process.Start(info)!;
        try
        {
            process.StandardInput.Write(input);
            process.StandardInput.Close();
        }
        catch (IOException)
        {
            // A hook that exits without reading its input (the empty one): git ignores that broken pipe too.
        }

        process.WaitForExit();
        return watch.Elapsed.TotalMilliseconds;
    }

    /// <summary>The cheapest hook git can run: it starts <c>/bin/sh</c>, which exits at once.</summary>
    private static void WriteEmptyHook(string gitDirectory)
    {
        var hook = Path.Combine(gitDirectory, "hooks", "pre-push");
        Directory.CreateDirectory(Path.GetDirectoryName(hook)!);
        File.WriteAllText(hook, "#!/bin/sh\nexit 0\n");
        File.SetUnixFileMode(hook, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
    }

    private static string WriteLauncher(string repository, string file, string[] prefix)
    {
        var launcher = Path.Combine(repository, ".git", "readiness-launcher");
        File.WriteAllText(launcher, $"#!/bin/sh\nexec {file} {string.Join(' ', prefix)} \"$@\"\n");
        File.SetUnixFileMode(launcher, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        return launcher;
    }
}
