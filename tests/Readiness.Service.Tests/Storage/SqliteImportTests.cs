using System.Diagnostics;
using Readiness.Service.Storage;
using Readiness.Testing;

namespace Readiness.Service.Tests.Storage;

/// <summary>The documented upgrade: <c>import-sqlite FILE</c> run by the real program against a real PostgreSQL database.</summary>
[Collection(PostgresCollection.Name)]
public sealed class SqliteImportTests(PostgresCluster cluster) : IDisposable
{
    private readonly SqliteBackend sqlite = new();
    private readonly string target = cluster.CreateDatabase();
    private readonly TempDirectory data = new("readiness-import-");

    [Fact]
    public async Task ImportCommand_CopiesDeliveriesJobsAndRuns_KeepingIds()
    {
        var jobs = sqlite.Jobs(TimeProvider.System);
        var runs = sqlite.Runs(TimeProvider.System);
        var first = await jobs.RecordDeliveryAsync("d-1", "pull_request", Request(1), default);
        await jobs.RecordDeliveryAsync("d-2", "pull_request", Request(2), default);
        await jobs.RecordDeliveryAsync("d-3", "ping", null, default);
        var claimed = (await jobs.ClaimAsync("w1", TimeSpan.FromMinutes(1), default))!;
        var runId = await runs.AddAsync(new RunRecord(0, "bramblecote/sketches", 1, new string('a', 40), "pull/1", "library", RunRecord.NotReady, "1 blocking", RunRecord.FromService, claimed.Id, "{}", "md", null, [new Waiver("signing.tag", "next week")], default), default);
        await jobs.FinishAsync(claimed.Id, "w1", JobState.Done, runId, null, default);
        sqlite.Database.Dispose();

        var import = Run("import-sqlite", sqlite.Database.Path);
        Assert.True(import.ExitCode == 0, import.Log);
        Assert.Equal($"imported 3 deliveries, 2 jobs and 1 runs from {sqlite.Database.Path}", import.StdOut.Trim());

        using var database = new PostgresDatabase(target);
        var pgJobs = new PostgresJobStore(database, TimeProvider.System);
        var pgRuns = new PostgresRunStore(database, TimeProvider.System);
        Assert.Equal(JobState.Done, pgJobs.Find(first.JobId!.Value)?.State);
        Assert.Equal(runId, pgJobs.Find(first.JobId!.Value)?.RunId);
        var run = pgRuns.Find(runId)!;
        Assert.Equal("1 blocking", run.Summary);
        Assert.Equal(new Waiver("signing.tag", "next week"), Assert.Single(run.Waivers));
        Assert.Equal(EnqueueOutcome.Duplicate, (await pgJobs.RecordDeliveryAsync("d-3", "ping", null, default)).Outcome);

        // New rows continue after the imported ids.
        var next = await pgJobs.RecordDeliveryAsync("d-4", "pull_request", Request(3), default);
        Assert.Equal(3, next.JobId);
        Assert.Equal(runId + 1, await pgRuns.AddAsync(run with { JobId = null }, default));

        // A second import would mix two histories: refused with one line and exit code 4.
        var again = Run("import-sqlite", sqlite.Database.Path);
        Assert.Equal(Program.ImportFailed, again.ExitCode);
        Assert.StartsWith("readiness service: import-sqlite: the PostgreSQL database already holds deliveries", again.StdErr.Trim(), StringComparison.Ordinal);
    }

    public void Dispose()
    {
        sqlite.Dispose();
        data.Dispose();
    }

    private ProcessResult Run(params string[] args)
    {
        var start = new ProcessStartInfo("dotnet") { RedirectStandardError = true, RedirectStandardOutput = true, WorkingDirectory = data.Path };
        start.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, "Readiness.Service.dll"));
        args.ToList().ForEach(start.ArgumentList.Add);
        start.Environment["Readiness__Forge__Token"] = "import-token";
        start.Environment["Readiness__Forge__WebhookSecret"] = "import-secret";
        start.Environment["Readiness__DataFolder"] = data.Path;
        start.Environment["Readiness__PostgresConnection"] = target;
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEnd();
        process.WaitForExit();
        return new ProcessResult(process.ExitCode, stdout.Result, stderr);
    }

    private static JobRequest Request(int pr) =>
        new("bramblecote/sketches", "https://git.example/bramblecote/sketches.git", 42, pr, new string('b', 40), "release/2.4", "body", "release branch");
}
