using Readiness.Cli;
using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>Time of <c>readiness check</c> on a repository with 50 packable projects (plus 10 test projects).</summary>
public sealed class CheckManyProjectsBench : IBench
{
    public string Name => "check-50";

    public string Description => "readiness check on a repository with 50 projects (offline)";

    public async Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        using var repo = TestRepository.Create();
        repo.WriteLibrary("3.0.0", "2026-11-20");
        for (var i = 0; i < 50; i++)
        {
            repo.Write($"src/Bramble.Part{i:00}/Bramble.Part{i:00}.csproj", SampleLibrary.Project.Replace("Bramble.Sketches", $"Bramble.Part{i:00}", StringComparison.Ordinal));
            repo.Write($"src/Bramble.Part{i:00}/Part.cs", $"namespace Bramble.Part{i:00};\n\npublic sealed class Part {{ }}\n");
        }

        for (var i = 0; i < 10; i++)
        {
            repo.Write($"tests/Bramble.Part{i:00}.Tests/Bramble.Part{i:00}.Tests.csproj", SampleLibrary.TestProject);
        }

        repo.Commit("Fifty packages");
        repo.AnnotatedTag("v3.0.0", "3.0.0\n");
        var runs = args.Length > 0 ? int.Parse(args[0], System.Globalization.CultureInfo.InvariantCulture) : 10;

        ReadinessProcess.Run(repo.Path, "check", "--offline", "--format", "json");
        Console.WriteLine($"process:    {Stats.Describe(Stats.Time(runs, () => ReadinessProcess.Run(repo.Path, "check", "--offline", "--format", "json")))}");

        var console = new CliConsole(TextWriter.Null, TextWriter.Null, false, new Dictionary<string, string>(), repo.Path, TextReader.Null);
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
