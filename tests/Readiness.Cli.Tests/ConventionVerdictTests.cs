using System.Text.Json;
using Readiness.Testing;

namespace Readiness.Cli.Tests;

/// <summary>
/// Verdicts on repositories laid out the way real libraries are (tags without a 'v', test and sample projects beside
/// the library, versions derived from tags): each rule in a real git repository, verdict and reason asserted.
/// </summary>
public sealed class ConventionVerdictTests
{
    [Fact]
    public async Task NoProjectTheToolCanRead_IsNeverReady_ButCouldNotInspect()
    {
        using var repo = TestRepository.Create();
        repo.Write("README.md", "# Lanternfly\n")
            .Write("Lanternfly.sln", "Microsoft Visual Studio Solution File, Format Version 12.00\n")
            .Write("build.cake", "Task(\"Default\");\n")
            .Commit("Import");
        repo.AnnotatedTag("v0.3.0", "Lanternfly 0.3.0\n");

        var (exit, output, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");

        // design/cli.md exit codes: 3 = the repository could not be inspected; never 0 without a project to judge.
        Assert.True(exit == 3, output + error);
        Assert.Contains("Lanternfly.sln", error, StringComparison.Ordinal);
        Assert.Contains("build.cake", error, StringComparison.Ordinal);
        Assert.Contains("projects-required: false", error, StringComparison.Ordinal);
    }

    [Fact]
    public async Task NoProject_IsJudgedWhenTheConfigurationAllowsIt()
    {
        using var repo = TestRepository.Create();
        repo.Write("README.md", "# Lanternfly\n")
            .Write("LICENSE", SampleLibrary.MitLicense)
            .Write(".readiness.yml", "projects-required: false\n")
            .Write("CHANGELOG.md", SampleLibrary.Changelog(("0.3.0", "2026-11-02")))
            .Commit("Import");
        repo.AnnotatedTag("v0.3.0", "Lanternfly 0.3.0\n");

        var (exit, output, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");

        Assert.True(exit is 0 or 1, output + error);
        Assert.Contains(Notes(output), n => n.Contains("No .NET project was read", StringComparison.Ordinal));
    }

    [Fact]
    public async Task VersionOption_BeforeTagging_FailsAForgottenBump()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.Write("CHANGELOG.md", SampleLibrary.Changelog(("1.3.0", "2026-11-30"), ("1.2.0", "2026-11-20"))).Commit("Notes for 1.3.0");

        var (exit, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--version", "1.3.0", "--offline", "--format", "json");

        // The package carries the version the files declare (NuGet pack: PackageVersion from Version), so a
        // release announced as 1.3.0 while the files still say 1.2.0 would publish 1.2.0 again.
        Assert.Equal(1, exit);
        var result = Result(output, "version.matches-tag");
        Assert.Equal("fail", result.GetProperty("status").GetString());
        Assert.Contains("--version says 1.3.0, but Version is 1.2.0", result.GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task VersionOption_MatchingTheFiles_Passes()
    {
        using var repo = SampleLibrary.ReadyRelease("1.2.0");
        repo.WriteLibrary("1.3.0", "2026-11-30").Commit("Prepare 1.3.0");

        var (_, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--version", "1.3.0", "--offline", "--format", "json");

        Assert.Equal("pass", Result(output, "version.matches-tag").GetProperty("status").GetString());
    }

    [Fact]
    public async Task TagsWithoutV_AndBuildNumberTags_TheReportNamesTheInferredPattern()
    {
        using var repo = TestRepository.Create();
        repo.WriteLibrary("1.1.0", "2026-11-02").Commit("Release 1.1.0");
        repo.AnnotatedTag("1.1.0", "1.1.0\n");
        repo.Tag("4711"); // a CI build number, not a release
        repo.Write("Directory.Build.props", SampleLibrary.DirectoryBuildProps("1.2.0"))
            .Write("CHANGELOG.md", SampleLibrary.Changelog(("1.2.0", "2026-11-20"), ("1.1.0", "2026-11-02")))
            .Commit("Release 1.2.0", new DateTimeOffset(2026, 11, 20, 10, 0, 0, TimeSpan.Zero));
        repo.AnnotatedTag("1.2.0", "1.2.0\n", new DateTimeOffset(2026, 11, 20, 10, 0, 0, TimeSpan.Zero));
        repo.Tag("v1.2.0"); // a second name for the same release commit

        var (_, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--ref", "1.2.0", "--offline", "--format", "json");

        // SemVer 2.0.0 §2: a version is MAJOR.MINOR.PATCH; a bare build number (4711) is not a release, so it is no
        // "earlier release" above 1.2.0, and a tag on the release commit itself is not earlier than the release.
        Assert.Equal("pass", Result(output, "version.matches-tag").GetProperty("status").GetString());
        var forward = Result(output, "version.moves-forward");
        Assert.Equal("pass", forward.GetProperty("status").GetString());
        Assert.Contains("1.1.0", forward.GetProperty("message").GetString(), StringComparison.Ordinal);
        Assert.Contains(Notes(output), n => n.StartsWith("Release tags: tag pattern {version}: inferred from", StringComparison.Ordinal));
    }

    [Fact]
    public async Task ConfiguredTagPattern_IsHonoured_AndNamedAsConfigured()
    {
        using var repo = TestRepository.Create();
        repo.WriteLibrary("1.2.0", "2026-11-02").Write(".readiness.yml", "tag-pattern: \"release-{version}\"\n").Commit("Release 1.2.0");
        repo.AnnotatedTag("1.2.0", "1.2.0\n");

        var (_, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--ref", "1.2.0", "--offline", "--format", "json");

        Assert.Equal("skip", Result(output, "version.matches-tag").GetProperty("status").GetString());
        Assert.Contains(Notes(output), n => n.Contains("release-{version}: from tag-pattern", StringComparison.Ordinal));
    }

    private const string BareProject = """
        <Project Sdk="Microsoft.NET.Sdk">
          <PropertyGroup>
            <TargetFramework>net10.0</TargetFramework>
          </PropertyGroup>
        </Project>

        """;

    [Fact]
    public async Task SamplesBenchmarksAndExecutables_AreNotPackages_AndTheReportSaysWhy()
    {
        using var repo = TestRepository.Create();
        repo.WriteLibrary("1.2.0", "2026-11-02")
            .Write("Directory.Build.props", SampleLibrary.DirectoryBuildProps("1.2.0").Replace("<PackageLicenseExpression>MIT</PackageLicenseExpression>", string.Empty, StringComparison.Ordinal))
            .Write("src/Bramble.Sketches/Bramble.Sketches.csproj", SampleLibrary.Project.Replace("<Description>", "<PackageLicenseExpression>MIT</PackageLicenseExpression><Description>", StringComparison.Ordinal))
            .Write("samples/Bramble.Sketches.Tour/Bramble.Sketches.Tour.csproj", BareProject)
            .Write("benchmarks/Bramble.Sketches.Bench/Bramble.Sketches.Bench.csproj", BareProject)
            .Write("src/Bramble.Sketches.Cli/Bramble.Sketches.Cli.csproj", BareProject.Replace("</TargetFramework>", "</TargetFramework><OutputType>Exe</OutputType>", StringComparison.Ordinal))
            .Commit("Release 1.2.0");
        repo.AnnotatedTag("v1.2.0", "1.2.0\n");

        var (exit, output, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");

        // NuGet pack packs every project not marked IsPackable=false; which of them a release publishes is common
        // practice (no published source): samples, benchmarks and programs without PackAsTool are not published.
        Assert.True(exit == 0, output + error);
        Assert.Equal("pass", Result(output, "license.declared").GetProperty("status").GetString());
        var notes = Notes(output);
        Assert.Contains(notes, n => n.StartsWith("Packages: src/Bramble.Sketches/Bramble.Sketches.csproj (packable by default", StringComparison.Ordinal));
        var others = notes.Single(n => n.StartsWith("Not packages:", StringComparison.Ordinal));
        Assert.Contains("samples/Bramble.Sketches.Tour/Bramble.Sketches.Tour.csproj (in a 'samples' folder", others, StringComparison.Ordinal);
        Assert.Contains("benchmarks/Bramble.Sketches.Bench/Bramble.Sketches.Bench.csproj (in a 'benchmarks' folder", others, StringComparison.Ordinal);
        Assert.Contains("src/Bramble.Sketches.Cli/Bramble.Sketches.Cli.csproj (an executable (OutputType=Exe) without PackAsTool)", others, StringComparison.Ordinal);
    }

    [Fact]
    public async Task PackCommandInCi_DecidesWhichProjectsAreReleased()
    {
        using var repo = TestRepository.Create();
        repo.WriteLibrary("1.2.0", "2026-11-02")
            .Write("src/Bramble.Sketches.Scratch/Bramble.Sketches.Scratch.csproj", BareProject.Replace("</TargetFramework>", "</TargetFramework><Version>0.1.0</Version>", StringComparison.Ordinal))
            .Write(".github/workflows/release.yml", SampleLibrary.Workflow + "      - run: dotnet pack src/Bramble.Sketches/Bramble.Sketches.csproj -c Release\n")
            .Commit("Release 1.2.0");
        repo.AnnotatedTag("v1.2.0", "1.2.0\n");

        var (_, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");

        // dotnet pack with a project argument packs that project only (dotnet pack documentation).
        Assert.Equal("pass", Result(output, "version.matches-tag").GetProperty("status").GetString());
        Assert.Contains(Notes(output), n => n.Contains("Bramble.Sketches.csproj (packed by the command at .github/workflows/release.yml:12)", StringComparison.Ordinal));
        Assert.Contains(Notes(output), n => n.Contains("Bramble.Sketches.Scratch.csproj (not named by the pack commands", StringComparison.Ordinal));
    }

    [Fact]
    public async Task PackagesListInConfiguration_ComesFirst()
    {
        using var repo = TestRepository.Create();
        repo.WriteLibrary("1.2.0", "2026-11-02")
            .Write("src/Bramble.Sketches.Scratch/Bramble.Sketches.Scratch.csproj", BareProject.Replace("</TargetFramework>", "</TargetFramework><Version>0.1.0</Version>", StringComparison.Ordinal))
            .Write(".readiness.yml", "packages: [Bramble.Sketches]\n")
            .Commit("Release 1.2.0");
        repo.AnnotatedTag("v1.2.0", "1.2.0\n");

        var (exit, output, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");

        Assert.True(exit == 0, output + error);
        Assert.Contains(Notes(output), n => n.Contains("Bramble.Sketches.Scratch.csproj (not listed in packages:", StringComparison.Ordinal));
    }

    [Fact]
    public async Task AnalyzerReferenceWithoutOutputAssembly_IsNoDependency()
    {
        using var repo = TestRepository.Create();
        repo.WriteLibrary("1.2.0", "2026-11-02")
            .Write("src/Bramble.Sketches.Analyzers/Bramble.Sketches.Analyzers.csproj", BareProject.Replace("net10.0", "netstandard2.0", StringComparison.Ordinal).Replace("</TargetFramework>", "</TargetFramework><IsPackable>false</IsPackable>", StringComparison.Ordinal))
            .Write("src/Bramble.Sketches/Bramble.Sketches.csproj", SampleLibrary.Project.Replace("</Project>", """
                  <ItemGroup>
                    <ProjectReference Include="..\Bramble.Sketches.Analyzers\Bramble.Sketches.Analyzers.csproj" OutputItemType="Analyzer" ReferenceOutputAssembly="false" />
                  </ItemGroup>
                </Project>
                """, StringComparison.Ordinal))
            .Commit("Release 1.2.0");
        repo.AnnotatedTag("v1.2.0", "1.2.0\n");

        var (_, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");

        // NuGet pack writes no dependency for a ProjectReference with ReferenceOutputAssembly=false (NuGet/Home#10312).
        var result = Result(output, "deps.packable-references");
        Assert.Equal("pass", result.GetProperty("status").GetString());
        Assert.Contains("ReferenceOutputAssembly=false", result.GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task VersionPassedByCi_IsJudgedAsTheTagsVersion_NotTheSdkDefault()
    {
        using var repo = TestRepository.Create();
        repo.WriteLibrary("1.2.0", "2026-11-02")
            .Write("Directory.Build.props", SampleLibrary.DirectoryBuildProps("1.2.0").Replace("<Version>1.2.0</Version>", string.Empty, StringComparison.Ordinal))
            .Write(".github/workflows/release.yml", SampleLibrary.Workflow + "      - run: dotnet pack src/Bramble.Sketches -p:PackageVersion=${{ github.ref_name }}\n")
            .Commit("Release 1.2.0");
        repo.AnnotatedTag("1.2.0", "1.2.0\n");

        var (exit, output, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");

        // NuGet pack: -p:PackageVersion on the command line overrides the project's (absent) version, so the
        // package is the tag's 1.2.0, not the SDK default 1.0.0.
        Assert.True(exit == 0, output + error);
        Assert.Contains("passed to the build at .github/workflows/release.yml:12", Result(output, "version.matches-tag").GetProperty("message").GetString(), StringComparison.Ordinal);
        Assert.Equal("pass", Result(output, "version.well-formed", "Bramble.Sketches").GetProperty("status").GetString());
    }

    [Fact]
    public async Task PlainTextChangelogInDocs_WithSpelledOutDates_HasTheEntry()
    {
        using var repo = TestRepository.Create();
        repo.WriteLibrary("1.2.0", "2026-11-02")
            .Delete("CHANGELOG.md")
            .Write("docs/History.txt", "Version 1.2.0 - 2 Nov 2026\nMerge of sketches (#12)\n\n1.1.0 (2026-10-01)\nFirst sketches\n")
            .Commit("Release 1.2.0");
        repo.AnnotatedTag("v1.2.0", "1.2.0\n");

        var (exit, output, error) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");

        // Keep a Changelog 1.1.0 asks for a dated section per version; the plain-text form carries the same facts.
        Assert.True(exit == 0, output + error);
        Assert.Contains("docs/History.txt:1", Result(output, "changelog.has-entry").GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task NotesInForgeReleases_SkipWithThatReasonOffline()
    {
        using var repo = TestRepository.Create();
        repo.WriteLibrary("1.2.0", "2026-11-02").Delete("CHANGELOG.md").Write(".readiness.yml", "changelog: forge-releases\n").Commit("Release 1.2.0");
        repo.AnnotatedTag("v1.2.0", "1.2.0\n");

        var (_, output, _) = await CliHarness.RunAsync(repo.Path, "check", "--offline", "--format", "json");

        var present = Result(output, "changelog.present");
        Assert.Equal("skip", present.GetProperty("status").GetString());
        Assert.Contains("forge's releases", present.GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    internal static IReadOnlyList<string> Notes(string json)
    {
        using var document = JsonDocument.Parse(json);
        return document.RootElement.GetProperty("notes").EnumerateArray().Select(n => n.GetString()!).ToList();
    }

    internal static JsonElement Result(string json, string check, string? package = null)
    {
        using var document = JsonDocument.Parse(json);
        return document.RootElement.GetProperty("results").EnumerateArray()
            .Single(r => r.GetProperty("check").GetString() == check
                && (package is null || (r.TryGetProperty("package", out var p) && p.GetString() == package)))
            .Clone();
    }
}
