using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Testing;

namespace Readiness.Registries.Tests;

public class RegistryFactoryTests
{
    private static readonly RegistryOptions Options = new() { NuGetConfigFile = EmptyNuGetConfig.Path };

    [Fact]
    public void HttpAddress_IsACachedFeed()
    {
        var registry = RegistryFactory.Create("https://feed.bramblecote.example/v3/index.json", Options);

        Assert.IsType<DiskCachedRegistry>(registry);
        Assert.Equal("https://feed.bramblecote.example/v3/index.json", registry.Source);
    }

    [Fact]
    public void HttpAddressWithNoCache_IsTheFeedItself()
    {
        Assert.IsType<NuGetFeedRegistry>(RegistryFactory.Create("https://feed.bramblecote.example/v3/index.json", Options with { NoCache = true }));
    }

    [Fact]
    public async Task FolderAndFileUrl_AreLocalFeeds()
    {
        using var feed = new LocalFeedBuilder().AddFlat("Bramble.Sketches", "1.0.0");

        var byPath = RegistryFactory.Create(feed.Folder, Options);
        var byUrl = RegistryFactory.Create(new Uri(feed.Folder).AbsoluteUri, Options);

        Assert.IsType<LocalFolderRegistry>(byPath);
        Assert.True((await byUrl.LookupAsync("Bramble.Sketches", CancellationToken.None)).Exists);
        Assert.Equal(byPath.Source, byUrl.Source);
    }

    [Fact]
    public void OtherScheme_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => RegistryFactory.Create("ftp://feed.bramblecote.example/packages", Options));
    }

    [Fact]
    public void Source_CommandLineThenConfigurationThenPublicFeed()
    {
        var config = new RepositoryConfigParser(new ChecklistParser(CheckIds.All))
            .Parse(RepositoryConfig.FileName, "publish-to: https://feed.bramblecote.example/v3/index.json\n");

        Assert.Equal("/srv/feed", RegistryFactory.ChooseSource("/srv/feed", config));
        Assert.Equal("https://feed.bramblecote.example/v3/index.json", RegistryFactory.ChooseSource(null, config));
        Assert.Equal("https://api.nuget.org/v3/index.json", RegistryFactory.ChooseSource(null, RepositoryConfig.Empty));
    }
}
