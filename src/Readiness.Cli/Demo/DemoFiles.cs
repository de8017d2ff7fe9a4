namespace Readiness.Cli.Demo;

/// <summary>
/// The invented demo repository (design/scenario.md): Bramblecote Software's Bramble.Sketches and its plugin for the
/// invented Lanternfly host. Nothing here is real. Three states of the repository, one per release.
/// </summary>
public static class DemoFiles
{
    public const string Author = "Bramblecote Dev";
    public const string Email = "dev@bramblecote.example";

    public static string DirectoryBuildProps(string version) => $"""
        <Project>
          <PropertyGroup>
            <!-- One version for every package released together. -->
            <Version>{version}</Version>
            <Authors>Bramblecote Software</Authors>
            <Company>Bramblecote Software</Company>
            <PackageLicenseExpression>MIT</PackageLicenseExpression>
            <RepositoryUrl>https://git.example/bramblecote/bramble-sketches</RepositoryUrl>
            <PackageProjectUrl>https://git.example/bramblecote/bramble-sketches</PackageProjectUrl>
            <PackageTags>sketch;quantile;distinct-count;streaming</PackageTags>
            <PackageReadmeFile>README.md</PackageReadmeFile>
            <Nullable>enable</Nullable>
          </PropertyGroup>
          <ItemGroup>
            <None Include="$(MSBuildThisFileDirectory)README.md" Pack="true" PackagePath="\" />
          </ItemGroup>
        </Project>

        """;

    public const string DirectoryPackagesProps = """
        <Project>
          <PropertyGroup>
            <ManagePackageVersionsCentrally>true</ManagePackageVersionsCentrally>
          </PropertyGroup>
          <ItemGroup>
            <PackageVersion Include="Lanternfly.Host.Abstractions" Version="3.2.0" />
            <PackageVersion Include="Lanternfly.Host.Runtime" Version="3.2.0" />
            <PackageVersion Include="Microsoft.NET.Test.Sdk" Version="17.12.0" />
            <PackageVersion Include="xunit" Version="2.9.3" />
          </ItemGroup>
        </Project>

        """;

    public const string SketchesProject = """
        <Project Sdk="Microsoft.NET.Sdk">
          <PropertyGroup>
            <TargetFrameworks>netstandard2.0;net8.0;net10.0</TargetFrameworks>
            <PackageId>Bramble.Sketches</PackageId>
            <Description>Streaming quantile and distinct-count sketches with bounded memory.</Description>
          </PropertyGroup>
        </Project>

        """;

    public const string PluginProject = """
        <Project Sdk="Microsoft.NET.Sdk">
          <PropertyGroup>
            <TargetFrameworks>net6.0;net8.0;net10.0</TargetFrameworks>
            <PackageId>Bramble.Sketches.Lanternfly3</PackageId>
            <Description>Bramble sketches as aggregate functions inside a Lanternfly 3.x host.</Description>
          </PropertyGroup>
          <ItemGroup>
            <PackageReference Include="Lanternfly.Host.Abstractions" PrivateAssets="all" />
            <PackageReference Include="Lanternfly.Host.Runtime" />
          </ItemGroup>
          <ItemGroup>
            <ProjectReference Include="..\Bramble.Sketches\Bramble.Sketches.csproj" />
          </ItemGroup>
        </Project>

        """;

    public const string TestProject = """
        <Project Sdk="Microsoft.NET.Sdk">
          <PropertyGroup>
            <TargetFrameworks>net8.0;net10.0</TargetFrameworks>
            <IsPackable>false</IsPackable>
          </PropertyGroup>
          <ItemGroup>
            <PackageReference Include="Microsoft.NET.Test.Sdk" />
            <PackageReference Include="xunit" />
          </ItemGroup>
          <ItemGroup>
            <ProjectReference Include="..\..\src\Bramble.Sketches\Bramble.Sketches.csproj" />
          </ItemGroup>
        </Project>

        """;

    public const string Workflow = """
        name: ci
        on: [push, pull_request]
        jobs:
          build:
            runs-on: ubuntu-latest
            steps:
              - uses: actions/checkout@v4
              - uses: actions/setup-dotnet@v4
                with:
                  dotnet-version: |
                    8.0.x
                    10.0.x
              - run: dotnet test

        """;

    public const string Config = """
        # Readiness configuration for Bramble.Sketches (invented demo repository).
        checklist: host-plugin
        tag-pattern: "v{version}"
        host-packages: ["Lanternfly.Host.*"]
        host-marker: id-suffix
        changelog: CHANGELOG.md
        allowed-signers: .github/allowed_signers

        """;

    public const string AllowedSigners =
        "dev@bramblecote.example namespaces=\"git\" ssh-ed25519 AAAAC3NzaC1lZDI1NTE5AAAAIBramb1ecoteDemoKeyNotRea1ForSigningAnything0\n";

