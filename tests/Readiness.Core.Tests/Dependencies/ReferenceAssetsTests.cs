using Readiness.Core.Dependencies;
using Readiness.Testing;

namespace Readiness.Core.Tests.Dependencies;

// Expected values follow the NuGet documentation "Controlling dependency assets" and pack behaviour
// (standards.md §5): PrivateAssets=all leaves the dependency out of the nuspec; ExcludeAssets=runtime keeps it
// with exclude="Runtime,…"; the default PrivateAssets is contentfiles;analyzers;build. The DotnetPack tests hold
// the same forms against dotnet pack itself.
public sealed class ReferenceAssetsTests
{
    [Theory]
    [InlineData("PrivateAssets", "all", true, true)]
    [InlineData("PrivateAssets", "All", true, true)]
    [InlineData("privateassets", "ALL", true, true)]
    [InlineData("ExcludeAssets", "runtime", false, true)]
    [InlineData("ExcludeAssets", "Runtime;Build", false, true)]
    [InlineData("ExcludeAssets", " build ; runtime ", false, true)]
    [InlineData("ExcludeAssets", "all", true, true)]
    [InlineData("IncludeAssets", "compile", false, true)]
    [InlineData("IncludeAssets", "none", true, true)]
    [InlineData("PrivateAssets", "runtime", false, false)] // dotnet pack writes the dependency with no exclude at all
    [InlineData("ExcludeAssets", "build;analyzers", false, false)]
    [InlineData("PrivateAssets", "contentfiles;analyzers;build", false, false)]
    [InlineData("IncludeAssets", "compile;runtime", false, false)]
    public void Metadata_GivesPackBehaviour(string name, string value, bool omitted, bool compileOnly)
    {
        var assets = ReferenceAssets.From(ProjectFixtures.Meta((name, value)));

        Assert.Null(assets.Unevaluated);
        Assert.Equal(omitted, assets.IsOmitted);
        Assert.Equal(compileOnly, assets.IsCompileOnly);
    }

    [Fact]
    public void NoMetadata_FlowsRuntimeToConsumers()
    {
        var assets = ReferenceAssets.From(ProjectFixtures.Meta());

        Assert.False(assets.IsCompileOnly);
        Assert.Equal(AssetFlags.All, assets.Used);
        Assert.Equal(ReferenceAssets.DefaultPrivate, assets.Private);
    }

    [Fact]
    public void UnknownAssetName_IsUnevaluated()
    {
        var assets = ReferenceAssets.From(ProjectFixtures.Meta(("ExcludeAssets", "$(HostAssets)")));

        Assert.NotNull(assets.Unevaluated);
        Assert.Contains("$(HostAssets)", assets.Unevaluated, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("Lanternfly.Host.*", "Lanternfly.Host.Runtime", true)]
    [InlineData("Lanternfly.Host.*", "lanternfly.host.abstractions", true)]
    [InlineData("Lanternfly.Host.*", "Lanternfly.Hosting", false)]
    [InlineData("Lanternfly.Host.?untime", "Lanternfly.Host.Runtime", true)]
    [InlineData("Lanternfly.Host", "Lanternfly.Host.Runtime", false)]
    public void Patterns_MatchIdsCaseInsensitively(string pattern, string id, bool expected) =>
        Assert.Equal(expected, new PackagePatterns([pattern]).Matches(id));
}
