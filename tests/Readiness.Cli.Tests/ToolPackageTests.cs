using System.IO.Compression;
using Readiness.Testing;

namespace Readiness.Cli.Tests;

/// <summary>
/// The tool as users get it: <c>dotnet pack</c> of the CLI, <c>dotnet tool install</c> from a local folder feed (no other
/// package source), then the installed command installs the hook and stops a release tag that is not ready.
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class ToolPackageTests : IDisposable
{
    private readonly TempDirectory scratch = new();

    [Fact]
    public void PackedTool_InstallsFromAFolderFeed_AndItsHookBlocksATagThatIsNotReady()
    {
        var root = RepositoryRoot.Path;
        var configuration = new DirectoryInfo(Path.TrimEndingDirectorySeparator(AppContext.BaseDirectory)).Parent!.Name; // bin/<Configuration>/net10.0/
        var feed = scratch.Combine("feed");
        Dotnet(root, "pack", Path.Combine(root, "src", "Readiness.Cli", "Readiness.Cli.csproj"), "-c", configuration, "--no-build", "-o", feed);

        var package = Assert.Single(Directory.GetFiles(feed, "Readiness.Cli.*.nupkg"), p => !p.EndsWith(".snupkg", StringComparison.Ordinal));
        using (var zip = ZipFile.OpenRead(package))
        {
            var names = zip.Entries.Select(e => e.FullName).ToList();

            // The layout the .NET SDK writes for a tool package and `dotnet tool install` reads: tools/<tfm>/any/ with
            // DotnetToolSettings.xml (from memory; the install below is the proof). The hook script and the checklists
            // travel beside the program, once each.
            Assert.Contains("tools/net10.0/any/DotnetToolSettings.xml", names);
            Assert.Contains("tools/net10.0/any/hooks/pre-push", names);
            Assert.Contains("tools/net10.0/any/checklists/library.yml", names);
            Assert.Equal(names.Count, names.Distinct(StringComparer.OrdinalIgnoreCase).Count());
            Assert.DoesNotContain(names, n => n.Contains("//", StringComparison.Ordinal));

            // A tool package declares no dependencies, although the CLI references projects that are not packable:
            // deps.packable-references relies on this (PackAsTool).
            using var nuspec = zip.GetEntry("Readiness.Cli.nuspec")!.Open();
            var document = System.Xml.Linq.XDocument.Load(nuspec);
            Assert.Contains(document.Descendants(), e => e.Name.LocalName == "packageType" && (string?)e.Attribute("name") == "DotnetTool");
            Assert.DoesNotContain(document.Descendants(), e => e.Name.LocalName == "dependency");
        }

        var version = Path.GetFileNameWithoutExtension(package)["Readiness.Cli.".Length..];
        var config = scratch.Combine("nuget.config");
        File.WriteAllText(config, $"<?xml version=\"1.0\" encoding=\"utf-8\"?>\n<configuration><packageSources><clear /><add key=\"local\" value=\"{feed}\" /></packageSources></configuration>\n");
        var tools = scratch.Combine("tools");
        Dotnet(scratch.Path, "tool", "install", "Readiness.Cli", "--version", version, "--tool-path", tools, "--configfile", config);
        var installed = Path.Combine(tools, "readiness");
        Assert.True(File.Exists(installed), "dotnet tool install left no readiness command in " + tools);

        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        using var remote = TestRepository.Bare();
        repo.Git("remote", "add", "origin", remote.Path);
        var (exit, output, error) = ProcessTests.RunProgram(installed, repo.Path, "hook", "install");
        Assert.True(exit == 0, output + error);
        Assert.Equal(
            File.ReadAllText(Path.Combine(root, "hooks", "pre-push")),
            File.ReadAllText(Path.Combine(repo.GitDirectory, "hooks", "pre-push")));
        Assert.Equal(installed, repo.Git("config", "--get", "readiness.command").Trim());

        // The version moves on but the changelog entry stays under Unreleased: changelog.has-entry blocks the tag.
        var when = new DateTimeOffset(2026, 11, 26, 9, 0, 0, TimeSpan.Zero);
        repo.Write("Directory.Build.props", SampleLibrary.DirectoryBuildProps("1.3.0"))
            .Write("CHANGELOG.md", "# Changelog\n\n## [Unreleased]\n\n### Added\n- More sketches.\n\n## [1.2.0] - 2026-11-20\n\n### Added\n- First.\n")
            .Commit("Prepare v1.3.0", when);
        repo.AnnotatedTag("v1.3.0", "v1.3.0\n", when);
        var env = new Dictionary<string, string> { ["READINESS_OFFLINE"] = "1", ["NO_COLOR"] = "1" };
        Assert.True(GitCli.TryRun(repo.Path, ["push", "origin", "main"], env).Succeeded);
        var push = GitCli.TryRun(repo.Path, ["push", "origin", "v1.3.0"], env);
        Assert.False(push.Succeeded);
        Assert.Contains("changelog.has-entry", push.StdErr, StringComparison.Ordinal);
        Assert.Equal(string.Empty, remote.Git("tag", "--list").Trim());
    }

    public void Dispose() => scratch.Dispose();

    private void Dotnet(string directory, params string[] args)
    {
        // A private package cache for the install: an earlier run's package of the same version must not be reused.
        var environment = args[0] == "tool" ? new Dictionary<string, string> { ["NUGET_PACKAGES"] = scratch.Combine("packages") } : null;
        var result = DotnetCli.Run(directory, args, environment);
        Assert.True(result.Succeeded, $"dotnet {string.Join(' ', args)} failed ({result.ExitCode}):\n{result.Log}");
    }
}
