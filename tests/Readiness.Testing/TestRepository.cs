using System.Text;

namespace Readiness.Testing;

/// <summary>
/// A real git repository in a temporary folder, built with the <c>git</c> command line and deleted on dispose.
/// Identity, dates and signing are set per invocation, so the machine's git configuration never matters.
/// </summary>
/// <example>
/// <code>
/// using var repo = TestRepository.Create();
/// var first = repo.Write("src/Bramble.Sketches/Bramble.Sketches.csproj", xml).Commit("Initial import");
/// repo.AnnotatedTag("v2.4.0", "Release 2.4.0");
/// </code>
/// </example>
public sealed class TestRepository : IDisposable
{
    /// <summary>The date given to the first commit or tag when the caller names none; later ones follow a minute apart.</summary>
    public static readonly DateTimeOffset DefaultStartDate = new(2026, 11, 2, 9, 0, 0, TimeSpan.Zero);

    private readonly TempDirectory folder;
    private int clock;

    private TestRepository(TempDirectory folder, string path, bool bare)
    {
        this.folder = folder;
        Path = path;
        IsBare = bare;
    }

    /// <summary>The working directory, or the git directory of a bare repository.</summary>
    public string Path { get; }

    public bool IsBare { get; }

    /// <summary>The git directory (<c>.git</c> inside <see cref="Path"/>, or <see cref="Path"/> itself when bare).</summary>
    public string GitDirectory => IsBare ? Path : System.IO.Path.Combine(Path, ".git");

    /// <summary>The sha of HEAD.</summary>
    public string Head => Sha("HEAD");

    /// <summary>A new repository with a working tree and an unborn <c>main</c> branch.</summary>
    public static TestRepository Create()
    {
        var folder = new TempDirectory("readiness-repo-");
        var path = folder.Combine("work");
        GitCli.Run(folder.Path, ["init", "-q", "-b", "main", path]);
        return new TestRepository(folder, path, bare: false);
    }

    /// <summary>A new, empty bare repository (a push target, or a mirror as a service would hold).</summary>
    public static TestRepository Bare()
    {
        var folder = new TempDirectory("readiness-bare-");
        var path = folder.Combine("repo.git");
        GitCli.Run(folder.Path, ["init", "-q", "--bare", "-b", "main", path]);
        return new TestRepository(folder, path, bare: true);
    }

    /// <summary>Writes a UTF-8 text file (no BOM), creating folders as needed. Not staged until <see cref="Commit"/>.</summary>
    public TestRepository Write(string path, string text) => Write(path, Encoding.UTF8.GetBytes(text));

    public TestRepository Write(string path, byte[] bytes)
    {
        var full = FullPath(path);
        Directory.CreateDirectory(System.IO.Path.GetDirectoryName(full)!);
        File.WriteAllBytes(full, bytes);
        return this;
    }

    /// <summary>Creates a symbolic link at <paramref name="path"/> pointing at <paramref name="target"/> (as given).</summary>
    public TestRepository Symlink(string path, string target)
    {
        var full = FullPath(path);
        Directory.CreateDirectory(System.IO.Path.GetDirectoryName(full)!);
        File.CreateSymbolicLink(full, target);
        return this;
    }

    public TestRepository Delete(string path)
    {
        var full = FullPath(path);
        if (Directory.Exists(full))
        {
            Directory.Delete(full, recursive: true);
        }
        else
        {
            File.Delete(full);
        }

        return this;
    }

    /// <summary>Reads a file of the working tree.</summary>
    public string Read(string path) => File.ReadAllText(FullPath(path));

    /// <summary>Stages everything (<c>git add -A</c>) and commits; returns the new commit's sha.</summary>
    public string Commit(string message, DateTimeOffset? date = null) => CommitCore(message, date, signingKey: null);

    /// <summary>Stages everything and commits with an SSH signature made by the private key at <paramref name="sshKeyPath"/>.</summary>
    public string SignedCommit(string message, string sshKeyPath, DateTimeOffset? date = null)
    {
        ArgumentNullException.ThrowIfNull(sshKeyPath);
        return CommitCore(message, date, sshKeyPath);
    }

    /// <summary>A lightweight tag at <paramref name="target"/> (HEAD by default).</summary>
    public TestRepository Tag(string name, string target = "HEAD")
    {
        Git("tag", name, target);
        return this;
    }

    /// <summary>An annotated, unsigned tag; its tagger date is <paramref name="date"/> (or the builder's next date).</summary>
    public TestRepository AnnotatedTag(string name, string message, DateTimeOffset? date = null, string target = "HEAD")
    {
        GitAt(NextDate(date), "tag", "-a", name, "-m", message, target);
        return this;
    }

