using Readiness.Core.Projects;
using Readiness.Core.Projects.MsBuild;
using Readiness.Core.Versioning;
using Readiness.Testing;

namespace Readiness.Core.Tests.Projects;

/// <summary>
/// The static reader against MSBuild itself: each layout is written to a temporary folder, evaluated by
/// <c>dotnet msbuild -getProperty -getItem</c> and by <see cref="StaticProjectReader"/> over the same files.
/// </summary>
[Trait("Category", "MsBuildOracle")]
public sealed class StaticProjectReaderOracleTests
{
    /// <summary>Item metadata MSBuild adds to every item (well-known item metadata, learn.microsoft.com/visualstudio/msbuild/msbuild-well-known-item-metadata).</summary>
    private static readonly HashSet<string> WellKnownMetadata = new(StringComparer.OrdinalIgnoreCase)
    {
        "Identity", "FullPath", "RootDir", "Filename", "Extension", "RelativeDir", "Directory", "RecursiveDir",
        "ModifiedTime", "CreatedTime", "AccessedTime", "DefiningProjectFullPath", "DefiningProjectDirectory",
        "DefiningProjectName", "DefiningProjectExtension",
    };

    public static TheoryData<string> Layouts => new(OracleLayouts.All.Keys);

    [Theory]
    [MemberData(nameof(Layouts))]
    public void Layout_EvaluatesAsMsBuildDoes(string name)
    {
        var layout = OracleLayouts.All[name];
        using var folder = new TempDirectory("readiness-msbuild-");
        AssertNoBuildFilesAbove(folder.Path);
        var tree = FolderFileTree.Write(folder.Path, layout.Files);

        // reference: MSBuild's own evaluation, dotnet msbuild -getProperty / -getItem
        var expected = MsBuildOracle.Evaluate(folder.Combine(layout.Project), layout.TargetFramework, layout.Extra ?? []);

        var model = new StaticProjectReader().Read(tree);
        var project = model.Find(layout.Project);
        Assert.True(project is not null, $"{layout.Project} not read; problems: {string.Join("; ", model.Problems)}");
        var properties = layout.TargetFramework is { } tfm ? project.PerTarget[tfm] : project.Properties;
        var viewed = project with { Properties = properties };
        var context = $"{name}\nMSBuild said:\n{expected.Json}\nUnevaluated:\n{string.Join("\n", project.Unevaluated)}";

        // The .NET SDK's Version default (Microsoft.NET.DefaultAssemblyInfo.targets): $(VersionPrefix)[-$(VersionSuffix)], prefix 1.0.0.
        var prefix = viewed.Value("VersionPrefix") ?? "1.0.0";
        var version = viewed.Value("Version") ?? (viewed.Value("VersionSuffix") is { } suffix ? $"{prefix}-{suffix}" : prefix);
        Assert.True(expected.Property("Version") == version, $"Version: MSBuild {expected.Property("Version")}, reader {version}\n{context}");

        // What the version checks read: PackageVersion > Version > VersionPrefix-VersionSuffix, else the SDK's 1.0.0.
        var packageVersion = DeclaredVersion.Of(viewed).Value ?? "1.0.0";
        Assert.True(expected.Property("PackageVersion") == packageVersion, $"PackageVersion: MSBuild {expected.Property("PackageVersion")}, reader {packageVersion}\n{context}");

        var targetFramework = layout.TargetFramework ?? viewed.Value("TargetFramework") ?? string.Empty;
        Assert.True(expected.Property("TargetFramework") == targetFramework, $"TargetFramework\n{context}");
        foreach (var property in new[] { "TargetFrameworks", "PackageLicenseExpression" }.Concat(layout.Extra ?? []))
        {
            var mine = viewed.Property(property)?.Value ?? string.Empty;
            Assert.True(expected.Property(property) == mine, $"{property}: MSBuild '{expected.Property(property)}', reader '{mine}'\n{context}");
        }

        Assert.True(bool.Parse(expected.Property("IsPackable")) == viewed.IsPackable, $"IsPackable\n{context}");

        // Items are per inner build: compare them where MSBuild evaluates one target (or the project has one).
        var multi = layout.TargetFramework is null && project.TargetFrameworks.Count > 1 && viewed.Value("TargetFramework") is null;
        if (!multi)
        {
            ComparePackageReferences(expected, project, layout.TargetFramework, folder.Path, context);
            CompareCentralVersions(expected, project, context);
            CompareProjectReferences(expected, project, folder.Path, context);
            ComparePackItems(expected, project, folder.Path, context);
        }
    }

