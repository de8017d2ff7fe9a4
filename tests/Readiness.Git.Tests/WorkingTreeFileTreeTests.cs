using Readiness.Core.Reports;
using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Git.Tests;

public sealed class WorkingTreeFileTreeTests
{
    private readonly GitSnapshotSource source = new();

    [Fact]
    public void Worktree_SeesEditsAndUntrackedButNotIgnoredOrDeleted()
    {
        using var repo = TestRepository.Create();
        var head = repo.Write(".gitignore", "bin/\n*.user\n")
            .Write("CHANGELOG.md", "## [Unreleased]\n")
            .Write("to-delete.txt", "x")
            .Write("staged-then-removed.txt", "y")
            .Commit("one");
        repo.Write("CHANGELOG.md", "## [2.4.0] - 2026-11-20\n")
            .Write("NEW.md", "untracked")
            .Write("new-folder/deep/file.cs", "class N {}")
            .Write("bin/Debug/out.dll", "ignored")
            .Write("local.user", "ignored")
            .Write("staged.txt", "staged")
            .Delete("to-delete.txt");
        repo.Git("add", "staged.txt");
        repo.Git("rm", "-q", "staged-then-removed.txt");

        using var snapshot = source.Open(new SnapshotRequest(repo.Path, Worktree: true));

        // git ls-files --cached --others --exclude-standard lists tracked plus untracked-not-ignored files
        // (git-ls-files(1)); files deleted from the working tree are still in the index, so they are filtered out here.
        var expected = repo.Git("ls-files", "-z", "--cached", "--others", "--exclude-standard")
            .Split('\0', StringSplitOptions.RemoveEmptyEntries)
            .Where(p => File.Exists(Path.Combine(repo.Path, p)))
            .Distinct()
            .Order(StringComparer.Ordinal)
            .ToArray();
        Assert.Equal(expected, snapshot.Files.Paths);
        Assert.Equal([".gitignore", "CHANGELOG.md", "NEW.md", "new-folder/deep/file.cs", "staged.txt"], snapshot.Files.Paths);
        Assert.Equal("## [2.4.0] - 2026-11-20\n", snapshot.Files.ReadText("CHANGELOG.md"));
        Assert.Equal("untracked", snapshot.Files.ReadText("NEW.md"));
        Assert.Null(snapshot.Files.ReadBytes("bin/Debug/out.dll"));
        Assert.Equal(InspectionKind.Worktree, snapshot.Inspected);
        Assert.Equal(head, snapshot.Commit);
        Assert.Null(snapshot.CommitSignature);
        Assert.Null(snapshot.Signatures);
    }

    [Fact]
    public void Worktree_SymlinkOutOfTheRepository_IsNotFollowed()
    {
        using var outside = new TempDirectory();
        File.WriteAllText(Path.Combine(outside.Path, "secret.txt"), "outside the repository");
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");
        repo.Symlink("escape.txt", Path.Combine(outside.Path, "secret.txt"));
        repo.Symlink("escape-folder", outside.Path);

        using var snapshot = source.Open(new SnapshotRequest(repo.Path, Worktree: true));

        // git records a symbolic link as a blob holding the link's target path (git-hash-object on a link), and
        // status lists a link to a folder as the link itself, never the folder's contents.
        Assert.Contains("escape.txt", snapshot.Files.Paths);
        Assert.DoesNotContain("escape-folder/secret.txt", snapshot.Files.Paths);
        Assert.Equal(Path.Combine(outside.Path, "secret.txt"), snapshot.Files.ReadText("escape.txt"));
        Assert.Null(snapshot.Files.ReadBytes("escape-folder/secret.txt"));
    }

    [Fact]
    public void Worktree_AboveTheBound_ThrowsFileTooLarge()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");
        repo.Write("big.bin", new byte[10_000]);

        using var snapshot = source.Open(new SnapshotRequest(repo.Path, Worktree: true));

        var error = Assert.Throws<FileTooLargeException>(() => snapshot.Files.ReadBytes("big.bin", 9_999));
        Assert.Equal(10_000, error.Size);
        Assert.Equal(10_000, snapshot.Files.SizeOf("big.bin"));
        Assert.Equal(10_000, snapshot.Files.ReadBytes("big.bin", 10_000)!.Length);
    }

    [Fact]
    public void Worktree_OnBareRepository_ThrowsInspectionError()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");
        using var bare = repo.CloneBare();

        var error = Assert.Throws<RepositoryInspectionException>(() => source.Open(new SnapshotRequest(bare.Path, Worktree: true)));
        Assert.Contains("bare repository", error.Message, StringComparison.Ordinal);
    }
}
