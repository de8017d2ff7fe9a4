namespace Readiness.Testing;

/// <summary>
/// Writes an invented library in the demo scenario's style (Bramble.Sketches) into a test repository: correct by
/// default, so a test changes only the one thing it is about.
/// </summary>
public static class SampleLibrary
{
    public static string DirectoryBuildProps(string version) => $"""
        <Project>
          <PropertyGroup>
            <Version>{version}</Version>
            <Authors>Bramblecote Software</Authors>
            <PackageLicenseExpression>MIT</PackageLicenseExpression>
            <RepositoryUrl>https://git.example/bramblecote/bramble-sketches</RepositoryUrl>
            <PackageTags>sketch;quantile</PackageTags>
            <PackageReadmeFile>README.md</PackageReadmeFile>
          </PropertyGroup>
          <ItemGroup>
            <None Include="$(MSBuildThisFileDirectory)README.md" Pack="true" PackagePath="\" />
          </ItemGroup>
        </Project>

        """;

    public const string Project = """
        <Project Sdk="Microsoft.NET.Sdk">
          <PropertyGroup>
            <TargetFramework>net10.0</TargetFramework>
            <PackageId>Bramble.Sketches</PackageId>
            <Description>Streaming quantile sketches with bounded memory.</Description>
          </PropertyGroup>
        </Project>

        """;

    public const string TestProject = """
        <Project Sdk="Microsoft.NET.Sdk">
          <PropertyGroup>
            <TargetFramework>net10.0</TargetFramework>
            <IsPackable>false</IsPackable>
          </PropertyGroup>
          <ItemGroup>
            <PackageReference Include="Microsoft.NET.Test.Sdk" Version="17.12.0" />
            <ProjectReference Include="..\..\src\Bramble.Sketches\Bramble.Sketches.csproj" />
          </ItemGroup>
        </Project>

        """;

    public const string Workflow = """
        name: ci
        on: [push]
        jobs:
          build:
            runs-on: ubuntu-latest
            steps:
              - uses: actions/checkout@v4
              - uses: actions/setup-dotnet@v4
                with:
                  dotnet-version: 10.0.x
              - run: dotnet test

        """;

    public const string MitLicense = """
        MIT License

        Copyright (c) 2026 Bramblecote Software

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

    /// <summary>A Keep a Changelog file with one section per (version, date), newest first.</summary>
    public static string Changelog(params (string Version, string Date)[] releases)
    {
        var sections = string.Concat(releases.Select(r => $"## [{r.Version}] - {r.Date}\n\n### Added\n- Sketch work for {r.Version}.\n\n"));
        return "# Changelog\n\nAll notable changes to this project are documented here.\n\n## [Unreleased]\n\n" + sections;
    }

    /// <summary>Writes the whole library at <paramref name="version"/> (not committed).</summary>
    public static TestRepository WriteLibrary(this TestRepository repository, string version, string date)
    {
        ArgumentNullException.ThrowIfNull(repository);
        return repository
            .Write("README.md", "# Bramble.Sketches\n\nStreaming quantile sketches.\n")
            .Write("LICENSE", MitLicense)
            .Write("CHANGELOG.md", Changelog((version, date)))
            .Write("Directory.Build.props", DirectoryBuildProps(version))
            .Write("src/Bramble.Sketches/Bramble.Sketches.csproj", Project)
            .Write("src/Bramble.Sketches/QuantileSketch.cs", "namespace Bramble.Sketches;\n\npublic sealed class QuantileSketch { }\n")
            .Write("tests/Bramble.Sketches.Tests/Bramble.Sketches.Tests.csproj", TestProject)
            .Write(".github/workflows/ci.yml", Workflow);
    }

    /// <summary>A repository holding a ready release <paramref name="version"/>, committed and tagged (annotated).</summary>
    public static TestRepository ReadyRelease(string version = "1.2.0")
    {
        var date = new DateTimeOffset(2026, 11, 20, 10, 0, 0, TimeSpan.Zero);
        var repository = TestRepository.Create();
        repository.WriteLibrary(version, date.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture)).Commit($"Release {version}", date);
        repository.AnnotatedTag("v" + version, $"Bramble.Sketches {version}\n", date);
        return repository;
    }
}
