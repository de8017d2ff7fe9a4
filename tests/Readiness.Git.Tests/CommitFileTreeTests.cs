using Readiness.Core.Reports;
using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Git.Tests;

public sealed class CommitFileTreeTests
{
    private readonly GitSnapshotSource source = new();

    [Fact]
    public void Paths_EqualGitLsTree()
    {
        using var repo = TestRepository.Create();
        repo.Write("README.md", "# Bramble.Sketches\n")
            .Write("src/Bramble.Sketches/Bramble.Sketches.csproj", "<Project />")
            .Write("src/Bramble.Sketches/Quantiles/KllSketch.cs", "class K {}")
            .Write("src/Bramble.Sketches.Lanternfly3/Plugin.cs", "class P {}")
            .Write("a-b/x.txt", "1")
            .Write("a/b.txt", "2")
            .Write("a.txt", "3")
            .Write("Z.txt", "4")
            .Write("docs/space name.md", "5")
            .Symlink("link-to-readme", "README.md");
        var sha = repo.Commit("Initial import");

        using var snapshot = source.Open(new SnapshotRequest(repo.Path, sha));

        // git ls-tree -r is the reference listing of a commit's entries (git-ls-tree(1)); -z avoids git's quoting of
        // unusual names. Mode 120000 is a symbolic link: listed apart, never read as a file. Our order is ordinal.
        var entries = repo.Git("ls-tree", "-r", "-z", sha).Split('\0', StringSplitOptions.RemoveEmptyEntries)
            .Select(e => (Mode: e[..6], Path: e[(e.IndexOf('\t', StringComparison.Ordinal) + 1)..])).ToList();
        var expected = entries.Where(e => e.Mode != "120000").Select(e => e.Path).Order(StringComparer.Ordinal).ToArray();
        Assert.Equal(expected, snapshot.Files.Paths);
        Assert.Equal(9, snapshot.Files.Paths.Count);
        Assert.Equal(entries.Where(e => e.Mode == "120000").Select(e => e.Path), snapshot.Files.Unread.Select(u => u.Path));
    }

    [Fact]
    public void ReadBytes_EqualsGitShowForEveryFile()
    {
        using var repo = TestRepository.Create();
        repo.Write("CHANGELOG.md", "# Changelog\n\n## [Unreleased]\n")
            .Write("crlf.txt", "line one\r\nline two\r\n")
            .Write("bom.txt", "\uFEFFwith a byte order mark")
            .Write("bin/data.bin", [0, 1, 2, 255, 0, 13, 10])
            .Write("empty.txt", string.Empty);
        var sha = repo.Commit("files");

        using var snapshot = source.Open(new SnapshotRequest(repo.Path, sha));

        foreach (var path in snapshot.Files.Paths)
        {
            // git cat-file blob COMMIT:PATH prints the stored bytes exactly (git-cat-file(1)); `git show` does the same
            // for a blob but the raw form avoids any text conversion.
            var expected = GitBytes(repo, "cat-file", "blob", $"{sha}:{path}");
            Assert.Equal(expected, snapshot.Files.ReadBytes(path));
            Assert.Equal(expected.LongLength, snapshot.Files.SizeOf(path));
            Assert.True(snapshot.Files.Exists(path));
        }

        Assert.Equal("# Changelog\n\n## [Unreleased]\n", repo.Git("show", $"{sha}:CHANGELOG.md"));
        Assert.Equal("# Changelog\n\n## [Unreleased]\n", snapshot.Files.ReadText("CHANGELOG.md"));
        Assert.Null(snapshot.Files.ReadBytes("missing.txt"));
        Assert.Null(snapshot.Files.SizeOf("missing.txt"));
        Assert.False(snapshot.Files.Exists("bin"));
    }

    [Fact]
    public void OlderCommitAndTag_ReadOldContentWhileWorkingTreeHasNew()
    {
        using var repo = TestRepository.Create();
        var first = repo.Write("Directory.Build.props", "<Project><PropertyGroup><Version>2.3.1</Version></PropertyGroup></Project>")
            .Write("old-only.txt", "gone later")
            .Commit("2.3.1");
        repo.AnnotatedTag("v2.3.1", "Release 2.3.1");
        repo.Write("Directory.Build.props", "<Project><PropertyGroup><Version>2.4.0</Version></PropertyGroup></Project>")
            .Delete("old-only.txt")
            .Commit("2.4.0");
        repo.Write("Directory.Build.props", "<Project><PropertyGroup><Version>2.5.0-dev</Version></PropertyGroup></Project>");

        using var byTag = source.Open(new SnapshotRequest(repo.Path, "v2.3.1"));
        using var byParent = source.Open(new SnapshotRequest(repo.Path, "HEAD~1"));
        using var head = source.Open(new SnapshotRequest(repo.Path));

        // The working tree holds the uncommitted 2.5.0-dev; commits hold what git show prints for them.
        Assert.Contains("2.5.0-dev", repo.Read("Directory.Build.props"), StringComparison.Ordinal);
        Assert.Equal(repo.Git("show", "v2.3.1:Directory.Build.props"), byTag.Files.ReadText("Directory.Build.props"));
        Assert.Contains("2.3.1", byTag.Files.ReadText("Directory.Build.props"), StringComparison.Ordinal);
        Assert.Equal(first, byTag.Commit);
        Assert.Equal(first, byParent.Commit);
        Assert.True(byParent.Files.Exists("old-only.txt"));
        Assert.Contains("2.4.0", head.Files.ReadText("Directory.Build.props"), StringComparison.Ordinal);
        Assert.False(head.Files.Exists("old-only.txt"));
        Assert.Equal(InspectionKind.Commit, head.Inspected);
    }

