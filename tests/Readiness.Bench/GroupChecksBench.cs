using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Core.Engine;
using Readiness.Core.Projects.MsBuild;
using Readiness.Core.Snapshots;
using Readiness.Git;
using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>
/// Time of each deps.*, matrix.*, signing.*, metadata.* and secrets.* check on a committed repository of 50 packable
/// projects and 10 test projects (snapshot and project model built once, as the engine does).
/// </summary>
public sealed class GroupChecksBench : IBench
{
    private static readonly string[] Groups = ["deps.", "matrix.", "signing.", "metadata.", "secrets."];

    public string Name => "group-checks-50";

    public string Description => "each deps/matrix/signing/metadata/secrets check on a 50-project commit (in process)";

    public Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        using var repo = TestRepository.Create();
        repo.WriteLibrary("3.0.0", "2026-11-20");
        repo.Write(".readiness.yml", "host-packages: [\"Lanternfly.Host.*\"]\nhost-marker: id-suffix\n");
        for (var i = 0; i < 50; i++)
        {
            repo.Write($"src/Bramble.Part{i:00}/Bramble.Part{i:00}.csproj", SampleLibrary.Project.Replace("Bramble.Sketches", $"Bramble.Part{i:00}", StringComparison.Ordinal));
            for (var f = 0; f < 20; f++)
            {
                repo.Write($"src/Bramble.Part{i:00}/Part{f:00}.cs", $"namespace Bramble.Part{i:00};\n\npublic sealed class Part{f:00}\n{{\n    public int Value {{ get; }} = {f};\n}}\n");
            }
        }

        for (var i = 0; i < 10; i++)
        {
            repo.Write($"tests/Bramble.Part{i:00}.Tests/Bramble.Part{i:00}.Tests.csproj", SampleLibrary.TestProject);
        }

        repo.Commit("Fifty packages");
        repo.AnnotatedTag("v3.0.0", "3.0.0\n");
        var runs = args.Length > 0 ? int.Parse(args[0], System.Globalization.CultureInfo.InvariantCulture) : 10;

        using var snapshot = new GitSnapshotSource().Open(new SnapshotRequest(repo.Path, "v3.0.0", "v3.0.0"));
        var config = new RepositoryConfigParser(new ChecklistParser(CheckIds.All)).Parse(RepositoryConfig.FileName, snapshot.Files.ReadText(RepositoryConfig.FileName)!);
        var model = new StaticProjectReader().Read(snapshot.Files);
        var now = DateTimeOffset.UtcNow;
        var release = ReleaseFactsBuilder.Build(snapshot, model, config, null, now);
        var context = new CheckContext(snapshot, model, release, new CheckParameters(new Dictionary<string, ConfigNode>(), config), null, now);
        Console.WriteLine($"{snapshot.Files.Paths.Count} files, {model.Projects.Count} projects");

        var total = 0.0;
        foreach (var check in CheckCatalog.BuiltIn().Checks.Where(c => Groups.Any(g => c.Descriptor.Id.StartsWith(g, StringComparison.Ordinal))))
        {
            var findings = check.Run(context).ToList();
            var samples = Stats.Time(runs, () => check.Run(context).ToList());
            total += Stats.Percentile(samples, 0.5);
            Console.WriteLine($"{check.Descriptor.Id,-28} {findings.Count,3} results  {Stats.Describe(samples)}");
        }

        Console.WriteLine($"sum of medians: {total:0.0} ms");
        return Task.CompletedTask;
    }
}
