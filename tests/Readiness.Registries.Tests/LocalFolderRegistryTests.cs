using Readiness.Core.Engine;
using Readiness.Testing;

namespace Readiness.Registries.Tests;

public class LocalFolderRegistryTests
{
    [Fact]
    public async Task FlatLayout_ListsNormalisedVersionsAndTheNuspecSpelling()
    {
        using var feed = new LocalFeedBuilder()
            .AddFlat("Bramble.Sketches", "2.3.0")
            .AddFlat("Bramble.Sketches", "1.0")
            .AddFlat("Bramble.Sketches", "2.4.0-beta.1");
        var registry = new LocalFolderRegistry(feed.Folder);

        var lookup = await registry.LookupAsync("bramble.sketches", CancellationToken.None);

        Assert.True(lookup.Exists);
        Assert.Equal("Bramble.Sketches", lookup.RegistryId);
        // 1.0 normalises to 1.0.0 (package-versioning doc, standards.md oracle 3).
        Assert.Equal(["1.0.0", "2.3.0", "2.4.0-beta.1"], lookup.Versions.Select(v => v.Version));
        Assert.All(lookup.Versions, v => Assert.Null(v.Listed));
    }

    [Fact]
    public async Task HierarchicalLayout_ListsVersions()
    {
        using var feed = new LocalFeedBuilder()
            .AddHierarchical("Bramble.Sketches", "2.3.0")
            .AddHierarchical("Bramble.Sketches", "2.3.1");

        // VersionFolderPathResolver lowercases the id folder (standards.md §4).
        Assert.True(Directory.Exists(Path.Combine(feed.Folder, "bramble.sketches", "2.3.1")));
        var lookup = await new LocalFolderRegistry(feed.Folder).LookupAsync("Bramble.Sketches", CancellationToken.None);

        Assert.Equal(["2.3.0", "2.3.1"], lookup.Versions.Select(v => v.Version));
        Assert.Equal("Bramble.Sketches", lookup.RegistryId);
    }

    [Fact]
    public async Task FileNameThatLooksLikeAnotherId_IsDecidedByItsNuspec()
    {
        // Bramble.Sketches.3.1.0.0.nupkg reads as "Bramble.Sketches 3.1.0.0" by name alone; its nuspec says
        // Bramble.Sketches.3 1.0.0 (LocalFolderUtility filters on the nuspec id).
        using var feed = new LocalFeedBuilder()
            .AddFlat("Bramble.Sketches.3", "1.0.0")
            .AddFlat("Bramble.Sketches", "2.0.0");

        var lookup = await new LocalFolderRegistry(feed.Folder).LookupAsync("Bramble.Sketches", CancellationToken.None);

        Assert.Equal(["2.0.0"], lookup.Versions.Select(v => v.Version));
    }

    [Fact]
    public async Task UnknownId_DoesNotExist()
    {
        using var feed = new LocalFeedBuilder().AddFlat("Bramble.Sketches", "1.0.0");

        var lookup = await new LocalFolderRegistry(feed.Folder).LookupAsync("Bramble.Sketches.Lanternfly3", CancellationToken.None);

        Assert.True(lookup.Available);
        Assert.False(lookup.Exists);
    }

    [Fact]
    public async Task MissingFolder_IsAProblemNamingIt()
    {
        var folder = Path.Combine(Path.GetTempPath(), "readiness-missing-" + Guid.NewGuid().ToString("N"));

        var facts = await RegistryPhase.GatherAsync(new LocalFolderRegistry(folder), ["Bramble.Sketches"], TimeSpan.FromSeconds(5), CancellationToken.None);

        Assert.Contains("does not exist", facts.Find("Bramble.Sketches")!.Problem, StringComparison.Ordinal);
        Assert.NotNull(facts.Unavailable);
    }

    [Theory]
    [InlineData("../Bramble.Sketches")]
    [InlineData(".Foo")]
    [InlineData("Foo.")]
    [InlineData("Foo..Bar")]
    [InlineData("Foo Bar")]
    public async Task InvalidId_IsRefusedBeforeAnyPathIsBuilt(string id)
    {
        // PackageIdValidator (standards.md oracle 7): these are not package ids.
        using var feed = new LocalFeedBuilder();

        await Assert.ThrowsAsync<FeedException>(() => new LocalFolderRegistry(feed.Folder).LookupAsync(id, CancellationToken.None));
    }

    [Fact]
    public async Task IdOfOneHundredAndOneCharacters_IsRefused()
    {
        using var feed = new LocalFeedBuilder();

        // nuspec doc and PackageIdValidator.MaxPackageIdLength: at most 100 characters (standards.md oracle 7).
        await Assert.ThrowsAsync<FeedException>(() => new LocalFolderRegistry(feed.Folder).LookupAsync(new string('a', 101), CancellationToken.None));
    }

    [Theory]
    [InlineData("Contoso.Utility.UsefulStuff")]
    [InlineData("My_Pkg-2")]
    public async Task ValidId_IsLookedUp(string id)
    {
        // PackageIdValidator (standards.md oracle 7): valid ids.
        using var feed = new LocalFeedBuilder();

        var lookup = await new LocalFolderRegistry(feed.Folder).LookupAsync(id, CancellationToken.None);

        Assert.False(lookup.Exists);
    }
}