    [Fact]
    public void RevisionForms_ResolveLikeGitRevParse()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "1").Commit("one");
        repo.Tag("v1.0.0");
        repo.Write("a.txt", "2").Commit("two");
        repo.Branch("release/1.x", "v1.0.0");

        foreach (var revision in (string[])["HEAD", "HEAD~1", "main", "release/1.x", "v1.0.0", "refs/tags/v1.0.0", repo.Head, repo.Head[..8]])
        {
            using var snapshot = source.Open(new SnapshotRequest(repo.Path, revision));

            // git rev-parse REV^{commit} is the reference for what a revision names (gitrevisions(7)).
            Assert.Equal(repo.Sha(revision + "^{commit}"), snapshot.Commit);
            Assert.Equal(revision, snapshot.Ref);
        }
    }

    [Fact]
    public void CommitDate_IsTheCommitterDate()
    {
        using var repo = TestRepository.Create();
        var date = new DateTimeOffset(2026, 11, 18, 16, 45, 12, TimeSpan.FromHours(2));
        repo.Write("a.txt", "1").Commit("one", date);

        using var snapshot = source.Open(new SnapshotRequest(repo.Path));

        // git log --format=%cI prints the committer date in strict ISO 8601.
        Assert.Equal(DateTimeOffset.Parse(repo.Git("log", "-1", "--format=%cI").Trim(), System.Globalization.CultureInfo.InvariantCulture), snapshot.CommitDate);
        Assert.Equal(date, snapshot.CommitDate);
        Assert.Equal(TimeSpan.FromHours(2), snapshot.CommitDate.Offset);
    }

    [Fact]
    public void ReadBytes_AboveTheBound_ThrowsFileTooLarge()
    {
        using var repo = TestRepository.Create();
        repo.Write("signing/release.pfx", new byte[5000]).Write("small.txt", "ok").Commit("blobs");

        using var snapshot = source.Open(new SnapshotRequest(repo.Path));

        var error = Assert.Throws<FileTooLargeException>(() => snapshot.Files.ReadBytes("signing/release.pfx", 4096));
        Assert.Equal(5000, error.Size);
        Assert.Equal(4096, error.Limit);
        Assert.Equal("signing/release.pfx", error.Path);
        Assert.Equal(5000, snapshot.Files.ReadBytes("signing/release.pfx", 5000)!.Length);
        Assert.Equal("ok", snapshot.Files.ReadText("small.txt", 2));
    }

    [Fact]
    public void SubfolderAndBarePaths_FindTheRepository()
    {
        using var repo = TestRepository.Create();
        var sha = repo.Write("src/Bramble.Sketches/Sketch.cs", "class S {}").Commit("one");
        using var bare = repo.CloneBare();

        using var fromSubfolder = source.Open(new SnapshotRequest(Path.Combine(repo.Path, "src", "Bramble.Sketches")));
        using var fromGitDir = source.Open(new SnapshotRequest(repo.GitDirectory));
        using var fromBare = source.Open(new SnapshotRequest(bare.Path));

        Assert.Equal(sha, fromSubfolder.Commit);
        Assert.Equal(repo.Path, fromSubfolder.Repository);
        Assert.Equal(sha, fromGitDir.Commit);
        Assert.Equal(sha, fromBare.Commit);
        Assert.Equal(bare.Path, fromBare.Repository);
        Assert.Equal("class S {}", fromBare.Files.ReadText("src/Bramble.Sketches/Sketch.cs"));
    }

    [Fact]
    public void Submodule_IsNotListedAsAFile()
    {
        using var library = TestRepository.Create();
        library.Write("lib.txt", "lib").Commit("lib");
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");
        repo.Git("-c", "protocol.file.allow=always", "submodule", "add", "-q", library.Path, "external/lib");
        var sha = repo.Commit("add submodule");

        using var snapshot = source.Open(new SnapshotRequest(repo.Path));

        // git ls-tree shows the submodule as a "commit" entry (a gitlink); it is not a blob of this repository.
        Assert.Contains("160000 commit", repo.Git("ls-tree", sha, "external/lib"), StringComparison.Ordinal);
        Assert.Equal([".gitmodules", "a.txt"], snapshot.Files.Paths);
    }

    [Fact]
    public void Dispose_ThenRead_Throws()
    {
        using var repo = TestRepository.Create();
        repo.Write("a.txt", "a").Commit("one");

        var snapshot = source.Open(new SnapshotRequest(repo.Path));
        snapshot.Dispose();

        Assert.Throws<ObjectDisposedException>(() => snapshot.Files.ReadBytes("a.txt"));
    }

    internal static byte[] GitBytes(TestRepository repo, params string[] args)
    {
        var start = new System.Diagnostics.ProcessStartInfo("git") { WorkingDirectory = repo.Path, RedirectStandardOutput = true, UseShellExecute = false };
        foreach (var arg in args)
        {
            start.ArgumentList.Add(arg);
        }

        using var process = System.Diagnostics.Process.Start(start)!;
        using var buffer = new MemoryStream();
        process.StandardOutput.BaseStream.CopyTo(buffer);
        process.WaitForExit();
        Assert.Equal(0, process.ExitCode);
        return buffer.ToArray();
    }
}