    public const string Readme = """
        # Bramble.Sketches

        Streaming quantile and distinct-count sketches for .NET, with bounded memory.

        ```csharp
        var sketch = new QuantileSketch(accuracy: 0.01);
        foreach (var latency in latencies) sketch.Add(latency);
        Console.WriteLine(sketch.Quantile(0.99));
        ```

        `Bramble.Sketches.Lanternfly3` exposes the sketches inside a Lanternfly 3.x host.

        """;

    public const string License = """
        MIT License

        Copyright (c) 2024 Bramblecote Software

        Permission is hereby granted, free of charge, to any person obtaining a copy
        of this software and associated documentation files (the "Software"), to deal
        in the Software without restriction, including without limitation the rights
        to use, copy, modify, merge, publish, distribute, sublicense, and/or sell
        copies of the Software, and to permit persons to whom the Software is
        furnished to do so, subject to the following conditions:

        The above copyright notice and this permission notice shall be included in all
        copies or substantial portions of the Software.

        THE SOFTWARE IS PROVIDED "AS IS", WITHOUT WARRANTY OF ANY KIND, EXPRESS OR
        IMPLIED, INCLUDING BUT NOT LIMITED TO THE WARRANTIES OF MERCHANTABILITY,
        FITNESS FOR A PARTICULAR PURPOSE AND NONINFRINGEMENT. IN NO EVENT SHALL THE
        AUTHORS OR COPYRIGHT HOLDERS BE LIABLE FOR ANY CLAIM, DAMAGES OR OTHER
        LIABILITY, WHETHER IN AN ACTION OF CONTRACT, TORT OR OTHERWISE, ARISING FROM,
        OUT OF OR IN CONNECTION WITH THE SOFTWARE OR THE USE OR OTHER DEALINGS IN THE
        SOFTWARE.

        """;

    public const string Changelog230 = """
        # Changelog

        All notable changes to this project are documented in this file.
        The format follows Keep a Changelog, and the project adheres to Semantic Versioning.

        ## [Unreleased]

        ## [2.3.0] - 2026-06-02

        ### Added
        - `DistinctCountSketch.Merge` combines sketches built on different machines.

        [unreleased]: https://git.example/bramblecote/bramble-sketches/compare/v2.3.0...HEAD
        [2.3.0]: https://git.example/bramblecote/bramble-sketches/releases/tag/v2.3.0

        """;

    public const string Changelog231 = """
        # Changelog

        All notable changes to this project are documented in this file.
        The format follows Keep a Changelog, and the project adheres to Semantic Versioning.

        ## [Unreleased]

        ## [2.3.1] - 2026-08-19

        ### Fixed
        - `QuantileSketch.Quantile(1.0)` returned the second-largest value.

        ## [2.3.0] - 2026-06-02

        ### Added
        - `DistinctCountSketch.Merge` combines sketches built on different machines.

        [unreleased]: https://git.example/bramblecote/bramble-sketches/compare/v2.3.1...HEAD
        [2.3.1]: https://git.example/bramblecote/bramble-sketches/compare/v2.3.0...v2.3.1
        [2.3.0]: https://git.example/bramblecote/bramble-sketches/releases/tag/v2.3.0

        """;

    public const string Changelog240 = """
        # Changelog

        All notable changes to this project are documented in this file.
        The format follows Keep a Changelog, and the project adheres to Semantic Versioning.

        ## [Unreleased]

        ### Added
        - `Bramble.Sketches.Lanternfly3`: the sketches as aggregate functions in Lanternfly 3.x hosts.
        - `QuantileSketch.Quantiles(params double[])` answers several ranks in one pass.

        ## [2.3.1] - 2026-08-19

        ### Fixed
        - `QuantileSketch.Quantile(1.0)` returned the second-largest value.

        ## [2.3.0] - 2026-06-02

        ### Added
        - `DistinctCountSketch.Merge` combines sketches built on different machines.

        [unreleased]: https://git.example/bramblecote/bramble-sketches/compare/v2.3.1...HEAD
        [2.3.1]: https://git.example/bramblecote/bramble-sketches/compare/v2.3.0...v2.3.1
        [2.3.0]: https://git.example/bramblecote/bramble-sketches/releases/tag/v2.3.0

        """;

    public const string QuantileSketch = """
        namespace Bramble.Sketches;

        /// <summary>A streaming quantile sketch with bounded memory.</summary>
        public sealed class QuantileSketch(double accuracy)
        {
            private readonly List<double> samples = new();

            public double Accuracy { get; } = accuracy;

            public void Add(double value) => samples.Add(value);

            public double Quantile(double rank)
            {
                samples.Sort();
                return samples.Count == 0 ? double.NaN : samples[(int)Math.Round(rank * (samples.Count - 1))];
            }
        }

        """;

    public const string PluginSource = """
        namespace Bramble.Sketches.Lanternfly3;

        /// <summary>Registers the sketches as aggregate functions of a Lanternfly 3.x host.</summary>
        public static class SketchFunctions
        {
            public static string[] Names => ["approx_quantile", "approx_distinct"];
        }

        """;
}