    [Fact]
    public void Unevaluable_MsBuildDecidesFromItsMachine_ReaderNamesWhatAndWhere()
    {
        const string project = "src/Bramble.Sketches/Bramble.Sketches.csproj";
        using var folder = new TempDirectory("readiness-msbuild-");
        AssertNoBuildFilesAbove(folder.Path);
        var tree = FolderFileTree.Write(folder.Path, new Dictionary<string, string>
        {
            [project] = """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                    <VersionPrefix>1.$([System.DateTime]::UtcNow.Year).0</VersionPrefix>
                    <VersionSuffix>ci.$(BUILD_NUMBER)</VersionSuffix>
                    <PackageLicenseExpression Condition="'$(Configuration)' == 'Debug'">MIT</PackageLicenseExpression>
                    <Authors Condition="$([System.IO.Directory]::Exists('$(MSBuildProjectDirectory)'))">Bramblecote Software</Authors>
                  </PropertyGroup>
                </Project>
                """,
        });

        // reference: MSBuild's own evaluation, dotnet msbuild -getProperty — it reads the clock, the environment
        // (BUILD_NUMBER), the SDK's Configuration default and the disk, none of which a static read can know.
        var expected = MsBuildOracle.Evaluate(folder.Combine(project), null, ["Authors"], new Dictionary<string, string> { ["BUILD_NUMBER"] = "42" });
        Assert.Matches(@"^1\.\d{4}\.0-ci\.42$", expected.Property("Version"));
        Assert.Equal("MIT", expected.Property("PackageLicenseExpression"));
        Assert.Equal("Bramblecote Software", expected.Property("Authors"));

        var info = new StaticProjectReader().Read(tree).Find(project)!;
        var prefix = info.Property("VersionPrefix")!;
        Assert.Equal("1.$([System.DateTime]::UtcNow.Year).0", prefix.Value);
        Assert.StartsWith($"{project}:4: property function $([System.DateTime]::UtcNow.Year)", prefix.Unevaluated, StringComparison.Ordinal);
        Assert.StartsWith($"{project}:5: property VersionSuffix uses $(BUILD_NUMBER)", info.Property("VersionSuffix")!.Unevaluated, StringComparison.Ordinal);
        Assert.NotNull(DeclaredVersion.Of(info).Unevaluated);
        Assert.Null(info.Property("PackageLicenseExpression"));
        Assert.Contains(info.Unevaluated, n => n.StartsWith($"{project}:6: the condition of property PackageLicenseExpression uses $(Configuration)", StringComparison.Ordinal));
        Assert.Null(info.Property("Authors"));
        Assert.Contains(info.Unevaluated, n => n.StartsWith($"{project}:7: property function $([System.IO.Directory]::Exists", StringComparison.Ordinal) && n.EndsWith("property Authors is skipped", StringComparison.Ordinal));
    }

    private static void ComparePackageReferences(MsBuildResult expected, ProjectInfo project, string? tfm, string root, string context)
    {
        var central = string.Equals(expected.Property("ManagePackageVersionsCentrally"), "true", StringComparison.OrdinalIgnoreCase);
        var pinned = expected.ItemsOf("PackageVersion")
            .GroupBy(v => v["Identity"], StringComparer.OrdinalIgnoreCase)
            .ToDictionary(g => g.Key, g => g.Last().GetValueOrDefault("Version") ?? string.Empty, StringComparer.OrdinalIgnoreCase);
        // Implicit references an SDK adds from its own files (FSharp.Core for F#) are not read statically; the
        // reader names them in Unevaluated instead. GlobalPackageReference items come back through NuGet.targets.
        var theirs = expected.ItemsOf("PackageReference")
            .Where(r => Relative(r.GetValueOrDefault("DefiningProjectFullPath"), root) is not null || r.GetValueOrDefault("DefiningProjectName") == "NuGet")
            .ToList();
        if (expected.ItemsOf("PackageReference").Any(r => r["Identity"] == "FSharp.Core"))
        {
            Assert.Contains(project.Unevaluated, n => n.Contains("FSharp.Core", StringComparison.Ordinal));
        }

        var mine = project.PackageReferences.Where(r => r.TargetFramework is null || r.TargetFramework == tfm).ToList();
        Assert.True(
            theirs.Select(r => r["Identity"]).SequenceEqual(mine.Select(r => r.Id), StringComparer.OrdinalIgnoreCase),
            $"PackageReference ids: MSBuild [{string.Join(", ", theirs.Select(r => r["Identity"]))}], reader [{string.Join(", ", mine.Select(r => r.Id))}]\n{context}");
        for (var i = 0; i < theirs.Count; i++)
        {
            var item = theirs[i];
            var id = item["Identity"];

            // Central package management (learn.microsoft.com/nuget/consume-packages/central-package-management):
            // VersionOverride, else the PackageVersion of the same id, else the reference's own Version.
            var version = central
                ? NonEmpty(item.GetValueOrDefault("VersionOverride")) ?? (pinned.TryGetValue(id, out var v) ? v : null) ?? NonEmpty(item.GetValueOrDefault("Version"))
                : NonEmpty(item.GetValueOrDefault("Version"));
            Assert.True(version == mine[i].Version, $"{id} version: expected {version}, reader {mine[i].Version}\n{context}");
            CompareMetadata(item, mine[i].Metadata, ["Version", "VersionOverride"], $"{id}\n{context}");
            if (Relative(item.GetValueOrDefault("DefiningProjectFullPath"), root) is { } definedIn)
            {
                Assert.True(definedIn == mine[i].Location.Path, $"{id} declared in {definedIn}, reader {mine[i].Location}\n{context}");
            }
        }
    }

