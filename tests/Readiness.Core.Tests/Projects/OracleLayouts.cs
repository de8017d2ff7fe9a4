namespace Readiness.Core.Tests.Projects;

/// <summary>
/// Project layouts whose evaluation the static reader must reproduce; the expected values come from MSBuild itself
/// at test time (<see cref="MsBuildOracle"/>), never from this file.
/// </summary>
internal static class OracleLayouts
{
    private const string Lib = "src/Bramble.Sketches/Bramble.Sketches.csproj";

    public static readonly IReadOnlyDictionary<string, OracleLayout> All = new Dictionary<string, OracleLayout>(StringComparer.Ordinal)
    {
        ["plain-version"] = new(Lib, Files((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <TargetFramework>net10.0</TargetFramework>
                <Version>2.4.0</Version>
                <PackageLicenseExpression>MIT</PackageLicenseExpression>
              </PropertyGroup>
            </Project>
            """))),

        ["no-version"] = new(Lib, Files((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <TargetFramework>net10.0</TargetFramework>
              </PropertyGroup>
            </Project>
            """))),

        ["prefix-and-suffix"] = new(Lib, Files((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <TargetFramework>net10.0</TargetFramework>
                <VersionPrefix>3.1.0</VersionPrefix>
                <VersionSuffix>rc.1</VersionSuffix>
              </PropertyGroup>
            </Project>
            """))),

        ["suffix-only"] = new(Lib, Files((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <TargetFramework>net10.0</TargetFramework>
                <VersionSuffix>preview.2</VersionSuffix>
              </PropertyGroup>
            </Project>
            """))),

        ["build-props-nearest-only"] = new(Lib, Files(
            ("Directory.Build.props", """
                <Project>
                  <PropertyGroup>
                    <Version>9.9.9</Version>
                    <PackageLicenseExpression>Apache-2.0</PackageLicenseExpression>
                  </PropertyGroup>
                </Project>
                """),
            ("src/Directory.Build.props", """
                <Project>
                  <PropertyGroup>
                    <Authors>Bramblecote Software</Authors>
                    <PackageLicenseExpression>MIT</PackageLicenseExpression>
                  </PropertyGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                </Project>
                """))),

        ["build-props-chain-path-of-file-above"] = new(Lib, Files(
            ("Directory.Build.props", """
                <Project>
                  <PropertyGroup>
                    <Version>2.3.4</Version>
                    <PackageLicenseExpression>Apache-2.0</PackageLicenseExpression>
                  </PropertyGroup>
                </Project>
                """),
            ("src/Directory.Build.props", """
                <Project>
                  <Import Project="$([MSBuild]::GetPathOfFileAbove('Directory.Build.props', '$(MSBuildThisFileDirectory)../'))" />
                  <PropertyGroup>
                    <PackageLicenseExpression>MIT</PackageLicenseExpression>
                  </PropertyGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                </Project>
                """))),

        ["build-props-chain-directory-name-fsproj"] = new("src/Lanternfly.Host.Core/Lanternfly.Host.Core.fsproj", Files(
            ("Directory.Build.props", """
                <Project>
                  <PropertyGroup>
                    <VersionPrefix>0.9.0</VersionPrefix>
                  </PropertyGroup>
                </Project>
                """),
            ("src/Directory.Build.props", """
                <Project>
                  <Import Project="$([MSBuild]::GetDirectoryNameOfFileAbove($(MSBuildThisFileDirectory).., Directory.Build.props))/Directory.Build.props" />
                  <PropertyGroup>
                    <VersionSuffix>alpha</VersionSuffix>
                  </PropertyGroup>
                </Project>
                """),
            ("src/Lanternfly.Host.Core/Lanternfly.Host.Core.fsproj", """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                </Project>
                """))),

        ["build-targets-after-project"] = new(Lib, Files(
            ("Directory.Build.targets", """
                <Project>
                  <PropertyGroup>
                    <Version>3.0.0</Version>
                  </PropertyGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                    <Version>1.0.0</Version>
                  </PropertyGroup>
                </Project>
                """))),

        ["build-targets-prefix-too-late"] = new(Lib, Files(
            ("Directory.Build.targets", """
                <Project>
                  <PropertyGroup>
                    <VersionPrefix>4.0.0</VersionPrefix>
                  </PropertyGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                </Project>
                """))),

        ["build-targets-conditional-defaults"] = new(Lib, Files(
            ("Directory.Build.targets", """
                <Project>
                  <PropertyGroup>
                    <Version Condition="'$(Version)' == ''">5.0.0</Version>
                    <PackageVersion Condition="'$(PackageVersion)' == ''">6.0.0</PackageVersion>
                  </PropertyGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                </Project>
                """))),

        ["version-from-properties"] = new(Lib, Files(
            ("Directory.Build.props", """
                <Project>
                  <PropertyGroup>
                    <Major>2</Major>
                    <Minor>5</Minor>
                  </PropertyGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                    <Patch>7</Patch>
                    <VersionPrefix>$(Major).$(Minor).$(Patch)</VersionPrefix>
                    <VersionSuffix Condition="'$(Channel)' != ''">$(Channel)</VersionSuffix>
                  </PropertyGroup>
                </Project>
                """))),

        ["self-referencing"] = new(Lib, Files(
            ("Directory.Build.props", """
                <Project>
                  <PropertyGroup>
                    <Flavors>ALPHA</Flavors>
                  </PropertyGroup>
                </Project>
                """),
            ("Directory.Build.targets", """
                <Project>
                  <PropertyGroup>
                    <Flavors>$(Flavors);GAMMA</Flavors>
                  </PropertyGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                    <Flavors>$(Flavors);BETA</Flavors>
                    <Version>1.0.$(Flavors.Length)</Version>
                  </PropertyGroup>
                </Project>
                """)),
            Extra: ["Flavors"]),

        ["forward-reference"] = new(Lib, Files((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <TargetFramework>net10.0</TargetFramework>
                <Version>$(ReleaseVersion)</Version>
                <ReleaseVersion>7.0.0</ReleaseVersion>
              </PropertyGroup>
              <ItemGroup>
                <PackageReference Include="Bramble.Ink" Version="$(ReleaseVersion)" />
              </ItemGroup>
            </Project>
            """))),

        ["conditions"] = new(Lib, Files((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <TargetFramework>net10.0</TargetFramework>
                <Flavor>Studio</Flavor>
                <NetVersion>8.0</NetVersion>
              </PropertyGroup>
              <PropertyGroup Condition="'$(Flavor)' == 'studio' and !('$(Edition)' == 'lite')">
                <VersionPrefix>5.1.0</VersionPrefix>
              </PropertyGroup>
              <PropertyGroup Condition=" ('$(Flavor)' == 'Home' or '$(NetVersion)' &gt;= '8.0') and '$(Flavor)' != '' ">
                <VersionSuffix>beta.3</VersionSuffix>
              </PropertyGroup>
              <PropertyGroup>
                <PackageLicenseExpression Condition="10 &gt; 9 and '1.2' &lt; '1.10.0'">MIT</PackageLicenseExpression>
                <PackageLicenseExpression Condition="'$(Flavor)' == 'STUDIO' and 'on' == 'true' and '1.0' == '1.00'">Apache-2.0</PackageLicenseExpression>
                <IsPackable Condition="!true or '0x10' != '16' or $(Flavor) == Home">false</IsPackable>
                <Painter Condition="'$(Flavor)' == 'Home' and $([System.IO.File]::ReadAllText('/missing/file'))">never</Painter>
                <Gallery Condition="'$(Flavor)' == 'Studio' or $([System.IO.File]::ReadAllText('/missing/file'))">north</Gallery>
              </PropertyGroup>
            </Project>
            """)),
            Extra: ["Painter", "Gallery"]),

        ["exists-rules"] = new("src/Bramble.Paper/Bramble.Paper.csproj", Files(
            ("build/marker.txt", "marker"),
            ("build/common.props", """
                <Project>
                  <!-- A PropertyGroup's condition resolves Exists() against this file's folder... -->
                  <PropertyGroup Condition="Exists('marker.txt')">
                    <PackageLicenseExpression>MIT</PackageLicenseExpression>
                  </PropertyGroup>
                  <PropertyGroup>
                    <!-- ...a property's own condition against the project's folder. -->
                    <VersionPrefix Condition="Exists('here.txt')">1.4.0</VersionPrefix>
                    <VersionSuffix Condition="Exists('marker.txt')">never</VersionSuffix>
                    <Authors Condition="Exists('docs') and !Exists('docs/missing.md')">Bramblecote Software</Authors>
                  </PropertyGroup>
                </Project>
                """),
            ("src/Bramble.Paper/here.txt", "here"),
            ("src/Bramble.Paper/docs/guide.md", "# Guide"),
            ("src/Bramble.Paper/Bramble.Paper.csproj", """
                <Project Sdk="Microsoft.NET.Sdk">
                  <Import Project="../../build/common.props" />
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                </Project>
                """)),
            Extra: ["Authors"]),

        ["imports"] = new(Lib, Files(
            ("Directory.Build.props", """
                <Project>
                  <Import Project="build/versions.props" Condition="Exists('build/versions.props')" />
                  <Import Project="build/absent.props" Condition="Exists('build/absent.props')" />
                </Project>
                """),
            ("build/versions.props", """
                <Project>
                  <PropertyGroup>
                    <VersionPrefix>6.2.0</VersionPrefix>
                  </PropertyGroup>
                  <Import Project="more/*.props" />
                </Project>
                """),
            ("build/more/a.props", """
                <Project>
                  <PropertyGroup>
                    <VersionSuffix>a</VersionSuffix>
                  </PropertyGroup>
                </Project>
                """),
            ("build/more/b.props", """
                <Project>
                  <Import Project="../versions.props" />
                  <PropertyGroup>
                    <VersionSuffix>$(VersionSuffix)b</VersionSuffix>
                  </PropertyGroup>
                </Project>
                """),
            ("src/shared/license.props", """
                <Project>
                  <PropertyGroup>
                    <PackageLicenseExpression>MIT</PackageLicenseExpression>
                  </PropertyGroup>
                </Project>
                """),
            ("src/shared/tags.props", """
                <Project>
                  <PropertyGroup>
                    <PackageTags>ink;sketch</PackageTags>
                  </PropertyGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <Import Project="$(MSBuildProjectDirectory)/../shared/license.props" />
                  <Import Project="$(MSBuildThisFileDirectory)missing.props" Condition="Exists('$(MSBuildThisFileDirectory)missing.props')" />
                  <ImportGroup Condition="'$(VersionPrefix)' == '6.2.0'">
                    <Import Project="..\shared\tags.props" />
                  </ImportGroup>
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                </Project>
                """)),
            Extra: ["PackageTags"]),

        ["central-versions"] = new(Lib, Files(
            ("Directory.Packages.props", """
                <Project>
                  <PropertyGroup>
                    <ManagePackageVersionsCentrally>true</ManagePackageVersionsCentrally>
                  </PropertyGroup>
                  <ItemGroup>
                    <PackageVersion Include="Bramble.Ink" Version="1.2.3" />
                    <PackageVersion Include="Lanternfly.Host.Abstractions" Version="[2.0.0, 3.0.0)" />
                    <PackageVersion Include="Bramble.Analyzers" Version="0.4.0" />
                    <GlobalPackageReference Include="Bramble.Build.Tools" Version="1.0.1" />
                  </ItemGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                    <Version>1.0.0</Version>
                  </PropertyGroup>
                  <ItemGroup>
                    <PackageReference Include="Bramble.Ink" />
                    <PackageReference Include="lanternfly.host.abstractions" VersionOverride="2.5.0" />
                    <PackageReference Include="Bramble.Analyzers">
                      <PrivateAssets>all</PrivateAssets>
                      <IncludeAssets>runtime; build; native; contentfiles; analyzers</IncludeAssets>
                    </PackageReference>
                  </ItemGroup>
                </Project>
                """))),

        ["central-nearest-and-chain"] = new(Lib, Files(
            ("Directory.Packages.props", """
                <Project>
                  <PropertyGroup>
                    <ManagePackageVersionsCentrally>true</ManagePackageVersionsCentrally>
                  </PropertyGroup>
                  <ItemGroup>
                    <PackageVersion Include="Bramble.Ink" Version="1.0.0" />
                    <PackageVersion Include="Bramble.Paper" Version="3.0.0" />
                  </ItemGroup>
                </Project>
                """),
            ("src/Directory.Packages.props", """
                <Project>
                  <Import Project="$([MSBuild]::GetPathOfFileAbove(Directory.Packages.props, $(MSBuildThisFileDirectory)..))" />
                  <ItemGroup>
                    <PackageVersion Update="Bramble.Ink" Version="1.1.0" />
                  </ItemGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                  <ItemGroup>
                    <PackageReference Include="Bramble.Ink" />
                    <PackageReference Include="Bramble.Paper" />
                  </ItemGroup>
                </Project>
                """))),

        ["multi-target-outer"] = new(Lib, MultiTarget()),
        ["multi-target-inner-net8"] = new(Lib, MultiTarget(), TargetFramework: "net8.0", Extra: ["Flavors"]),
        ["multi-target-inner-net10"] = new(Lib, MultiTarget(), TargetFramework: "net10.0", Extra: ["Flavors"]),

        ["target-framework-and-frameworks"] = new(Lib, Files((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <TargetFrameworks>net8.0;net10.0</TargetFrameworks>
                <TargetFramework>net10.0</TargetFramework>
                <PackageLicenseExpression Condition="'$(TargetFramework)' == 'net10.0'">MIT</PackageLicenseExpression>
              </PropertyGroup>
            </Project>
            """))),

        ["choose"] = new(Lib, Files((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <TargetFramework>net10.0</TargetFramework>
                <Channel>preview</Channel>
              </PropertyGroup>
              <Choose>
                <When Condition="'$(Channel)' == 'stable'">
                  <PropertyGroup>
                    <VersionPrefix>1.0.0</VersionPrefix>
                  </PropertyGroup>
                </When>
                <When Condition="'$(Channel)' == 'preview'">
                  <PropertyGroup>
                    <VersionPrefix>0.8.0</VersionPrefix>
                    <VersionSuffix>preview.1</VersionSuffix>
                  </PropertyGroup>
                  <ItemGroup>
                    <PackageReference Include="Bramble.Preview" Version="0.1.0" />
                  </ItemGroup>
                </When>
                <Otherwise>
                  <PropertyGroup>
                    <VersionPrefix>0.0.1</VersionPrefix>
                  </PropertyGroup>
                </Otherwise>
              </Choose>
            </Project>
            """))),

        ["references-and-pack-items"] = new("src/Bramble.Sketches/Bramble.Sketches.csproj", Files(
            ("README.md", "# Bramble.Sketches"),
            ("src/Directory.Build.props", """
                <Project>
                  <ItemGroup>
                    <None Include="$(MSBuildThisFileDirectory)../README.md" Pack="true" PackagePath="\" />
                  </ItemGroup>
                </Project>
                """),
            ("src/Bramble.Sketches/icon.png", "png"),
            ("src/Bramble.Sketches/notes/extra.txt", "notes"),
            ("src/Bramble.Sketches/.hidden/skip.txt", "hidden"),
            ("src/Bramble.Ink/Bramble.Ink.csproj", """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                </Project>
                """),
            ("src/Bramble.Sketches/Bramble.Sketches.csproj", """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                  <ItemGroup>
                    <ProjectReference Include="..\Bramble.Ink\Bramble.Ink.csproj" PrivateAssets="all" />
                    <ProjectReference Include="../Lanternfly.Host.Core/Lanternfly.Host.Core.csproj">
                      <ReferenceOutputAssembly>false</ReferenceOutputAssembly>
                    </ProjectReference>
                    <None Update="icon.png" Pack="true" PackagePath="" />
                    <None Update=".hidden/skip.txt" Pack="true" />
                    <Content Include="notes/extra.txt" Pack="true" PackagePath="content/notes" />
                  </ItemGroup>
                </Project>
                """))),

        ["item-operations"] = new(Lib, Files(
            ("src/Directory.Build.props", """
                <Project>
                  <ItemDefinitionGroup>
                    <PackageReference>
                      <PrivateAssets>contentfiles;analyzers</PrivateAssets>
                    </PackageReference>
                  </ItemDefinitionGroup>
                  <ItemGroup>
                    <PackageReference Include="Bramble.Analyzers" Version="0.4.0" />
                  </ItemGroup>
                </Project>
                """),
            (Lib, """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                  <ItemGroup>
                    <PackageReference Include="Bramble.Ink;Bramble.Paper" Version="2.0.0" />
                    <PackageReference Update="bramble.analyzers" PrivateAssets="all" />
                    <PackageReference Remove="Bramble.Paper" />
                    <PackageReference Include="Bramble.Tools" Version="1.0.0" ExcludeAssets="runtime">
                      <includeassets>compile</includeassets>
                      <Aliases Condition="'$(TargetFramework)' == 'net8.0'">legacy</Aliases>
                    </PackageReference>
                  </ItemGroup>
                </Project>
                """))),

        ["test-project"] = new("tests/Bramble.Sketches.Tests/Bramble.Sketches.Tests.csproj", Files(
            ("tests/Bramble.Sketches.Tests/Bramble.Sketches.Tests.csproj", """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                    <IsTestProject>true</IsTestProject>
                  </PropertyGroup>
                  <ItemGroup>
                    <PackageReference Include="Microsoft.NET.Test.Sdk" Version="18.0.1" />
                  </ItemGroup>
                </Project>
                """))),

        ["values-as-written"] = new(Lib, Files((Lib, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <TargetFramework>net10.0</TargetFramework>
                <Version>3.0.0</Version>
                <Description>
                  Sketches   for Bramblecote
                </Description>
                <PackageTags>ink%3Bsketch</PackageTags>
                <Title><![CDATA[Bramble & Sketches]]></Title>
                <Summary>$(Title) %24(Title)</Summary>
              </PropertyGroup>
            </Project>
            """)),
            Extra: ["Description", "PackageTags", "Title", "Summary"]),

        ["property-functions"] = new("tests/Lanternfly.Host.Tests/Lanternfly.Host.Tests.csproj", Files(
            ("tests/Lanternfly.Host.Tests/Lanternfly.Host.Tests.csproj", """
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net8.0</TargetFramework>
                    <IsPackable Condition="$(MSBuildProjectName.EndsWith('.Tests'))">false</IsPackable>
                    <Flavor Condition="$([MSBuild]::IsTargetFrameworkCompatible('$(TargetFramework)', 'net6.0'))">modern</Flavor>
                    <Family>$([MSBuild]::GetTargetFrameworkIdentifier('$(TargetFramework)'))</Family>
                    <FamilyVersion>$([MSBuild]::GetTargetFrameworkVersion('$(TargetFramework)'))</FamilyVersion>
                    <VersionPrefix Condition="$([MSBuild]::VersionGreaterThanOrEquals('$(FamilyVersion)', '8.0'))">8.1.0</VersionPrefix>
                    <Lowered>$(MSBuildProjectName.ToLowerInvariant())</Lowered>
                    <Picked>$([MSBuild]::ValueOrDefault('$(Flavor)', 'fallback'))</Picked>
                  </PropertyGroup>
                </Project>
                """)),
            Extra: ["Flavor", "Family", "FamilyVersion", "Lowered", "Picked"]),

        ["explicit-sdk-imports"] = new(Lib, Files(
            ("Directory.Build.props", """
                <Project>
                  <PropertyGroup>
                    <VersionPrefix>0.2.0</VersionPrefix>
                  </PropertyGroup>
                </Project>
                """),
            (Lib, """
                <Project>
                  <PropertyGroup>
                    <VersionPrefix>0.1.0</VersionPrefix>
                  </PropertyGroup>
                  <Import Project="Sdk.props" Sdk="Microsoft.NET.Sdk" />
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                    <VersionSuffix>dev</VersionSuffix>
                  </PropertyGroup>
                  <Import Project="Sdk.targets" Sdk="Microsoft.NET.Sdk" />
                  <PropertyGroup>
                    <VersionSuffix>late</VersionSuffix>
                    <PackageLicenseExpression>MIT</PackageLicenseExpression>
                  </PropertyGroup>
                </Project>
                """))),
    };

    private static IReadOnlyDictionary<string, string> MultiTarget() => Files((Lib, """
        <Project Sdk="Microsoft.NET.Sdk">
          <PropertyGroup>
            <TargetFrameworks>net8.0;net10.0</TargetFrameworks>
            <Version>1.5.0</Version>
            <Flavors>base</Flavors>
          </PropertyGroup>
          <PropertyGroup Condition="'$(TargetFramework)' == 'net8.0'">
            <PackageLicenseExpression>MIT</PackageLicenseExpression>
            <Flavors>$(Flavors);legacy</Flavors>
          </PropertyGroup>
          <ItemGroup Condition="'$(TargetFramework)' == 'net8.0'">
            <PackageReference Include="Bramble.Compat" Version="1.0.0" />
          </ItemGroup>
          <ItemGroup>
            <PackageReference Include="Bramble.Ink" Version="2.0.0" />
            <PackageReference Include="Bramble.Paper" Version="3.0.0" Condition="'$(TargetFramework)' != 'net8.0'" />
          </ItemGroup>
        </Project>
        """));

    private static Dictionary<string, string> Files(params (string Path, string Text)[] files) =>
        files.ToDictionary(f => f.Path, f => f.Text, StringComparer.Ordinal);
}
