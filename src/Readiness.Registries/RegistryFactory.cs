using Readiness.Core.Configuration;
using Readiness.Core.Registry;

namespace Readiness.Registries;

/// <summary>Turns a feed address (a V3 service index URL, a <c>file:</c> URL or a folder) into a registry.</summary>
public static class RegistryFactory
{
    /// <summary>The public NuGet feed, used when neither the command line nor the configuration names one.</summary>
    public const string PublicFeed = "https://api.nuget.org/v3/index.json";

    /// <summary><c>--registry</c>, else <c>publish-to</c> in <c>.readiness.yml</c>, else the public feed.</summary>
    public static string ChooseSource(string? registryOption, RepositoryConfig config)
    {
        ArgumentNullException.ThrowIfNull(config);
        return !string.IsNullOrWhiteSpace(registryOption) ? registryOption.Trim()
            : config.Get("publish-to") is { Length: > 0 } publishTo ? publishTo.Trim()
            : PublicFeed;
    }

    /// <summary>
    /// An HTTP(S) feed (answers cached on disk unless <see cref="RegistryOptions.NoCache"/>) or a local folder feed.
    /// The caller disposes the result when it is <see cref="IDisposable"/>. Throws <see cref="ArgumentException"/>
    /// for an address of another kind.
    /// </summary>
    public static IPackageRegistry Create(string source, RegistryOptions options)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(source);
        ArgumentNullException.ThrowIfNull(options);
        if (Uri.TryCreate(source, UriKind.Absolute, out var uri) && !uri.IsFile)
        {
            if (uri.Scheme is not ("http" or "https"))
            {
                throw new ArgumentException($"'{FeedUrls.Display(uri)}' is neither an http(s) feed address nor a folder", nameof(source));
            }

            var feed = new NuGetFeedRegistry(uri, options);
            return options.NoCache
                ? feed
                : new DiskCachedRegistry(feed, options.CacheFolder ?? RegistryOptions.DefaultCacheFolder, options.CacheTimeToLive, options.TimeProvider);
        }

        return new LocalFolderRegistry(uri?.IsFile == true ? uri.LocalPath : source);
    }
}
