using System.Diagnostics;
using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Testing;

namespace Readiness.Cli.Tests;

/// <summary>
/// The shell filter in <c>hooks/pre-push</c>, run by <c>/bin/sh</c> with git's documented input, against the engine's own
/// reading of the same <c>.readiness.yml</c>: whatever the engine treats as a release ref, the shell must pass on.
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class HookScriptTests : IDisposable
{
    private const string Zero = "0000000000000000000000000000000000000000";
    private const string Oid = "3f786850e387550fdab836ed7e6dc881de23001b";

    private static readonly string Hook = Path.Combine(AppContext.BaseDirectory, "hooks", "pre-push");

    private readonly TempDirectory folder = new();

    /// <summary>dash is /bin/sh on Debian-like systems; bash is what git for Windows and older macOS run as sh.</summary>
    private static readonly string[] Shells = ["/bin/sh", "/bin/bash"];

    public static TheoryData<string, string, string, bool> Cases
    {
        get
        {
            var data = new TheoryData<string, string, string, bool>();
            foreach (var shell in Shells.Where(File.Exists))
            {
                foreach (var (config, pushedRef, expected) in Table)
                {
                    data.Add(shell, config, pushedRef, expected);
                }
            }

            return data;
        }
    }

    private static (string Config, string Ref, bool Expected)[] Table =>
    [
        // config, ref pushed, expected by the shell (true = hand over to readiness), with the reason in the ref name.
        (string.Empty, "refs/tags/v1.2.0", true),
        (string.Empty, "refs/tags/release-1.2.0", false),
        (string.Empty, "refs/heads/release/1.2", false),
        ("tag-pattern: \"rel-{version}\"   # quoted, with a comment\n", "refs/tags/rel-2.0.0", true),
        ("tag-pattern: \"rel-{version}\"   # quoted, with a comment\n", "refs/tags/v2.0.0", false),
        ("tag-pattern: '{id}/v{version}'\n", "refs/tags/Bramble.Sketches/v2.4.0", true),
        ("tag-pattern: \"{id}@{version}\"\r\nchecklist: host-plugin\r\n", "refs/tags/Bramble.Sketches@2.4.0", true),
        ("release-branches: [release/*, 'maint-*']\n", "refs/heads/maint-2.3", true),
        ("release-branches: [release/*, 'maint-*']\n", "refs/heads/main", false),
        ("release-branches:\n  # the supported lines\n  - release/*\n  - \"hotfix/*\"   # urgent fixes\n\nchecklist: strict\n", "refs/heads/hotfix/2.3.2", true),
        ("release-branches:\n- release/*\nchecklist: strict\n", "refs/heads/release/2.4", true),
        ("release-branches:\n- release/*\nchecklist: strict\n", "refs/heads/feature/release/2.4", false),
        ("checklist: strict\nrelease-branches: []\n", "refs/heads/release/2.4", false),
    ];

    [Theory]
    [MemberData(nameof(Cases))]
    public void ShellDecision_AgreesWithTheEngine(string shell, string config, string pushedRef, bool expected)
    {
        var (exit, trace, error) = RunHook(config, $"{pushedRef} {Oid} {pushedRef} {Zero}\n", shell: shell);
        var handedOver = trace.Contains("decision: run", StringComparison.Ordinal);
        Assert.Equal(expected, handedOver);
        Assert.Equal(expected ? 1 : 0, exit); // on a release ref the hook looks for readiness, which PATH does not have here
        if (!expected)
        {
            Assert.Equal(string.Empty, error);
        }

        // The engine's reading of the same file (RepositoryConfigParser, TagPattern, NameGlob) must not see a release
        // ref the shell let pass silently.
        var parsed = config.Length == 0 ? RepositoryConfig.Empty : new RepositoryConfigParser(new ChecklistParser(CheckIds.All)).Parse(RepositoryConfig.FileName, config);
        var engine = pushedRef.StartsWith("refs/tags/", StringComparison.Ordinal)
            ? new TagPattern(parsed.TagPattern).Match(pushedRef["refs/tags/".Length..]) is not null
            : NameGlob.MatchesAny(parsed.GetList("release-branches"), pushedRef["refs/heads/".Length..]);
        Assert.Equal(expected, engine);
    }

    [Fact]
    public void OrdinaryBranchPush_UsesShellBuiltinsOnly_NoOtherProgramIsStarted()
    {
        // PATH points at an empty folder: a call to cat, sed, git or readiness would fail with "not found".
        var config = "tag-pattern: 'v{version}'\nrelease-branches:\n  - release/*\n";
        var input = $"refs/heads/main {Oid} refs/heads/main {Zero}\nrefs/heads/feature/quantiles {Oid} refs/heads/feature/quantiles {Oid}\n(delete) {Zero} refs/tags/v0.9.0 {Oid}\n";
        var (exit, trace, error) = RunHook(config, input);
        Assert.Equal(0, exit);
        Assert.Equal(string.Empty, error);
        Assert.Equal(["skip branch main", "skip branch feature/quantiles", "skip delete refs/tags/v0.9.0", "decision: ordinary push, .NET not started"], trace.TrimEnd('\n').Split('\n'));
    }

    [Fact]
    public void LastLineWithoutLineFeed_IsStillRead()
    {
        // git ends every line with LF (githooks(5)); a caller that does not must not slip a release tag through.
        var (_, trace, _) = RunHook(string.Empty, $"refs/heads/main {Oid} refs/heads/main {Zero}\nrefs/tags/v1.0.0 {Oid} refs/tags/v1.0.0 {Zero}");
        Assert.Contains("release tag v1.0.0", trace, StringComparison.Ordinal);
    }

    [Fact]
    public void RunawayConfiguration_IsReadOnlyUpToItsBound()
    {
        // 200,000 lines: the shell stops after 2,000, so a pattern further down is not seen (the engine, which reads
        // the file itself, reports a file that large); a push is not held up by reading it all.
        var config = "checklist: strict\n" + string.Concat(Enumerable.Repeat("# filler\n", 200_000)) + "tag-pattern: 'late-{version}'\n";
        var (exit, trace, error) = RunHook(config, $"refs/heads/main {Oid} refs/heads/main {Zero}\nrefs/tags/v1.0.0 {Oid} refs/tags/v1.0.0 {Zero}\n");
        Assert.Equal(1, exit); // v1.0.0 matches the default pattern v*; readiness is not on this PATH
        Assert.Contains("release tag v1.0.0", trace, StringComparison.Ordinal);
        Assert.Contains("cannot find the readiness command", error, StringComparison.Ordinal);
    }

    [Fact]
    public void LongLines_AreSkipped_AndBlanksAroundShortValuesTrimmed()
    {
        // A 100 KB run of spaces after a value: the line is skipped (and reading stops at 64 KiB) (the trim is one expansion, not a loop per
        // character); a value with blanks around it on a short line is still read. YAML 1.2 §7.3.3: plain scalars
        // carry no surrounding white space.
        var config = "release-branches:   main   \ntag-pattern: 'nope-*'" + new string(' ', 100_000) + "\n";
        var (exit, trace, _) = RunHook(config, $"refs/heads/main {Oid} refs/heads/main {Zero}\nrefs/tags/v1.0.0 {Oid} refs/tags/v1.0.0 {Zero}\n");
        Assert.Equal(1, exit); // a release: readiness is not on this PATH
        Assert.Contains("release branch main", trace, StringComparison.Ordinal);
        Assert.Contains("release tag v1.0.0", trace, StringComparison.Ordinal); // the default v*, the long line unread
    }

    [Fact]
    public void ChainedHook_GetsGitsLinesUnchanged_AndItsFailureBlocks()
    {
        // githooks(5), pre-push: one line per ref, "<local ref> SP <local oid> SP <remote ref> SP <remote oid> LF".
        var input = $"refs/heads/main {Oid} refs/heads/main {Zero}\n(delete) {Zero} refs/tags/v0.9.0 {Oid}\n";
        var copy = folder.Combine("chained-input");
        var hooks = folder.Combine("hooks");
        Directory.CreateDirectory(hooks);
        File.Copy(Hook, Path.Combine(hooks, "pre-push"));
        var chained = Path.Combine(hooks, "pre-push.readiness-chained");
        File.WriteAllText(chained, $"#!/bin/sh\n/bin/cat > '{copy}'\necho \"$1 $2\" >> '{copy}'\nexit 3\n");
        File.SetUnixFileMode(chained, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);

        var (exit, trace, _) = RunHook(string.Empty, input, Path.Combine(hooks, "pre-push"));
        Assert.Equal(3, exit);
        Assert.Equal(input + "origin file:///remote.git\n", File.ReadAllText(copy));
        Assert.Contains("skip delete refs/tags/v0.9.0", trace, StringComparison.Ordinal);
    }

    private (int Exit, string Trace, string Error) RunHook(string config, string input, string? hook = null, string shell = "/bin/sh")
    {
        var work = folder.Combine("work-" + Guid.NewGuid().ToString("N")[..8]);
        var emptyPath = Path.Combine(work, "empty-path");
        Directory.CreateDirectory(emptyPath);
        if (config.Length > 0)
        {
            File.WriteAllText(Path.Combine(work, ".readiness.yml"), config);
        }

        var trace = Path.Combine(work, "trace.log");
        var info = new ProcessStartInfo(shell) { WorkingDirectory = work, RedirectStandardInput = true, RedirectStandardError = true, RedirectStandardOutput = true };
        info.ArgumentList.Add(hook ?? Hook);
        info.ArgumentList.Add("origin");
        info.ArgumentList.Add("file:///remote.git");
        info.Environment.Clear();
        info.Environment["PATH"] = emptyPath;
        info.Environment["READINESS_HOOK_TRACE"] = trace;
        using var process = Process.Start(info)!;
        process.StandardInput.Write(input);
        process.StandardInput.Close();
        var error = process.StandardError.ReadToEndAsync();
        process.StandardOutput.ReadToEnd();
        Assert.True(process.WaitForExit(30_000), "the hook did not finish within 30 s");
        return (process.ExitCode, File.Exists(trace) ? File.ReadAllText(trace) : string.Empty, error.Result);
    }

    public void Dispose() => folder.Dispose();
}
