using System.Diagnostics;

using Readiness.Core.Snapshots;
using Readiness.Git;
using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>Collecting reachable tags in a long history: 10,000 commits, 300 tags on main, 50 on a side branch.</summary>
public sealed class GitHistoryBench : IBench
{
    public string Name => "git-history";

    public string Description => "open a snapshot in a 10k-commit history with 350 tags (50 on a side branch), refs packed";

    public Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        using var repo = TestRepository.Create();
        var build = Stopwatch.StartNew();
        FastImportRepository.Fill(repo, commits: 10_000, files: 20, tags: 300, sideTags: 50);
        repo.Git("pack-refs", "--all");
        Console.WriteLine($"history built with git fast-import in {build.Elapsed.TotalMilliseconds:0} ms");
        var source = new GitSnapshotSource();

        // git tag --merged is the reference count of reachable tags.
        var expected = repo.Git("tag", "--merged", "HEAD").Split('\n', StringSplitOptions.RemoveEmptyEntries).Length;
        foreach (var revision in (string[])["HEAD", "HEAD~5000"])
        {
            var request = new SnapshotRequest(repo.Path, revision);
            using (var snapshot = source.Open(request))
            {
                var reference = repo.Git("tag", "--merged", revision).Split('\n', StringSplitOptions.RemoveEmptyEntries).Length;
                Console.WriteLine($"{revision}: {snapshot.Tags.Count} reachable tags (git tag --merged: {reference}), {snapshot.Files.Paths.Count} files");
            }

            Console.WriteLine($"open at {revision,-9}: {Stats.Describe(Stats.Time(10, () => source.Open(request).Dispose()))}");
        }

        Console.WriteLine($"(reachable from HEAD per git: {expected})");
        return Task.CompletedTask;
    }
}
