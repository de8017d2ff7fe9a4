using System.Diagnostics;
using System.Globalization;

using Readiness.Cli.Demo;
using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>
/// Start-up against its floor, in one run, for one build of the program (<c>build/bench.sh</c> runs it for each publish
/// mode): the floor is the hello-world program of the same publish mode plus <c>git cat-file --batch</c> of every blob of
/// the inspected commit (the check reads each tracked file); cases and floors are interleaved, medians reported. Cases:
/// <c>check --offline</c> on the demo repository and on 300 projects / 30,000 files (with peak RSS), the pre-push hook's
/// release-tag path, and the registry phase for 20 ids on a feed served on 127.0.0.1 (the difference between
/// <c>check --registry</c> and <c>check --offline</c>, cold and warm cache).
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class StartupBench : IBench
{
    public string Name => "startup";

    public string Description => "start-up of a published program against its floor: --program EXE --hello EXE [--runs N] [--label L]";

    public async Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        var program = Option(args, "--program") ?? ReadinessProcess.AppHost;
        var hello = Option(args, "--hello");
        var label = Option(args, "--label") ?? Path.GetFileName(Path.GetDirectoryName(Path.GetFullPath(program))) ?? "build";
        var runs = int.Parse(Option(args, "--runs") ?? "21", CultureInfo.InvariantCulture);
        if (hello is null || !File.Exists(hello) || !File.Exists(program))
        {
            Console.WriteLine("give --program and --hello (a published readiness and hello of the same mode); build/bench.sh does");
            return;
        }

        var (load1, _) = LoadAverage();
        Console.WriteLine($"build: {label}; program {program}; {runs} interleaved runs per case; load average {load1}");
        var rows = new List<string>();

        using var folder = new TempDirectory();
        var demo = folder.Combine("demo");
        DemoRepository.Create(demo);
        rows.Add(Compare("check --offline, small (demo)", runs, Floor(hello, demo), () => Run(program, demo, string.Empty, "check", "--offline", "--format", "json"), target: "<= 1.5x floor"));

        using (var many = ManyProjectsRepository.Create(300, 30_000))
        {
            var files = Git(many.Path, "ls-tree", "-r", "--name-only", "HEAD").Split('\n', StringSplitOptions.RemoveEmptyEntries).Length;
            var row = Compare($"check --offline, 300 projects / {files} files", Math.Max(5, runs / 3), Floor(hello, many.Path), () => Run(program, many.Path, string.Empty, "check", "--offline", "--format", "json"), target: "< 1000 ms, <= 150 MB");
            rows.Add(row + $" | peak RSS {PeakRssMegabytes(program, many.Path, "check", "--offline", "--format", "json")}");
        }

        rows.Add(HookTagPush(program, demo, runs));
        rows.AddRange(await RegistryAsync(program, folder, runs, cancellationToken));

        Console.WriteLine();
        Console.WriteLine($"| {label} | median | floor | ratio | target |");
        Console.WriteLine("|---|---|---|---|---|");
        foreach (var row in rows)
        {
            Console.WriteLine(row);
        }

        var (after, _) = LoadAverage();
        Console.WriteLine($"load average at the end: {after}");
    }

    /// <summary>The floor sample: hello world of the same mode, then git cat-file --batch of every blob of HEAD.</summary>
    private static Func<double> Floor(string hello, string repository)
    {
        var blobs = string.Join('\n', Git(repository, "ls-tree", "-r", "HEAD").Split('\n', StringSplitOptions.RemoveEmptyEntries)
            .Select(l => l.Split(' ', '\t')).Where(p => p[1] == "blob").Select(p => p[2])) + "\n";
        return () => Run(hello, repository, string.Empty) + Run("git", repository, blobs, "cat-file", "--batch");
    }

    private static string Compare(string name, int runs, Func<double> floor, Func<double> action, string target)
    {
        floor();
        action();
        var floors = new List<double>();
        var samples = new List<double>();
        for (var i = 0; i < runs; i++)
        {
            floors.Add(floor());
            samples.Add(action());
        }

        var f = Stats.Percentile(floors, 0.5);
        var m = Stats.Percentile(samples, 0.5);
        Console.WriteLine($"{name}: {Stats.Describe(samples)}; floor {Stats.Describe(floors)}");
        return $"| {name} | {m:0} ms | {f:0} ms | {m / f:0.00} | {target} |";
    }

    private static string HookTagPush(string program, string demo, int runs)
    {
        using var remote = TestRepository.Bare();
        Git(demo, "remote", "add", "origin", remote.Path);
        Git(demo, "push", "-q", "origin", "main");
        var env = new Dictionary<string, string> { ["READINESS_OFFLINE"] = "1", ["READINESS_COMMAND"] = program };
        Run(program, demo, string.Empty, env, "hook", "install");

        // The same push without a hook is the floor: what git itself costs for a tag push.
        using var plainRemote = TestRepository.Bare();
        var plainHooks = Path.Combine(Path.GetTempPath(), $"readiness-bench-nohooks-{Guid.NewGuid():N}");
        Directory.CreateDirectory(plainHooks);
        try
        {
            Git(demo, "remote", "add", "plain", plainRemote.Path);
            return Compare(
                "pre-push hook, release tag (blocked, offline)",
                runs,
                () => Run("git", demo, string.Empty, "-c", $"core.hooksPath={plainHooks}", "push", "-q", "--dry-run", "plain", "v2.4.0"),
                () => Run("git", demo, string.Empty, env, "push", "-q", "origin", "v2.4.0"),
                target: "<= 200 ms");
        }
        finally
        {
            Directory.Delete(plainHooks, recursive: true);
        }
    }

    private static async Task<IEnumerable<string>> RegistryAsync(string program, TempDirectory folder, int runs, CancellationToken cancellationToken)
    {
        using var repo = ManyProjectsRepository.Create(20, 60);
        using var feed = LocalHttpFeed.Start();
        for (var p = 0; p < 20; p++)
        {
            feed.Add($"Bramble.Part{p:000}", "2.0.0").Add($"Bramble.Part{p:000}", "2.1.0");
        }

        using var http = new HttpClient();
        await http.GetStringAsync(feed.ServiceIndexUrl, cancellationToken);
        var trips = Stats.Time(runs, () => http.GetStringAsync(feed.ServiceIndexUrl, cancellationToken).GetAwaiter().GetResult());
        var roundTrip = Stats.Percentile(trips, 0.5);
        var cache = folder.Combine("registry-cache");
        var env = new Dictionary<string, string> { ["XDG_CACHE_HOME"] = cache, ["HOME"] = folder.Path, ["NUGET_PACKAGES"] = folder.Combine("packages") };
        double Offline() => Run(program, repo.Path, string.Empty, env, "check", "--offline", "--format", "json");
        double Cold() => Run(program, repo.Path, string.Empty, env, "check", "--registry", feed.ServiceIndexUrl, "--no-cache", "--format", "json");
        double Warm() => Run(program, repo.Path, string.Empty, env, "check", "--registry", feed.ServiceIndexUrl, "--format", "json");
        Warm();
        var rows = new List<string>();
        foreach (var (name, phase, target) in new (string, Func<double>, string)[] { ("warm", Warm, "<= 50 ms"), ("cold", Cold, "about 1 round trip") })
        {
            var offline = new List<double>();
            var with = new List<double>();
            for (var i = 0; i < runs; i++)
            {
                offline.Add(Offline());
                with.Add(phase());
            }

            var added = Stats.Percentile(with, 0.5) - Stats.Percentile(offline, 0.5);
            Console.WriteLine($"registry phase, {name}, 20 ids: check {Stats.Describe(with)}; offline {Stats.Describe(offline)}; one round trip {roundTrip:0.0} ms");
            rows.Add($"| registry phase, {name} cache, 20 ids (127.0.0.1) | +{added:0} ms | round trip {roundTrip:0.0} ms | {added / roundTrip:0.0} trips | {target} |");
        }

        return rows;
    }

    private static double Run(string file, string directory, string input, params string[] args) =>
        Run(file, directory, input, new Dictionary<string, string>(), args);

    private static double Run(string file, string directory, string input, IReadOnlyDictionary<string, string> environment, params string[] args)
    {
        var info = new ProcessStartInfo(file) { WorkingDirectory = directory, RedirectStandardInput = true, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in args)
        {
            info.ArgumentList.Add(a);
        }

        foreach (var (name, value) in environment)
        {
            info.Environment[name] = value;
        }

        var watch = Stopwatch.StartNew();
        using var process = Process.Start(info)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        process.StandardInput.Write(input);
        process.StandardInput.Close();
        process.WaitForExit();
        var elapsed = watch.Elapsed.TotalMilliseconds;
        _ = output.Result + error.Result;
        return elapsed;
    }

    private static string Git(string directory, params string[] args) => GitCli.Run(directory, args);

    /// <summary>Peak resident set of the program over three runs, from GNU time's <c>%M</c> (kilobytes), when it is installed.</summary>
    private static string PeakRssMegabytes(string program, string directory, params string[] args)
    {
        const string time = "/usr/bin/time";
        if (!File.Exists(time))
        {
            return "n/a (no /usr/bin/time)";
        }

        var peaks = new List<double>();
        for (var i = 0; i < 3; i++)
        {
            var info = new ProcessStartInfo(time) { WorkingDirectory = directory, RedirectStandardOutput = true, RedirectStandardError = true };
            foreach (var a in new[] { "-f", "%M", program }.Concat(args))
            {
                info.ArgumentList.Add(a);
            }

            using var process = Process.Start(info)!;
            var output = process.StandardOutput.ReadToEndAsync();
            var error = process.StandardError.ReadToEnd();
            process.WaitForExit();
            _ = output.Result;
            var last = error.Split('\n', StringSplitOptions.RemoveEmptyEntries).LastOrDefault() ?? string.Empty;
            if (double.TryParse(last.Trim(), NumberStyles.Integer, CultureInfo.InvariantCulture, out var kilobytes))
            {
                peaks.Add(kilobytes / 1024);
            }
        }

        return peaks.Count == 0 ? "n/a" : $"{peaks.Max():0} MB";
    }

    private static (string One, string Five) LoadAverage()
    {
        var parts = File.Exists("/proc/loadavg") ? File.ReadAllText("/proc/loadavg").Split(' ') : ["?", "?"];
        return (parts[0], parts[1]);
    }

    private static string? Option(string[] args, string name)
    {
        var at = Array.IndexOf(args, name);
        return at >= 0 && at + 1 < args.Length ? args[at + 1] : null;
    }
}
