using System.Diagnostics;

using Readiness.Core.Snapshots;
using Readiness.Git;
using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>Opening a commit snapshot of a 200-file repository with 100 tags, then reading 50 blobs.</summary>
public sealed class GitSnapshotBench : IBench
{
    public string Name => "git-snapshot";

    public string Description => "open a commit snapshot (200 files, 100 tags) and read 50 blobs";

    public Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        using var repo = TestRepository.Create();
        FastImportRepository.Fill(repo, commits: 200, files: 200, tags: 100);
        var source = new GitSnapshotSource();
        var request = new SnapshotRequest(repo.Path);

        var cold = Stopwatch.StartNew();
        var (files, tags) = OpenAndRead(source, request);
        Console.WriteLine($"first open + 50 reads (includes JIT and native load): {cold.Elapsed.TotalMilliseconds:0.0} ms; {files} files, {tags} tags");

        Console.WriteLine($"open + 50 reads: {Stats.Describe(Stats.Time(30, () => OpenAndRead(source, request)))}");
        Console.WriteLine($"open only:       {Stats.Describe(Stats.Time(30, () => source.Open(request).Dispose()))}");
        using var snapshot = source.Open(request);
        Console.WriteLine($"50 reads only:   {Stats.Describe(Stats.Time(30, () => Read50(snapshot)))}");
        Console.WriteLine($"worktree open:   {Stats.Describe(Stats.Time(10, () => source.Open(request with { Worktree = true }).Dispose()))}");

        // Fresh tags are loose ref files, one read each; a clone or `git gc` packs them into one file.
        repo.Git("pack-refs", "--all");
        Console.WriteLine($"refs packed, open + 50 reads: {Stats.Describe(Stats.Time(30, () => OpenAndRead(source, request)))}");
        Console.WriteLine($"cpu time per open + 50 reads (packed refs): {CpuPerRun(30, () => OpenAndRead(source, request)):0.0} ms");
        return Task.CompletedTask;
    }

    /// <summary>Processor time per run: steadier than wall time on a busy machine.</summary>
    private static double CpuPerRun(int runs, Action action)
    {
        using var process = Process.GetCurrentProcess();
        var before = process.TotalProcessorTime;
        for (var i = 0; i < runs; i++)
        {
            action();
        }

        process.Refresh();
        return (process.TotalProcessorTime - before).TotalMilliseconds / runs;
    }

    private static (int Files, int Tags) OpenAndRead(GitSnapshotSource source, SnapshotRequest request)
    {
        using var snapshot = source.Open(request);
        Read50(snapshot);
        return (snapshot.Files.Paths.Count, snapshot.Tags.Count);
    }

    private static void Read50(ReleaseSnapshot snapshot)
    {
        for (var i = 0; i < 50; i++)
        {
            _ = snapshot.Files.ReadBytes(FastImportRepository.FilePath(i * 4)) ?? throw new InvalidOperationException("blob missing");
        }
    }
}
