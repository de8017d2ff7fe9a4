using System.IO.Compression;
using System.Text;
using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Git.Tests;

/// <summary>Damaged or unusual repositories: each gives a snapshot with notes, or one clear inspection error.</summary>
public sealed class GitSnapshotSourceHostileTests
{
    private readonly GitSnapshotSource source = new();

    [Fact]
    public void AnnotatedTagWhoseCommitIsMissing_IsANoteAboutThatTag_TheOthersStay()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");
        repo.AnnotatedTag("v1.0.0", "1.0.0\n");
        var head = repo.Head;
        var lost = repo.Write("b.txt", "b").Commit("two");
        repo.AnnotatedTag("v0.9.0", "0.9.0\n", target: lost);
        repo.Git("reset", "-q", "--hard", head);
        File.Delete(LooseObject(repo, lost));

        // git itself: the tag's target is gone (git cat-file -e exits non-zero for a missing object).
        Assert.NotEqual(0, repo.TryGit("cat-file", "-e", lost).ExitCode);
        using var snapshot = source.Open(new SnapshotRequest(repo.Path));

        Assert.Contains(snapshot.Tags, t => t.Name == "v1.0.0");
        Assert.DoesNotContain(snapshot.Tags, t => t.Name == "v0.9.0");
        Assert.Contains(snapshot.Notes, n => n.Contains("refs/tags/v0.9.0", StringComparison.Ordinal));
    }

    [Fact]
    public void TagRefNamingAMissingObject_AndGarbageRefs_DoNotStopTheInspection()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");
        repo.AnnotatedTag("v1.0.0", "1.0.0\n");
        File.WriteAllText(Path.Combine(repo.GitDirectory, "refs", "tags", "ghost"), "0123456789abcdef0123456789abcdef01234567\n");
        File.WriteAllText(Path.Combine(repo.GitDirectory, "refs", "tags", "junk"), "not a sha\n");

        using var snapshot = source.Open(new SnapshotRequest(repo.Path));

        Assert.Contains(snapshot.Tags, t => t.Name == "v1.0.0");
        Assert.DoesNotContain(snapshot.Tags, t => t.Name == "ghost");
    }

    [Fact]
    public void CorruptCommit_IsDescribedAsDamaged_NotAsATag()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");
        var sha = repo.Write("b.txt", "b").Commit("two");
        var file = LooseObject(repo, sha);
        File.SetAttributes(file, FileAttributes.Normal);
        File.WriteAllBytes(file, Deflate("commit 12\0not a commit"));

        var error = Assert.Throws<RepositoryInspectionException>(() => source.Open(new SnapshotRequest(repo.Path, sha)));

        Assert.Contains("damaged", error.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("tag", error.Message, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void SymlinkAndSubmodule_AreUnreadEntries_NotFiles()
    {
        using var repo = TestRepository.Create();
        repo.Write("README.md", "x").Symlink("LICENSE", "/etc/passwd").Commit("one");
        repo.Git("update-index", "--add", "--cacheinfo", $"160000,{repo.Head},vendor/lanternfly");
        repo.Git("commit", "-q", "-m", "submodule");

        // git ls-tree is the reference for the modes: 120000 a symbolic link, 160000 a gitlink (submodule).
        var tree = repo.Git("ls-tree", "-r", "HEAD");
        Assert.Contains("120000 blob", tree, StringComparison.Ordinal);
        Assert.Contains("160000 commit", tree, StringComparison.Ordinal);
        using var snapshot = source.Open(new SnapshotRequest(repo.Path));

        Assert.Equal(["README.md"], snapshot.Files.Paths);
        Assert.Null(snapshot.Files.ReadBytes("LICENSE"));
        Assert.Contains(snapshot.Files.Unread, u => u.Path == "LICENSE" && u.Reason.Contains("symbolic link (to /etc/passwd)", StringComparison.Ordinal));
        Assert.Contains(snapshot.Files.Unread, u => u.Path == "vendor/lanternfly" && u.Reason.Contains("submodule", StringComparison.Ordinal));
    }

    [Fact]
    public void FoldersDeeperThanTheBound_AreNotListed_TheFirstTooDeepOneIsNamed()
    {
        using var repo = TestRepository.Create();
        repo.Write("README.md", "x").Commit("one");
        var deep = string.Join('/', Enumerable.Repeat("d", 3_000)) + "/f.txt";
        var stream = $"blob\nmark :1\ndata 2\nx\n\ncommit refs/heads/main\ncommitter A <a@bramblecote.example> 1795000000 +0000\ndata 4\ndeep\nfrom {repo.Head}\nM 100644 :1 {deep}\nM 100644 :1 d/shallow.txt\n\n";
        repo.GitWithInput(stream, "fast-import", "--quiet");

        using var snapshot = source.Open(new SnapshotRequest(repo.Path, "main"));

        Assert.Equal(["README.md", "d/shallow.txt"], snapshot.Files.Paths);
        var unread = Assert.Single(snapshot.Files.Unread);
        Assert.Equal(FileLimits.MaxFolderDepth, unread.Path.Split('/').Length);
        Assert.Contains("nested 256 folders deep", unread.Reason, StringComparison.Ordinal);
    }

    private static string LooseObject(TestRepository repo, string sha) => Path.Combine(repo.GitDirectory, "objects", sha[..2], sha[2..]);

    private static byte[] Deflate(string content)
    {
        using var output = new MemoryStream();
        using (var zlib = new ZLibStream(output, CompressionLevel.Fastest))
        {
            zlib.Write(Encoding.ASCII.GetBytes(content));
        }

        return output.ToArray();
    }
}
