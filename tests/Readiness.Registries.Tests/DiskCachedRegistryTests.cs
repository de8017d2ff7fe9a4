using Readiness.Core.Registry;
using Readiness.Testing;

namespace Readiness.Registries.Tests;

public sealed class DiskCachedRegistryTests : IDisposable
{
    private static readonly DateTimeOffset Start = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);
    private readonly LocalFeedBuilder cacheFolder = new();
    private readonly ManualTimeProvider clock = new(Start);

    public void Dispose() => cacheFolder.Dispose();

    private RegistryOptions Options(bool noCache = false) => new()
    {
        NoCache = noCache,
        CacheFolder = cacheFolder.Folder,
        TimeProvider = clock,
        NuGetConfigFile = EmptyNuGetConfig.Path,
        AskOwners = true,
    };

    private static int FlatRequests(LocalHttpFeed feed) => feed.Requests.Count(r => r.StartsWith("/v3-flatcontainer/", StringComparison.Ordinal));

    [Fact]
    public async Task SecondRunWithinTimeToLive_AsksNoFeed()
    {
        using var feed = LocalHttpFeed.Start().Add("Bramble.Sketches", "2.3.0", listed: false).Owners("Bramble.Sketches", "bramblecote");
        PackageLookup first;
        using (var registry = (IDisposable)RegistryFactory.Create(feed.ServiceIndexUrl, Options()))
        {
            first = await ((IPackageRegistry)registry).LookupAsync("Bramble.Sketches", CancellationToken.None);
        }

        var before = feed.Requests.Count;
        clock.Advance(TimeSpan.FromMinutes(9));
        var second = await RegistryFactory.Create(feed.ServiceIndexUrl, Options()).LookupAsync("bramble.sketches", CancellationToken.None);

        Assert.Equal(before, feed.Requests.Count);
        Assert.Equal("bramble.sketches", second.Id);
        Assert.Equal(first.RegistryId, second.RegistryId);
        Assert.Equal(first.Versions, second.Versions);
        Assert.Equal(["bramblecote"], second.Owners!);
    }

    [Fact]
    public async Task AfterTimeToLive_AsksTheFeedAgain()
    {
        using var feed = LocalHttpFeed.Start().Add("Bramble.Sketches", "2.3.0");
        await RegistryFactory.Create(feed.ServiceIndexUrl, Options()).LookupAsync("Bramble.Sketches", CancellationToken.None);
        feed.Add("Bramble.Sketches", "2.4.0");

        clock.Advance(RegistryOptions.DefaultCacheTimeToLive);
        var lookup = await RegistryFactory.Create(feed.ServiceIndexUrl, Options()).LookupAsync("Bramble.Sketches", CancellationToken.None);

        Assert.Equal(2, FlatRequests(feed));
        Assert.Equal(["2.3.0", "2.4.0"], lookup.Versions.Select(v => v.Version));
    }

    [Fact]
    public async Task NoCache_AsksTheFeedEveryTimeAndWritesNothing()
    {
        using var feed = LocalHttpFeed.Start().Add("Bramble.Sketches", "2.3.0");

        await RegistryFactory.Create(feed.ServiceIndexUrl, Options(noCache: true)).LookupAsync("Bramble.Sketches", CancellationToken.None);
        await RegistryFactory.Create(feed.ServiceIndexUrl, Options(noCache: true)).LookupAsync("Bramble.Sketches", CancellationToken.None);

        Assert.Equal(2, FlatRequests(feed));
        Assert.Empty(Directory.EnumerateFiles(cacheFolder.Folder));
    }

    [Fact]
    public async Task Problems_AreNotCached()
    {
        using var feed = LocalHttpFeed.Start().Add("Bramble.Sketches", "2.3.0");
        feed.Fault = FeedFault.ServerError;
        feed.FaultPaths = "/v3-flatcontainer/";
        var failing = RegistryFactory.Create(feed.ServiceIndexUrl, Options());
        await Assert.ThrowsAsync<FeedException>(() => failing.LookupAsync("Bramble.Sketches", CancellationToken.None));

        feed.Fault = FeedFault.None;
        var lookup = await RegistryFactory.Create(feed.ServiceIndexUrl, Options()).LookupAsync("Bramble.Sketches", CancellationToken.None);

        Assert.True(lookup.Exists);
        Assert.Equal(2, FlatRequests(feed));
    }

    [Fact]
    public async Task CorruptEntry_IsIgnored()
    {
        using var feed = LocalHttpFeed.Start().Add("Bramble.Sketches", "2.3.0");
        var registry = RegistryFactory.Create(feed.ServiceIndexUrl, Options());
        await registry.LookupAsync("Bramble.Sketches", CancellationToken.None);
        var entry = Path.Combine(cacheFolder.Folder, DiskCachedRegistry.Key(registry.Source, "Bramble.Sketches") + ".json");
        File.WriteAllText(entry, "{\"Source\": ");

        var lookup = await RegistryFactory.Create(feed.ServiceIndexUrl, Options()).LookupAsync("Bramble.Sketches", CancellationToken.None);

        Assert.True(lookup.Exists);
        Assert.Equal(2, FlatRequests(feed));
    }

    [Fact]
    public async Task TwoFeeds_DoNotShareEntries()
    {
        using var one = LocalHttpFeed.Start().Add("Bramble.Sketches", "1.0.0");
        using var two = LocalHttpFeed.Start().Add("Bramble.Sketches", "2.0.0");

        var first = await RegistryFactory.Create(one.ServiceIndexUrl, Options()).LookupAsync("Bramble.Sketches", CancellationToken.None);
        var second = await RegistryFactory.Create(two.ServiceIndexUrl, Options()).LookupAsync("Bramble.Sketches", CancellationToken.None);

        Assert.Equal("1.0.0", Assert.Single(first.Versions).Version);
        Assert.Equal("2.0.0", Assert.Single(second.Versions).Version);
    }

    [Fact]
    public async Task CacheFolder_IsPrivateToTheUser()
    {
        using var feed = LocalHttpFeed.Start().Add("Bramble.Sketches", "1.0.0");
        var folder = Path.Combine(cacheFolder.Folder, "nested");

        await RegistryFactory.Create(feed.ServiceIndexUrl, Options() with { CacheFolder = folder }).LookupAsync("Bramble.Sketches", CancellationToken.None);

        Assert.Single(Directory.EnumerateFiles(folder, "*.json"));
        if (!OperatingSystem.IsWindows())
        {
            Assert.Equal(UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute, File.GetUnixFileMode(folder));
        }
    }
}
