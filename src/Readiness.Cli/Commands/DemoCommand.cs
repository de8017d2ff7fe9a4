using System.CommandLine;
using Readiness.Cli.Demo;
using Readiness.Core.Engine;
using Readiness.Core.Snapshots;
using Readiness.Rendering;

namespace Readiness.Cli.Commands;

/// <summary><c>readiness demo [--keep DIR]</c>: builds the invented demo repository, checks it, writes the HTML report.</summary>
public sealed class DemoCommand(Composition composition, CliConsole console, CheckCommand check)
{
    public Command Build()
    {
        var keep = new Option<string?>("--keep") { Description = "Build the demo repository in DIR and keep it (default: a temporary folder)" };
        var command = new Command("demo", "Build an invented repository with a flawed release, check it and write an HTML report.");
        command.Options.Add(keep);
        command.SetAction((parse, token) => RunAsync(parse.GetValue(keep), token));
        return command;
    }

    public async Task<int> RunAsync(string? keep, CancellationToken cancellationToken)
    {
        var folder = keep is null
            ? Path.Combine(Path.GetTempPath(), "readiness-demo-" + Guid.NewGuid().ToString("N")[..8])
            : console.FullPath(keep);
        if (Directory.Exists(folder) && Directory.EnumerateFileSystemEntries(folder).Any())
        {
            await console.Error.WriteLineAsync($"readiness: {folder} is not empty; choose an empty or new folder for --keep").ConfigureAwait(false);
            return ExitCodes.Usage;
        }

        var repository = Path.Combine(folder, "bramble-sketches");
        var tag = DemoRepository.Create(repository);
        await console.Out.WriteLineAsync($"Demo repository (invented): {repository}, release tag {tag}").ConfigureAwait(false);

        var feed = Path.Combine(folder, "feed");
        DemoFeed.Create(feed);
        await console.Out.WriteLineAsync($"Demo package feed (local folder, invented packages): {feed}").ConfigureAwait(false);
        await console.Out.WriteLineAsync().ConfigureAwait(false);

        var request = new RunRequest(new SnapshotRequest(repository, tag, tag));
        var registries = check.RegistriesFor(feed, TimeSpan.FromSeconds(5), noCache: true);
        var report = await composition.Runner.RunAsync(request, registries, cancellationToken).ConfigureAwait(false);
        await check.WriteReportAsync(report, "text", Array.Empty<string>(), cancellationToken).ConfigureAwait(false);

        var html = Path.Combine(folder, "readiness-report.html");
        await using (var writer = new StreamWriter(html))
        {
            new RendererCatalog().Find("html")!.Render(report, writer);
        }

        await console.Out.WriteLineAsync().ConfigureAwait(false);
        await console.Out.WriteLineAsync($"HTML report: {html}").ConfigureAwait(false);
        await console.Out.WriteLineAsync($"Try: readiness check {repository} --registry {feed} --format json   (or --worktree after fixing files)").ConfigureAwait(false);
        return ExitCodes.Ready;
    }
}
