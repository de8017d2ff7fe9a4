using System.Diagnostics;
using System.Text;
using Readiness.Core.Projects.MsBuild;
using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>
/// The static MSBuild reader over a repository of 50 projects (half multi-targeting) with a Directory.Build.props
/// chain, central package versions and Directory.Build.targets. Target: well under 100 ms per read.
/// </summary>
public sealed class ProjectReaderBench : IBench
{
    public string Name => "project-reader";

    public string Description => "StaticProjectReader.Read over 50 projects (cold first read, then warm reads)";

    public Task RunAsync(string[] args, CancellationToken cancellationToken)
    {
        var projects = args.Length > 0 && int.TryParse(args[0], out var n) ? n : 50;
        var tree = Repository(projects);
        var reader = new StaticProjectReader();

        var cold = Stopwatch.StartNew();
        var model = reader.Read(tree);
        cold.Stop();
        Console.WriteLine($"{model.Projects.Count} projects, {model.Projects.Sum(p => p.PackageReferences.Count)} package references, {model.Problems.Count} problems");
        Console.WriteLine($"cold (first read, JIT included): {cold.Elapsed.TotalMilliseconds:0.0} ms");
        var allocated = GC.GetAllocatedBytesForCurrentThread();
        reader.Read(tree);
        Console.WriteLine($"allocated: {(GC.GetAllocatedBytesForCurrentThread() - allocated) / 1024.0 / 1024.0:0.0} MiB per read");
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;
        var runs = args.Length > 1 && int.TryParse(args[1], out var r) ? r : 30;
        var samples = Stats.Time(runs, () => reader.Read(tree));
        var cpuPerRead = (Process.GetCurrentProcess().TotalProcessorTime - cpu).TotalMilliseconds / samples.Count;
        Console.WriteLine($"warm: {Stats.Describe(samples)}; CPU time {cpuPerRead:0.0} ms per read (wall time suffers on a busy machine)");
        return Task.CompletedTask;
    }

    private static InMemoryFileTree Repository(int projects)
    {
        var tree = new InMemoryFileTree()
            .Add("Directory.Build.props", """
                <Project>
                  <PropertyGroup>
                    <VersionPrefix>2.4.0</VersionPrefix>
                    <Authors>Bramblecote Software</Authors>
                    <PackageLicenseExpression>MIT</PackageLicenseExpression>
                  </PropertyGroup>
                </Project>
                """)
            .Add("src/Directory.Build.props", """
                <Project>
                  <Import Project="$([MSBuild]::GetPathOfFileAbove('Directory.Build.props', '$(MSBuildThisFileDirectory)../'))" />
                  <PropertyGroup Condition="'$(Configuration)' == 'Release' and !$(MSBuildProjectName.EndsWith('.Tests'))">
                    <ContinuousIntegrationBuild>true</ContinuousIntegrationBuild>
                  </PropertyGroup>
                  <ItemGroup>
                    <None Include="$(MSBuildThisFileDirectory)../README.md" Pack="true" PackagePath="\" />
                  </ItemGroup>
                </Project>
                """)
            .Add("Directory.Build.targets", """
                <Project>
                  <PropertyGroup>
                    <Description Condition="'$(Description)' == ''">$(MSBuildProjectName) for Bramblecote</Description>
                  </PropertyGroup>
                </Project>
                """)
            .Add("README.md", "# Bramble.Sketches");
        var versions = new StringBuilder("<Project>\n  <PropertyGroup>\n    <ManagePackageVersionsCentrally>true</ManagePackageVersionsCentrally>\n  </PropertyGroup>\n  <ItemGroup>\n");
        for (var i = 0; i < 30; i++)
        {
            versions.Append($"    <PackageVersion Include=\"Bramble.Dependency{i}\" Version=\"1.{i}.0\" />\n");
        }

        tree.Add("Directory.Packages.props", versions.Append("  </ItemGroup>\n</Project>\n").ToString());
        for (var p = 0; p < projects; p++)
        {
            var name = $"Lanternfly.Host.Part{p}";
            var targets = p % 2 == 0 ? "<TargetFrameworks>net8.0;net10.0</TargetFrameworks>" : "<TargetFramework>net10.0</TargetFramework>";
            var references = string.Concat(Enumerable.Range(0, 5).Select(r => $"    <PackageReference Include=\"Bramble.Dependency{(p + r) % 30}\" />\n"));
            tree.Add($"src/{name}/{name}.csproj", $"""
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    {targets}
                    <VersionSuffix Condition="'$(TargetFramework)' == 'net8.0'">compat</VersionSuffix>
                  </PropertyGroup>
                  <ItemGroup>
                {references}    <PackageReference Include="Bramble.Legacy" VersionOverride="0.9.0" Condition="'$(TargetFramework)' == 'net8.0'" />
                    <ProjectReference Include="..\Lanternfly.Host.Part{(p + 1) % projects}\Lanternfly.Host.Part{(p + 1) % projects}.csproj" />
                  </ItemGroup>
                </Project>
                """);
        }

        return tree;
    }
}
