using Readiness.Core.Checks.Deps;
using Readiness.Core.Reports;
using Readiness.Testing;
using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Deps;

/// <summary>Packs every reference form once for the whole class (one dotnet invocation).</summary>
public sealed class PackedForms : IDisposable
{
    private const string Host = PackOracle.HostId;

    public PackedForms()
    {
        Oracle = new PackOracle();
        foreach (var (name, files) in Forms())
        {
            foreach (var (path, text) in files)
            {
                Oracle.Add($"{name}/{path}", text);
            }
        }

        Oracle.Pack();
    }

    public PackOracle Oracle { get; }

    /// <summary>Each form: a folder of its own with the project named after it (and any props files around it).</summary>
    public static IEnumerable<(string Name, (string Path, string Text)[] Files)> Forms()
    {
        static (string, string)[] One(string name, string items, string properties = "") => [($"{name}.csproj", PackOracle.Project(items, properties))];

        // 1. Attribute form, PrivateAssets="all".
        yield return ("AttributePrivate", One("AttributePrivate", $"<PackageReference Include=\"{Host}\" Version=\"3.1.0\" PrivateAssets=\"all\" />"));

        // 2. Child-element form, ExcludeAssets=runtime, odd case.
        yield return ("ChildExclude", One("ChildExclude", $"<PackageReference Include=\"{Host}\">\n      <Version>3.1.0</Version>\n      <excludeassets>Runtime</excludeassets>\n    </PackageReference>"));

        // 3. ExcludeAssets as a ; list holding runtime.
        yield return ("ExcludeList", One("ExcludeList", $"<PackageReference Include=\"{Host}\" Version=\"3.1.0\" ExcludeAssets=\"build ; runtime;analyzers\" />"));

        // 4. ExcludeAssets list without runtime: the host still flows.
        yield return ("ExcludeWithoutRuntime", One("ExcludeWithoutRuntime", $"<PackageReference Include=\"{Host}\" Version=\"3.1.0\" ExcludeAssets=\"build;analyzers\" />"));

        // 5. No asset metadata at all.
        yield return ("Plain", One("Plain", $"<PackageReference Include=\"{Host}\" Version=\"3.1.0\" />"));

        // 6. IncludeAssets=compile only.
        yield return ("IncludeCompile", One("IncludeCompile", $"<PackageReference Include=\"{Host}\" Version=\"3.1.0\" IncludeAssets=\"compile\" />"));

        // 7. PrivateAssets listing runtime only.
        yield return ("PrivateRuntime", One("PrivateRuntime", $"<PackageReference Include=\"{Host}\" Version=\"3.1.0\" PrivateAssets=\"runtime\" />"));

        // 8. Nothing included, or everything excluded.
        yield return ("IncludeNone", One("IncludeNone", $"<PackageReference Include=\"{Host}\" Version=\"3.1.0\" IncludeAssets=\"none\" />"));
        yield return ("ExcludeAll", One("ExcludeAll", $"<PackageReference Include=\"{Host}\" Version=\"3.1.0\" ExcludeAssets=\"All\" />"));

        // 9. Central versions: the asset metadata written on PackageVersion, none on the reference.
        yield return ("CentralIgnored", [
            ("Directory.Packages.props", $"<Project>\n  <PropertyGroup>\n    <ManagePackageVersionsCentrally>true</ManagePackageVersionsCentrally>\n  </PropertyGroup>\n  <ItemGroup>\n    <PackageVersion Include=\"{Host}\" Version=\"3.1.0\" PrivateAssets=\"all\" />\n  </ItemGroup>\n</Project>\n"),
            ("CentralIgnored.csproj", PackOracle.Project($"<PackageReference Include=\"{Host}\" />")),
        ]);

        // 10. Central versions with the metadata on the reference, where it belongs.
        yield return ("CentralOnReference", [
            ("Directory.Packages.props", $"<Project>\n  <PropertyGroup>\n    <ManagePackageVersionsCentrally>true</ManagePackageVersionsCentrally>\n  </PropertyGroup>\n  <ItemGroup>\n    <PackageVersion Include=\"{Host}\" Version=\"3.1.0\" />\n  </ItemGroup>\n</Project>\n"),
            ("CentralOnReference.csproj", PackOracle.Project($"<PackageReference Include=\"{Host}\" PrivateAssets=\"All\" />")),
        ]);

        // 11. A reference added by Directory.Build.props, without metadata, to a project that never names the host.
        yield return ("InheritedPlain", [
            ("Directory.Build.props", $"<Project>\n  <ItemGroup>\n    <PackageReference Include=\"{Host}\" Version=\"3.1.0\" />\n  </ItemGroup>\n</Project>\n"),
            ("InheritedPlain.csproj", PackOracle.Project("<Compile Remove=\"nothing\" />")),
        ]);

        // 12. The same, compile-only in Directory.Build.props.
        yield return ("InheritedExcluded", [
            ("Directory.Build.props", $"<Project>\n  <ItemGroup>\n    <PackageReference Include=\"{Host}\" Version=\"3.1.0\" ExcludeAssets=\"runtime\" />\n  </ItemGroup>\n</Project>\n"),
            ("InheritedExcluded.csproj", PackOracle.Project("<Compile Remove=\"nothing\" />")),
        ]);

        // 13. Inherited without metadata, fixed in the project with an Update item.
        yield return ("InheritedUpdated", [
            ("Directory.Build.props", $"<Project>\n  <ItemGroup>\n    <PackageReference Include=\"{Host}\" Version=\"3.1.0\" />\n  </ItemGroup>\n</Project>\n"),
            ("InheritedUpdated.csproj", PackOracle.Project($"<PackageReference Update=\"{Host}\" PrivateAssets=\"all\" />")),
        ]);
    }