    private static void CompareCentralVersions(MsBuildResult expected, ProjectInfo project, string context)
    {
        var theirs = expected.ItemsOf("PackageVersion").Select(v => $"{v["Identity"]}={v.GetValueOrDefault("Version")}").ToList();
        var mine = project.CentralVersions.Select(v => $"{v.Id}={v.Version}").ToList();
        Assert.True(theirs.SequenceEqual(mine, StringComparer.OrdinalIgnoreCase), $"PackageVersion items: MSBuild [{string.Join(", ", theirs)}], reader [{string.Join(", ", mine)}]\n{context}");
    }

    private static void CompareProjectReferences(MsBuildResult expected, ProjectInfo project, string root, string context)
    {
        var theirs = expected.ItemsOf("ProjectReference");
        Assert.True(theirs.Count == project.ProjectReferences.Count, $"ProjectReference count\n{context}");
        for (var i = 0; i < theirs.Count; i++)
        {
            Assert.True(Relative(theirs[i]["FullPath"], root) == project.ProjectReferences[i].Path, $"ProjectReference {theirs[i]["Identity"]}: reader {project.ProjectReferences[i].Path}\n{context}");
            // Microsoft.Common.CurrentVersion.targets gives every ProjectReference ReferenceSourceTarget by an ItemDefinitionGroup.
            CompareMetadata(theirs[i], project.ProjectReferences[i].Metadata, ["ReferenceSourceTarget"], context);
        }
    }

    private static void ComparePackItems(MsBuildResult expected, ProjectInfo project, string root, string context)
    {
        var theirs = expected.ItemsOf("None").Concat(expected.ItemsOf("Content"))
            .Where(i => string.Equals(i.GetValueOrDefault("Pack"), "true", StringComparison.OrdinalIgnoreCase))
            .Select(i => $"{Relative(i["FullPath"], root)} -> {Slashes(i.GetValueOrDefault("PackagePath"))}")
            .Order(StringComparer.Ordinal)
            .ToList();
        var mine = project.PackItems
            .Select(p => $"{p.Path} -> {Slashes(p.PackagePath)}")
            .Order(StringComparer.Ordinal)
            .ToList();
        Assert.True(theirs.SequenceEqual(mine), $"Packed files: MSBuild [{string.Join(", ", theirs)}], reader [{string.Join(", ", mine)}]\n{context}");
    }

    private static void CompareMetadata(IReadOnlyDictionary<string, string> theirs, IReadOnlyDictionary<string, string> mine, string[] skip, string context)
    {
        bool Compared(string key) => !WellKnownMetadata.Contains(key) && !skip.Contains(key, StringComparer.OrdinalIgnoreCase);
        var a = theirs.Where(m => Compared(m.Key) && m.Value.Length > 0).Select(m => $"{m.Key.ToUpperInvariant()}={Slashes(m.Value)}").Order(StringComparer.Ordinal);
        var b = mine.Where(m => Compared(m.Key) && m.Value.Length > 0).Select(m => $"{m.Key.ToUpperInvariant()}={Slashes(m.Value)}").Order(StringComparer.Ordinal);
        Assert.True(a.SequenceEqual(b), $"metadata: MSBuild [{string.Join(", ", a)}], reader [{string.Join(", ", b)}]\n{context}");
    }

    /// <summary>MSBuild on Unix turns '\' into '/' in item metadata that looks like a path.</summary>
    private static string Slashes(string? value) => (value ?? string.Empty).Replace('\\', '/');

    private static string? NonEmpty(string? value) => string.IsNullOrEmpty(value) ? null : value;

    private static string? Relative(string? fullPath, string root)
    {
        if (string.IsNullOrEmpty(fullPath))
        {
            return null;
        }

        var relative = Path.GetRelativePath(root, fullPath).Replace('\\', '/');
        return relative.StartsWith("..", StringComparison.Ordinal) ? null : relative;
    }

    /// <summary>MSBuild looks above the folder for Directory.Build.*; the oracle is only valid when there are none.</summary>
    private static void AssertNoBuildFilesAbove(string folder)
    {
        for (var dir = Directory.GetParent(folder); dir is not null; dir = dir.Parent)
        {
            foreach (var file in new[] { "Directory.Build.props", "Directory.Build.targets", "Directory.Packages.props" })
            {
                Assert.False(File.Exists(Path.Combine(dir.FullName, file)), $"{Path.Combine(dir.FullName, file)} would take part in the evaluation");
            }
        }
    }
}
