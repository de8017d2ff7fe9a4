using System.Text;
using Readiness.Core.Projects;
using Readiness.Core.Projects.MsBuild;
using Readiness.Core.Snapshots;
using Readiness.Core.Versioning;
using Readiness.Testing;

namespace Readiness.Core.Tests.Projects;

/// <summary>
/// The static reader on inputs MSBuild is not needed to judge: hostile or broken XML, the forms item metadata
/// takes, central versions with their locations, paths, and the bounds that keep evaluation finite.
/// MSBuild's own answers for evaluation order live in <see cref="StaticProjectReaderOracleTests"/>.
/// </summary>
public sealed class StaticProjectReaderTests
{
    private const string Lib = "src/Bramble.Sketches/Bramble.Sketches.csproj";

    [Fact]
    public void DtdWithEntityExpansion_RefusedAsProblem_NothingExpanded()
    {
        // The "billion laughs" document: nested entities that expand to 10^9 copies if a parser allows DTDs.
        var laughs = new StringBuilder("<?xml version=\"1.0\"?>\n<!DOCTYPE Project [\n  <!ENTITY lol \"lol\">\n");
        for (var i = 1; i <= 9; i++)
        {
            laughs.Append($"  <!ENTITY lol{i} \"{string.Concat(Enumerable.Repeat(i == 1 ? "&lol;" : $"&lol{i - 1};", 10))}\">\n");
        }

        laughs.Append("]>\n<Project Sdk=\"Microsoft.NET.Sdk\">\n  <PropertyGroup>\n    <Description>&lol9;</Description>\n  </PropertyGroup>\n</Project>\n");
        var model = Read((Lib, laughs.ToString()));

        Assert.Empty(model.Projects);
        var problem = Assert.Single(model.Problems);
        Assert.Equal(Lib, problem.Path);
        Assert.Equal(2, problem.Line);
        Assert.Contains("DTD", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void DtdInDirectoryBuildProps_ProblemForThatFile_AndNotedInProject()
    {
        var model = Read(
            ("Directory.Build.props", "<!DOCTYPE Project [ <!ENTITY v \"9.9.9\"> ]>\n<Project><PropertyGroup><Version>&v;</Version></PropertyGroup></Project>"),
            (Lib, Sdk("<PropertyGroup><TargetFramework>net10.0</TargetFramework></PropertyGroup>")));

        var project = Assert.Single(model.Projects);
        Assert.Null(project.Value("Version"));
        var problem = Assert.Single(model.Problems);
        Assert.Equal("Directory.Build.props", problem.Path);
        Assert.Contains(project.Unevaluated, n => n.Contains("Directory.Build.props could not be read", StringComparison.Ordinal));
    }

    [Fact]
    public void MalformedXml_ReportedWithItsLine()
    {
        var model = Read((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <Version>1.0.0</Versio>
              </PropertyGroup>
            </Project>
            """));

        var problem = Assert.Single(model.Problems);
        Assert.Equal(Lib, problem.Path);
        Assert.Equal(3, problem.Line);
        Assert.StartsWith("Malformed XML", problem.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("")]
    [InlineData("not xml at all")]
    [InlineData("<Project")]
    [InlineData("<Other Sdk=\"Microsoft.NET.Sdk\" />")]
    [InlineData("\u0000\u0001\u0002")]
    public void GarbageProjectFile_BecomesProblem_NeverThrows(string text)
    {
        var model = Read((Lib, text));

        Assert.Empty(model.Projects);
        Assert.Equal(Lib, Assert.Single(model.Problems).Path);
    }

    [Fact]
    public void FileAboveSizeLimit_ProblemNotRead()
    {
        var tree = new InMemoryFileTree().Add(Lib, new byte[FileLimits.DefaultMaxBytes + 1]);

        var problem = Assert.Single(new StaticProjectReader().Read(tree).Problems);

        Assert.Equal(Lib, problem.Path);
        Assert.Contains("limit", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NonSdkProject_ProblemWithNote_NotGuessed()
    {
        var model = Read((Lib, """
            <?xml version="1.0" encoding="utf-8"?>
            <Project ToolsVersion="15.0" xmlns="http://schemas.microsoft.com/developer/msbuild/2003">
              <PropertyGroup>
                <Version>1.0.0</Version>
              </PropertyGroup>
            </Project>
            """));

        Assert.Empty(model.Projects);
        var problem = Assert.Single(model.Problems);
        Assert.Equal(2, problem.Line);
        Assert.Contains("Not an SDK-style project", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void SdkStyleForms_AttributeElementAndImport_AllRead()
    {
        var model = Read(
            ("a/A.csproj", "<Project Sdk=\"Microsoft.NET.Sdk/10.0.100\"><PropertyGroup><Version>1.0.0</Version></PropertyGroup></Project>"),
            ("b/B.vbproj", "<Project><Sdk Name=\"Microsoft.NET.Sdk\" /><PropertyGroup><Version>2.0.0</Version></PropertyGroup></Project>"),
            ("c/C.fsproj", "<Project><Import Project=\"Sdk.props\" Sdk=\"Microsoft.NET.Sdk\" /><PropertyGroup><Version>3.0.0</Version></PropertyGroup><Import Project=\"Sdk.targets\" Sdk=\"Microsoft.NET.Sdk\" /></Project>"),
            ("d/readme.txt", "not a project"));

        Assert.Equal(["a/A.csproj", "b/B.vbproj", "c/C.fsproj"], model.Projects.Select(p => p.Path));
        Assert.Equal(["1.0.0", "2.0.0", "3.0.0"], model.Projects.Select(p => p.Value("Version")));
        Assert.Empty(model.Problems);
    }

    [Fact]
    public void Comments_AreNotDeclarations()
    {
        var project = Single(Read((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <!-- <PropertyGroup><Version>9.9.9</Version></PropertyGroup> -->
              <PropertyGroup>
                <TargetFramework>net10.0</TargetFramework>
                <!-- <PackageLicenseExpression>MIT</PackageLicenseExpression> -->
              </PropertyGroup>
              <ItemGroup>
                <!-- <PackageReference Include="Bramble.Ink" Version="1.0.0" /> -->
              </ItemGroup>
            </Project>
            """)));

        Assert.Null(project.Property("Version"));
        Assert.Null(project.Property("PackageLicenseExpression"));
        Assert.Empty(project.PackageReferences);
    }

    [Fact]
    public void PropertyLocation_IsTheDeclarationThatSetTheFinalValue()
    {
        var project = Single(Read(
            ("Directory.Build.props", "<Project>\n  <PropertyGroup>\n    <Version>1.0.0</Version>\n  </PropertyGroup>\n</Project>"),
            (Lib, "<Project Sdk=\"Microsoft.NET.Sdk\">\n  <PropertyGroup>\n    <Authors>Bramblecote Software</Authors>\n    <Version>2.0.0</Version>\n  </PropertyGroup>\n</Project>")));

        Assert.Equal(new SourceLocation(Lib, 4), project.Property("Version")!.Location);
        Assert.Equal(["Directory.Build.props"], project.Imports);
    }

    [Fact]
    public void PackageReferenceMetadata_AttributeAndChildElementForms_LookupIgnoresCase()
    {
        var project = Single(Read((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <ItemGroup>
                <PackageReference Include="Bramble.Ink" Version="1.0.0" PrivateAssets="all" />
                <PackageReference Include="Bramble.Paper">
                  <version>2.0.0</version>
                  <includeassets>compile; runtime</includeassets>
                  <ExcludeAssets Condition="'$(NotSet)' == 'x'">all</ExcludeAssets>
                </PackageReference>
                <PackageReference Update="BRAMBLE.INK">
                  <PrivateAssets>compile</PrivateAssets>
                </PackageReference>
              </ItemGroup>
            </Project>
            """)));

        var ink = project.PackageReferences[0];
        Assert.Equal(("Bramble.Ink", "1.0.0"), (ink.Id, ink.Version));
        Assert.Equal(new SourceLocation(Lib, 3), ink.VersionLocation);
        Assert.Equal("compile", ink.Meta("privateassets"));
        var paper = project.PackageReferences[1];
        Assert.Equal("2.0.0", paper.Version);
        Assert.Equal(new SourceLocation(Lib, 5), paper.VersionLocation);
        Assert.Equal("compile; runtime", paper.Meta("IncludeAssets"));
        Assert.Null(paper.Meta("ExcludeAssets"));
        Assert.True(paper.Metadata.ContainsKey("INCLUDEASSETS"));
    }

    [Fact]
    public void CentralVersions_ResolvedWithTheirLocations_VersionOverrideWins()
    {
        var project = Single(Read(
            ("Directory.Packages.props", """
                <Project>
                  <PropertyGroup>
                    <ManagePackageVersionsCentrally>true</ManagePackageVersionsCentrally>
                  </PropertyGroup>
                  <ItemGroup>
                    <PackageVersion Include="Bramble.Ink" Version="1.2.3" />
                    <PackageVersion Include="Bramble.Paper" Version="3.0.0" Comment="pinned" />
                    <GlobalPackageReference Include="Bramble.Build.Tools" Version="1.0.1" />
                  </ItemGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <ItemGroup>
                    <PackageReference Include="bramble.ink" />
                    <PackageReference Include="Bramble.Paper" VersionOverride="3.1.0" />
                    <PackageReference Include="Lanternfly.Host.Abstractions" />
                  </ItemGroup>
                </Project>
                """)));

        var ink = project.PackageReferences.Single(r => r.Id == "bramble.ink");
        Assert.Equal("1.2.3", ink.Version);
        Assert.Equal(new SourceLocation("Directory.Packages.props", 6), ink.VersionLocation);
        var paper = project.PackageReferences.Single(r => r.Id == "Bramble.Paper");
        Assert.Equal("3.1.0", paper.Version);
        Assert.Equal(new SourceLocation(Lib, 4), paper.VersionLocation);
        var unpinned = project.PackageReferences.Single(r => r.Id == "Lanternfly.Host.Abstractions");
        Assert.Null(unpinned.Version);
        Assert.Null(unpinned.VersionLocation);

        // NuGet.targets turns a GlobalPackageReference into a private, build-only PackageReference.
        var global = project.PackageReferences.Single(r => r.Id == "Bramble.Build.Tools");
        Assert.Equal("1.0.1", global.Version);
        Assert.Equal("All", global.Meta("PrivateAssets"));
        Assert.Equal(new SourceLocation("Directory.Packages.props", 8), global.Location);

        Assert.Equal(["Bramble.Ink", "Bramble.Paper", "Bramble.Build.Tools"], project.CentralVersions.Select(v => v.Id));
        Assert.Equal("pinned", project.CentralVersions[1].Metadata["comment"]);
        Assert.Equal(new SourceLocation("Directory.Packages.props", 7), project.CentralVersions[1].Location);
    }

    [Fact]
    public void CentralManagementSwitchedOff_VersionOverrideAndCentralVersionsIgnored()
    {
        var project = Single(Read(
            ("Directory.Packages.props", "<Project><ItemGroup><PackageVersion Include=\"Bramble.Ink\" Version=\"1.2.3\" /></ItemGroup></Project>"),
            (Lib, Sdk("<ItemGroup><PackageReference Include=\"Bramble.Ink\" Version=\"1.0.0\" VersionOverride=\"9.0.0\" /></ItemGroup>"))));

        Assert.Equal("1.0.0", Assert.Single(project.PackageReferences).Version);
    }

    [Fact]
    public void ProjectReferences_NormalisedRelativeToTheProject_WhicheverFileDeclaresThem()
    {
        var model = Read(
            ("src/Directory.Build.props", """
                <Project>
                  <ItemGroup Condition="'$(MSBuildProjectName)' != 'Bramble.Ink'">
                    <ProjectReference Include="$(MSBuildThisFileDirectory)Bramble.Ink/Bramble.Ink.csproj" />
                    <ProjectReference Include="..\Bramble.Paper\.\Bramble.Paper.csproj" PrivateAssets="all" />
                  </ItemGroup>
                </Project>
                """),
            ("src/Bramble.Ink/Bramble.Ink.csproj", Sdk(string.Empty)),
            (Lib, Sdk("<ItemGroup><ProjectReference Include=\"..\\..\\..\\elsewhere\\Other.csproj\" /></ItemGroup>")));

        var project = model.Find(Lib)!;
        Assert.Equal(
            ["src/Bramble.Ink/Bramble.Ink.csproj", "src/Bramble.Paper/Bramble.Paper.csproj", "../elsewhere/Other.csproj"],
            project.ProjectReferences.Select(r => r.Path));
        Assert.Equal("all", project.ProjectReferences[1].Meta("privateassets"));
        Assert.Equal(new SourceLocation("src/Directory.Build.props", 4), project.ProjectReferences[1].Location);
        Assert.Contains(project.Unevaluated, n => n.Contains("points outside the repository", StringComparison.Ordinal));
        Assert.Empty(model.Find("src/Bramble.Ink/Bramble.Ink.csproj")!.ProjectReferences);
    }

    [Fact]
    public void PackItems_ResolvedFromTheProjectFolder_WildcardsKeepNoPath()
    {
        var project = Single(Read(
            ("README.md", "# Bramble.Sketches"),
            ("src/Bramble.Sketches/icon.png", "png"),
            ("src/Bramble.Sketches/bin/Debug/stale.png", "png"),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <ItemGroup>
                    <None Include="..\..\README.md" Pack="true" PackagePath="\" />
                    <None Include="docs/**/*.md" Pack="True" PackagePath="docs" />
                    <None Update="icon.png" Pack="true" PackagePath="" />
                    <None Update="bin/Debug/stale.png" Pack="true" />
                    <None Include="LICENSE.txt" />
                    <Content Include="notes.txt" Pack="false" />
                  </ItemGroup>
                </Project>
                """)));

        Assert.Equal(
            [("..\\..\\README.md", "README.md", "\\"), ("docs/**/*.md", null, "docs"), ("icon.png", "src/Bramble.Sketches/icon.png", "")],
            project.PackItems.Select(p => (p.Include, p.Path, p.PackagePath)));
        Assert.Equal(new SourceLocation(Lib, 5), project.PackItems[2].Location);
    }

    [Fact]
    public void TestAndPackableRules_FollowTheProjectDeclarations()
    {
        var model = Read(
            ("a/A.csproj", Sdk("<PropertyGroup><IsTestProject>true</IsTestProject></PropertyGroup>")),
            ("b/B.csproj", Sdk("<ItemGroup><PackageReference Include=\"Microsoft.NET.Test.Sdk\" Version=\"18.0.1\" /></ItemGroup>")),
            ("c/C.csproj", Sdk("<PropertyGroup><IsPackable>False</IsPackable></PropertyGroup>")),
            ("d/D.csproj", Sdk(string.Empty)));

        Assert.Equal(["d/D.csproj"], model.Packable.Select(p => p.Path));
        Assert.Equal(["a/A.csproj", "b/B.csproj"], model.Tests.Select(p => p.Path));
    }

    [Fact]
    public void PerTarget_PropertiesReEvaluated_ItemsCarryTheirTarget()
    {
        var project = Single(Read((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <TargetFrameworks>net8.0;net10.0</TargetFrameworks>
              </PropertyGroup>
              <PropertyGroup Condition="'$(TargetFramework)' == 'net8.0'">
                <Flavor>legacy</Flavor>
              </PropertyGroup>
              <ItemGroup>
                <PackageReference Include="Bramble.Ink" Version="1.0.0" />
                <PackageReference Include="Bramble.Compat" Version="1.0.0" Condition="'$(TargetFramework)' == 'net8.0'" />
                <PackageReference Include="Bramble.Paper" Version="$(TargetFramework)" />
              </ItemGroup>
            </Project>
            """)));

        Assert.Equal(["net8.0", "net10.0"], project.TargetFrameworks);
        Assert.Equal("legacy", project.PerTarget["net8.0"]["Flavor"].Value);
        Assert.False(project.PerTarget["net10.0"].ContainsKey("Flavor"));
        Assert.Null(project.Value("Flavor"));
        Assert.Equal(
            [("Bramble.Ink", null, "1.0.0"), ("Bramble.Compat", "net8.0", "1.0.0"), ("Bramble.Paper", "net8.0", "net8.0"), ("Bramble.Paper", "net10.0", "net10.0")],
            project.PackageReferences.Select(r => (r.Id, r.TargetFramework, r.Version)));
    }

    [Fact]
    public void GlobalTargetFramework_CannotBeChangedByFiles()
    {
        var project = Single(Read((Lib, Sdk("""
            <PropertyGroup>
              <TargetFrameworks>net8.0;net10.0</TargetFrameworks>
            </PropertyGroup>
            <PropertyGroup Condition="'$(TargetFramework)' != ''">
              <TargetFramework>net6.0</TargetFramework>
              <Seen>$(TargetFramework)</Seen>
            </PropertyGroup>
            """))));

        Assert.Equal("net8.0", project.PerTarget["net8.0"]["Seen"].Value);
        Assert.Equal("net10.0", project.PerTarget["net10.0"]["Seen"].Value);
    }

    [Fact]
    public void PropertyFunctionAndItemReferences_KeptAsWritten_NamedWithFileAndLine()
    {
        var project = Single(Read((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <VersionPrefix>2.$([System.DateTime]::UtcNow.Year).0</VersionPrefix>
                <Version>$(VersionPrefix)-ci</Version>
                <Sources>@(Compile)</Sources>
                <Registry>$(Registry:HKEY_LOCAL_MACHINE\Software\Bramble@Version)</Registry>
              </PropertyGroup>
            </Project>
            """)));

        var prefix = project.Property("VersionPrefix")!;
        Assert.Equal("2.$([System.DateTime]::UtcNow.Year).0", prefix.Value);
        Assert.Equal($"{Lib}:3: property function $([System.DateTime]::UtcNow.Year) is not evaluated", prefix.Unevaluated);
        Assert.Equal(prefix.Unevaluated, project.Property("Version")!.Unevaluated);
        Assert.Equal($"{Lib}:5: item list @(Compile) is not evaluated", project.Property("Sources")!.Unevaluated);
        Assert.Contains("registry read", project.Property("Registry")!.Unevaluated, StringComparison.Ordinal);
        Assert.Contains(prefix.Unevaluated, project.Unevaluated);
        Assert.NotNull(DeclaredVersion.Of(project).Unevaluated);
    }

    [Fact]
    public void UndefinedProperty_EmptyLikeACleanMachine_ButNamedWhenNoFileSetsIt()
    {
        var project = Single(Read((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <VersionSuffix>ci.$(BUILD_NUMBER)</VersionSuffix>
                <Authors Condition="'$(Owner)' == ''">Bramblecote Software</Authors>
                <Early>$(Late)</Early>
                <Late>set later</Late>
              </PropertyGroup>
            </Project>
            """)));

        Assert.Equal("ci.", project.Property("VersionSuffix")!.Value);
        Assert.Contains($"{Lib}:3: property VersionSuffix uses $(BUILD_NUMBER)", project.Property("VersionSuffix")!.Unevaluated, StringComparison.Ordinal);
        Assert.Contains(project.Unevaluated, n => n.Contains("$(BUILD_NUMBER)", StringComparison.Ordinal));

        // A "not set yet" test and a forward reference decide nothing the environment could change.
        Assert.True(project.Property("Authors")!.IsCertain);
        Assert.Equal(string.Empty, project.Property("Early")!.Value);
        Assert.True(project.Property("Early")!.IsCertain);
        Assert.DoesNotContain(project.Unevaluated, n => n.Contains("$(Owner)", StringComparison.Ordinal) || n.Contains("$(Late)", StringComparison.Ordinal));
    }

    [Fact]
    public void UnknownConditionFunction_ElementSkippedWithNote()
    {
        var project = Single(Read((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <Version>1.0.0</Version>
                <Version Condition="$([System.IO.File]::Exists('x'))">2.0.0</Version>
                <Authors Condition="Bogus('x')">Bramblecote Software</Authors>
              </PropertyGroup>
            </Project>
            """)));

        Assert.Equal("1.0.0", project.Value("Version"));
        Assert.Null(project.Property("Authors"));
        Assert.Contains(project.Unevaluated, n => n.StartsWith($"{Lib}:4:", StringComparison.Ordinal) && n.EndsWith("property Version is skipped", StringComparison.Ordinal));
        Assert.Contains(project.Unevaluated, n => n.StartsWith($"{Lib}:5: condition function Bogus()", StringComparison.Ordinal));
    }

    [Fact]
    public void AndOr_StopWhenTheLeftSideDecides_UnknownOnlyWhenItMatters()
    {
        // MSBuild short-circuits too: oracle layout "conditions" (Painter, Gallery) has dotnet msbuild skip a file read.
        var project = Single(Read((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <Flavor>studio</Flavor>
                <A Condition="'$(Flavor)' == 'home' and $([System.IO.File]::Exists('x'))">set</A>
                <B Condition="'$(Flavor)' == 'studio' or $([System.IO.File]::Exists('x'))">set</B>
                <C Condition="'$(Flavor)' == 'studio' and $([System.IO.File]::Exists('x'))">set</C>
              </PropertyGroup>
            </Project>
            """)));

        Assert.Null(project.Property("A"));
        Assert.Equal("set", project.Value("B"));
        Assert.Null(project.Property("C"));
        Assert.Equal($"{Lib}:6: property function $([System.IO.File]::Exists('x')) is not evaluated; property C is skipped", Assert.Single(project.Unevaluated));
    }

    [Fact]
    public void ImportsOutsideTheRepositoryOrOfOtherSdks_NamedNotRead()
    {
        var model = Read((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <Import Project="/etc/bramble.props" />
              <Import Project="../../../outside.props" />
              <Import Project="Sdk.targets" Sdk="Bramble.Build.Sdk" />
              <Import Project="missing.props" />
            </Project>
            """));

        // The imports outside the repository are also problems of the model (the report's notes name them), not errors.
        Assert.All(model.Problems, p => Assert.Equal(ProjectProblemKind.Skipped, p.Kind));
        Assert.Equal([2, 3], model.Problems.Select(p => p.Line));
        var project = Assert.Single(model.Projects);
        Assert.Contains($"{Lib}:2: import of /etc/bramble.props lies outside the repository; not read", project.Unevaluated);
        Assert.Contains($"{Lib}:3: import of ../../../outside.props lies outside the repository; not read", project.Unevaluated);
        Assert.Contains(project.Unevaluated, n => n.StartsWith($"{Lib}:4: MSBuild SDK Bramble.Build.Sdk is not read", StringComparison.Ordinal));
        Assert.Contains(project.Unevaluated, n => n.StartsWith($"{Lib}:5: import of src/Bramble.Sketches/missing.props names a file that is not in the repository", StringComparison.Ordinal));
    }

    [Fact]
    public void ImportCycle_EachFileOnce_NoHang()
    {
        var project = Single(Read(
            ("build/a.props", "<Project><Import Project=\"b.props\" /><PropertyGroup><Trail>$(Trail)a</Trail></PropertyGroup></Project>"),
            ("build/b.props", "<Project><Import Project=\"a.props\" /><PropertyGroup><Trail>$(Trail)b</Trail></PropertyGroup></Project>"),
            (Lib, Sdk("<Import Project=\"../../build/a.props\" />"))));

        Assert.Equal("ba", project.Value("Trail"));
        Assert.Equal(["build/a.props", "build/b.props"], project.Imports);
    }

    [Fact]
    public void ImportChainDeeperThanTheBound_StopsWithNote()
    {
        var files = new List<(string, string)> { (Lib, Sdk("<Import Project=\"../../build/0.props\" />")) };
        for (var i = 0; i < 40; i++)
        {
            files.Add(($"build/{i}.props", $"<Project><Import Project=\"{i + 1}.props\" /><PropertyGroup><Depth>{i}</Depth></PropertyGroup></Project>"));
        }

        var project = Single(Read([.. files]));

        Assert.Equal(32, project.Imports.Count);
        Assert.Contains(project.Unevaluated, n => n.Contains("nested deeper than 32", StringComparison.Ordinal));
    }

    [Fact]
    public void SelfDoublingProperty_StopsAtTheLengthBound()
    {
        var doubling = string.Concat(Enumerable.Repeat("<Blob>$(Blob)$(Blob)</Blob>", 40));
        var project = Single(Read((Lib, Sdk($"<PropertyGroup><Blob>x</Blob>{doubling}</PropertyGroup>"))));

        var blob = project.Property("Blob")!;
        Assert.True(blob.Value.Length <= 64 * 1024);
        Assert.Contains("grows beyond", blob.Unevaluated, StringComparison.Ordinal);
    }

    [Fact]
    public void ReservedProperties_UseTheFakeRoot_AndExistsMapsBackToTheTree()
    {
        var project = Single(Read(
            ("build/shared.props", """
                <Project>
                  <PropertyGroup>
                    <FromImport>$(MSBuildThisFileDirectory)|$(MSBuildThisFile)|$(MSBuildProjectDirectory)|$(MSBuildProjectName)|$(MSBuildProjectExtension)</FromImport>
                    <SeesReadme Condition="Exists('$(MSBuildThisFileDirectory)../README.md')">yes</SeesReadme>
                  </PropertyGroup>
                </Project>
                """),
            ("README.md", "# Bramble.Sketches"),
            (Lib, Sdk("<Import Project=\"$(MSBuildProjectDirectory)/../../build/shared.props\" /><PropertyGroup><MSBuildProjectName>Other</MSBuildProjectName></PropertyGroup>"))));

        Assert.Equal("/repo/build/|shared.props|/repo/src/Bramble.Sketches|Bramble.Sketches|.csproj", project.Value("FromImport"));
        Assert.Equal("yes", project.Value("SeesReadme"));
        Assert.Null(project.Property("MSBuildProjectName"));
        Assert.Contains(project.Unevaluated, n => n.Contains("reserved property", StringComparison.Ordinal));
    }

    [Fact]
    public void BuildTargetsVersionPrefix_AfterTheSdkComputedVersion_ReportsTheSdkValue()
    {
        // dotnet msbuild agrees (oracle layout "build-targets-prefix-too-late"): the package is 1.0.0, not 4.0.0.
        var project = Single(Read(
            ("Directory.Build.targets", "<Project><PropertyGroup><VersionPrefix>4.0.0</VersionPrefix></PropertyGroup></Project>"),
            (Lib, "<Project Sdk=\"Microsoft.NET.Sdk\">\n</Project>")));

        var declared = DeclaredVersion.Of(project);
        Assert.Equal("1.0.0", declared.Value);
        Assert.NotNull(project.Property(declared.Property!)!.ComputedBy);
        Assert.Equal("4.0.0", project.Value("VersionPrefix"));
    }

    [Fact]
    public void SdkDefaults_NotReportedWhenTheDeclarationsAlreadyGiveTheVersion()
    {
        var plain = Single(Read((Lib, Sdk("<PropertyGroup><Version>2.4.0</Version></PropertyGroup>"))));
        var nothing = Single(Read((Lib, Sdk(string.Empty))));

        Assert.Equal(["Version"], plain.Properties.Keys);
        Assert.Empty(nothing.Properties);
        Assert.Null(DeclaredVersion.Of(nothing).Value);
    }

    [Fact]
    public void EvaluationOrder_ImportsListedPropsThenPackagesThenTargets()
    {
        var project = Single(Read(
            ("Directory.Build.props", "<Project />"),
            ("src/Directory.Packages.props", "<Project />"),
            ("Directory.Build.targets", "<Project />"),
            (Lib, Sdk(string.Empty))));

        Assert.Equal(["Directory.Build.props", "src/Directory.Packages.props", "Directory.Build.targets"], project.Imports);
    }

    [Fact]
    public void OneProjectFailing_DoesNotStopTheOthers()
    {
        var model = Read(
            ("a/A.csproj", "<Project Sdk=\"Microsoft.NET.Sdk\"><PropertyGroup><Version>1.0.0</Version></PropertyGroup></Project>"),
            ("b/B.csproj", "<Project Sdk=\"Microsoft.NET.Sdk\"><PropertyGroup>"));

        Assert.Equal("a/A.csproj", Assert.Single(model.Projects).Path);
        Assert.Equal("b/B.csproj", Assert.Single(model.Problems).Path);
    }

    [Fact]
    public void MangledProjectTrees_NeverReachAnInternalError()
    {
        // Every oracle layout, cut and spliced with MSBuild syntax at seeded random places: whatever comes out,
        // the reader answers with projects, notes and problems, never with an exception of its own.
        string[] splices = ["$(", "$([MSBuild]::GetPathOfFileAbove(", "'", "(", ")", "@(", "%(", "<", "\"", " and ", "!", "==", "%3B", "$(X.StartsWith(", "<Import Project=\"*.props\" />"];
        var random = new Random(20261201);
        for (var round = 0; round < 300; round++)
        {
            var layout = OracleLayouts.All.Values.ElementAt(random.Next(OracleLayouts.All.Count));
            var files = layout.Files.ToDictionary(f => f.Key, f => f.Value);
            var path = files.Keys.ElementAt(random.Next(files.Count));
            var text = files[path];
            var at = random.Next(text.Length);
            files[path] = random.Next(3) switch
            {
                0 => text[..at] + splices[random.Next(splices.Length)] + text[at..],
                1 => text[..at] + text[Math.Min(text.Length, at + random.Next(1, 40))..],
                _ => text[..at] + text[random.Next(text.Length)..],
            };

            var model = new StaticProjectReader().Read(new InMemoryFileTree(files));

            Assert.DoesNotContain(model.Problems, p => p.Message.Contains("could not be evaluated statically", StringComparison.Ordinal));
        }
    }

    private static ProjectModel Read(params (string Path, string Text)[] files) =>
        new StaticProjectReader().Read(new InMemoryFileTree(files.Select(f => KeyValuePair.Create(f.Path, f.Text))));

    private static ProjectInfo Single(ProjectModel model)
    {
        Assert.Empty(model.Problems);
        return Assert.Single(model.Projects);
    }

    private static string Sdk(string body) => $"<Project Sdk=\"Microsoft.NET.Sdk\">{body}</Project>";
}