    public void Dispose() => Oracle.Dispose();
}

/// <summary>
/// deps.host-compile-only agrees with NuGet: for each form, the check passes exactly when dotnet pack leaves the host
/// out of the nuspec or writes it with <c>exclude</c> holding <c>Runtime</c> (standards.md §5).
/// </summary>
[Trait("Category", "DotnetPack")]
public sealed class HostCompileOnlyPackTests(PackedForms packed) : IClassFixture<PackedForms>
{
    public static TheoryData<string> FormNames()
    {
        var data = new TheoryData<string>();
        foreach (var (name, _) in PackedForms.Forms())
        {
            data.Add(name);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(FormNames))]
    public void Check_AgreesWithDotnetPack(string form)
    {
        var nuspec = packed.Oracle.HostDependency[form];
        var compileOnlyPerNuGet = nuspec is null
            || nuspec.Split(',', StringSplitOptions.TrimEntries).Contains("Runtime", StringComparer.OrdinalIgnoreCase);

        var model = new Core.Projects.MsBuild.StaticProjectReader().Read(new InMemoryFileTree(packed.Oracle.Files));
        var project = Assert.Single(model.Projects, p => p.Name == form);
        var finding = Assert.Single(Run(new HostCompileOnlyCheck(), model, config: "host-packages: [\"Lanternfly.Host.*\"]\n"), f => f.Package == project.PackageId);

        Assert.True(
            (compileOnlyPerNuGet ? CheckStatus.Pass : CheckStatus.Fail) == finding.Status,
            $"{form}: nuspec dependency {(nuspec is null ? "omitted" : $"exclude=\"{nuspec}\"")}, check said {finding.Status}: {finding.Message}");
        Assert.NotEmpty(finding.Evidence!);
    }

    // The forms whose verdict the issue names, spelled out so a change in NuGet shows up here too.
    [Theory]
    [InlineData("AttributePrivate", null)]
    [InlineData("ChildExclude", "Runtime,Build,Analyzers")]
    [InlineData("Plain", "Build,Analyzers")]
    [InlineData("PrivateRuntime", "")]
    [InlineData("CentralIgnored", "Build,Analyzers")]
    [InlineData("InheritedPlain", "Build,Analyzers")]
    [InlineData("InheritedUpdated", null)]
    public void DotnetPack_WritesTheseDependencies(string form, string? exclude) =>
        Assert.Equal(exclude, packed.Oracle.HostDependency[form]);

    [Fact]
    public void CentralMetadataIgnored_HintNamesTheCentralFileAndLine()
    {
        var model = new Core.Projects.MsBuild.StaticProjectReader().Read(new InMemoryFileTree(packed.Oracle.Files));

        var finding = Assert.Single(Run(new HostCompileOnlyCheck(), model, config: "host-packages: [\"Lanternfly.Host.*\"]\n"), f => f.Package == "CentralIgnored");

        Assert.Contains("CentralIgnored/Directory.Packages.props:6", EvidenceText(finding));
        Assert.Contains("has no effect", finding.Hint, StringComparison.Ordinal);
    }
}
