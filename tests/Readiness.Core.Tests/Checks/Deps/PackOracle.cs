using System.IO.Compression;
using System.Xml.Linq;
using NuGet.Packaging;
using NuGet.Versioning;
using Readiness.Testing;

namespace Readiness.Core.Tests.Checks.Deps;

/// <summary>
/// NuGet's own behaviour as the reference for compile-only references: a local folder feed holding a generated
/// <c>Lanternfly.Host.Runtime</c> 3.1.0, a set of tiny projects (one per reference form) packed with ONE
/// <c>dotnet pack</c> of a solution, and the <c>dependency</c> elements of each produced nuspec.
/// </summary>
public sealed class PackOracle : IDisposable
{
    public const string HostId = "Lanternfly.Host.Runtime";
    public const string HostVersion = "3.1.0";

    private readonly TempDirectory folder = new("readiness-pack-oracle-");

    /// <summary>The repository-relative files of the projects, as the static reader will see them.</summary>
    public Dictionary<string, string> Files { get; } = new(StringComparer.Ordinal);

    /// <summary>Per project name: the host dependency's nuspec <c>exclude</c> attribute, "" when it has none, or null when omitted.</summary>
    public Dictionary<string, string?> HostDependency { get; } = new(StringComparer.Ordinal);

    public string PackLog { get; private set; } = string.Empty;

    /// <summary>Adds a file of the repository under test.</summary>
    public PackOracle Add(string path, string text)
    {
        Files[path] = text;
        return this;
    }

    /// <summary>
    /// A net10.0 class library with the given item group content (no version: pack uses 1.0.0). It packs a small
    /// notes file so that a package whose only dependency is left out still has content (NU5017).
    /// </summary>
    public static string Project(string items, string properties = "") => $"""
        <Project Sdk="Microsoft.NET.Sdk">
          <PropertyGroup>
            <TargetFramework>net10.0</TargetFramework>
            <Nullable>enable</Nullable>
            <Authors>Bramblecote Software</Authors>
            <Description>Oracle fixture.</Description>{properties}
          </PropertyGroup>
          <ItemGroup>
            {items}
            <None Include="notes.txt" Pack="true" PackagePath="" />
          </ItemGroup>
        </Project>
        """;

    /// <summary>Writes the feed, nuget.config, the files and a solution, packs everything once and reads the nuspecs.</summary>
    public void Pack()
    {
        var feed = folder.Combine("feed");
        Directory.CreateDirectory(feed);
        WriteHostPackage(Path.Combine(feed, $"{HostId}.{HostVersion}.nupkg"));

        var repo = folder.Combine("repo");
        foreach (var (path, text) in Files)
        {
            var full = Path.Combine(repo, path);
            Directory.CreateDirectory(Path.GetDirectoryName(full)!);
            File.WriteAllText(full, text);
            if (full.EndsWith(".csproj", StringComparison.Ordinal))
            {
                File.WriteAllText(Path.Combine(Path.GetDirectoryName(full)!, "notes.txt"), "Oracle fixture.\n");
            }
        }

        // Only the local feed: nothing is fetched from anywhere else (net10.0 needs no package beyond the SDK's packs).
        File.WriteAllText(Path.Combine(repo, "nuget.config"), $"""
            <?xml version="1.0" encoding="utf-8"?>
            <configuration>
              <packageSources>
                <clear />
                <add key="oracle" value="{feed}" />
              </packageSources>
            </configuration>
            """);
        var projects = Files.Keys.Where(p => p.EndsWith(".csproj", StringComparison.Ordinal)).ToArray();
        File.WriteAllText(Path.Combine(repo, "oracle.slnx"),
            "<Solution>\n" + string.Concat(projects.Select(p => $"  <Project Path=\"{p}\" />\n")) + "</Solution>\n");

        var output = folder.Combine("out");
        // Restore and pack in one invocation. The nuspec's dependencies come from restore's assets file, not from the
        // compiled assembly, so the build output is left out (IncludeBuildOutput=false, NoBuild=true): same
        // dependencies, no compiler run.
        var (exit, log) = Dotnet(repo, "pack", "oracle.slnx", "-o", output, "-nologo", "-v:q",
            "-p:NoBuild=true", "-p:IncludeBuildOutput=false", "-p:TreatWarningsAsErrors=false");
        PackLog = log;
        Assert.True(exit == 0, "dotnet pack failed:\n" + log);

        foreach (var project in projects)
        {
            var name = Path.GetFileNameWithoutExtension(project);
            var nupkg = Path.Combine(output, $"{name}.1.0.0.nupkg");
            Assert.True(File.Exists(nupkg), $"{nupkg} was not produced:\n{log}");
            HostDependency[name] = ReadHostDependency(nupkg);
        }
    }

    public void Dispose() => folder.Dispose();

    private static string? ReadHostDependency(string nupkg)
    {
        using var zip = ZipFile.OpenRead(nupkg);
        var entry = zip.Entries.Single(e => e.FullName.EndsWith(".nuspec", StringComparison.OrdinalIgnoreCase) && !e.FullName.Contains('/', StringComparison.Ordinal));
        using var stream = entry.Open();
        var doc = XDocument.Load(stream);
        var dependency = doc.Descendants().FirstOrDefault(e => e.Name.LocalName == "dependency"
            && string.Equals((string?)e.Attribute("id"), HostId, StringComparison.OrdinalIgnoreCase));
        return dependency is null ? null : (string?)dependency.Attribute("exclude") ?? string.Empty;
    }

    private void WriteHostPackage(string path)
    {
        var builder = new PackageBuilder
        {
            Id = HostId,
            Version = NuGetVersion.Parse(HostVersion),
            Description = "Invented host runtime for tests.",
        };
        builder.Authors.Add("Lanternfly test fixture");

        // "_._" marks a folder as compatible with no files in it (NuGet's empty-folder convention).
        var placeholder = Path.Combine(folder.Path, "_._");
        File.WriteAllText(placeholder, string.Empty);
        builder.AddFiles(folder.Path, "_._", "lib/netstandard2.0");
        using var stream = File.Create(path);
        builder.Save(stream);
    }

    private (int Exit, string Log) Dotnet(string workingDirectory, params string[] args)
    {
        var result = DotnetCli.Run(workingDirectory, args, new Dictionary<string, string> { ["NUGET_PACKAGES"] = folder.Combine("packages") });
        return (result.ExitCode, result.Log);
    }
}