    /// <summary>An annotated tag signed with SSH (<c>gpg.format=ssh</c>) by the private key at <paramref name="sshKeyPath"/>.</summary>
    public TestRepository SignedTag(string name, string message, string sshKeyPath, DateTimeOffset? date = null, string target = "HEAD")
    {
        ArgumentNullException.ThrowIfNull(sshKeyPath);
        GitAt(
            NextDate(date),
            "-c", "gpg.format=ssh", "-c", $"user.signingkey={sshKeyPath}",
            "tag", "-s", name, "-m", message, target);
        return this;
    }

    /// <summary>Creates a branch at HEAD (or <paramref name="startPoint"/>) without switching to it.</summary>
    public TestRepository Branch(string name, string startPoint = "HEAD")
    {
        Git("branch", name, startPoint);
        return this;
    }

    /// <summary>Switches the working tree to a branch, tag or commit.</summary>
    public TestRepository Checkout(string name)
    {
        Git("checkout", "-q", name);
        return this;
    }

    /// <summary>The full sha of a revision (<c>git rev-parse --verify REV^{object}</c>).</summary>
    public string Sha(string revision) => Git("rev-parse", "--verify", "-q", revision).Trim();

    /// <summary>Runs git in the repository; returns stdout, throws with stderr on a non-zero exit.</summary>
    public string Git(params string[] args) => GitCli.Run(Path, args);

    /// <summary>Runs git in the repository; returns the exit code and both outputs, never throws for a non-zero exit.</summary>
    public GitResult TryGit(params string[] args) => GitCli.TryRun(Path, args);

    /// <summary>Runs git with <paramref name="stdin"/> as its input (e.g. <c>git mktag</c>).</summary>
    public string GitWithInput(string stdin, params string[] args) => GitCli.Run(Path, args, stdin: stdin);

    /// <summary>A bare clone of this repository with all branches and tags (<c>git clone --bare</c>), in its own temp folder.</summary>
    public TestRepository CloneBare() => CloneInto(bare: true, ["--bare"]);

    /// <summary>A bare clone at <paramref name="path"/>; the caller owns that folder.</summary>
    public void CloneBare(string path) => GitCli.Run(System.IO.Path.GetTempPath(), ["clone", "-q", "--bare", Path, path]);

    /// <summary>
    /// A clone through the <c>file://</c> transport (so <c>--depth</c> and <c>--filter</c> take effect), with extra options
    /// such as <c>--depth 1</c> or <c>--filter=blob:none</c>.
    /// </summary>
    public TestRepository Clone(params string[] options) => CloneInto(bare: false, options);

    public void Dispose() => folder.Dispose();

    private TestRepository CloneInto(bool bare, string[] options)
    {
        var target = new TempDirectory("readiness-clone-");
        try
        {
            var path = target.Combine(bare ? "clone.git" : "clone");
            var source = new Uri(Path.EndsWith(System.IO.Path.DirectorySeparatorChar) ? Path : Path + System.IO.Path.DirectorySeparatorChar).AbsoluteUri;
            if (options.Any(o => o.StartsWith("--filter", StringComparison.Ordinal)))
            {
                // The serving side must allow filters; git drops -c settings when it starts the local upload-pack,
                // so the setting goes into this repository's own configuration.
                Git("config", "uploadpack.allowFilter", "true");
            }

            GitCli.Run(target.Path, ["clone", "-q", .. options, source, path]);
            return new TestRepository(target, path, bare);
        }
        catch
        {
            target.Dispose();
            throw;
        }
    }

    private string CommitCore(string message, DateTimeOffset? date, string? signingKey)
    {
        EnsureWorkTree();
        Git("add", "-A");
        string[] signing = signingKey is null ? [] : ["-c", "gpg.format=ssh", "-c", $"user.signingkey={signingKey}"];
        GitAt(NextDate(date), [.. signing, "commit", "-q", "--allow-empty", "--no-verify", signingKey is null ? "--no-gpg-sign" : "-S", "-m", message]);
        return Head;
    }

    private string GitAt(DateTimeOffset date, params string[] args)
    {
        var when = GitCli.FormatDate(date);
        return GitCli.Run(Path, args, new Dictionary<string, string> { ["GIT_AUTHOR_DATE"] = when, ["GIT_COMMITTER_DATE"] = when });
    }

    private DateTimeOffset NextDate(DateTimeOffset? date)
    {
        clock++;
        return date ?? DefaultStartDate.AddMinutes(clock);
    }

    private string FullPath(string path)
    {
        EnsureWorkTree();
        ArgumentNullException.ThrowIfNull(path);
        return System.IO.Path.Combine(Path, path.Replace('/', System.IO.Path.DirectorySeparatorChar));
    }

    private void EnsureWorkTree()
    {
        if (IsBare)
        {
            throw new InvalidOperationException("A bare repository has no working tree; write to a clone and push.");
        }
    }
}
