using Readiness.Cli;
using Readiness.Cli.Demo;
using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>Median time of <c>readiness check</c> on the demo repository, process start included, and in-process.</summary>
public sealed class CheckDemoBench : IBench
{
    public string Name => "check-demo";

    public string Description => "readiness check on the demo repository (offline): as a process and in-process";

    public async Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        using var folder = new TempDirectory();
        var repository = folder.Combine("bramble-sketches");
        DemoRepository.Create(repository);
        var runs = args.Length > 0 ? int.Parse(args[0], System.Globalization.CultureInfo.InvariantCulture) : 15;

        ReadinessProcess.Run(repository, "check", "--offline", "--format", "json");
        var process = Stats.Time(runs, () => ReadinessProcess.Run(repository, "check", "--offline", "--format", "json"));
        Console.WriteLine($"process:    {Stats.Describe(process)}");

        var console = new CliConsole(TextWriter.Null, TextWriter.Null, false, new Dictionary<string, string>(), repository, TextReader.Null);
        var app = new CliApp(console, TimeProvider.System);
        await app.RunAsync(["check", "--offline", "--format", "json"], cancellationToken);
        var samples = new List<double>();
        for (var i = 0; i < runs; i++)
        {
            var watch = System.Diagnostics.Stopwatch.StartNew();
            await app.RunAsync(["check", "--offline", "--format", "json"], cancellationToken);
            samples.Add(watch.Elapsed.TotalMilliseconds);
        }

        Console.WriteLine($"in-process: {Stats.Describe(samples)}");
    }
}
