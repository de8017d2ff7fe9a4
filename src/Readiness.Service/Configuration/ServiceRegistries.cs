using Readiness.Core.Registry;
using Readiness.Registries;

namespace Readiness.Service.Configuration;

/// <summary>
/// Which NuGet feed the service's runs ask: <c>Readiness:Registry</c> = <c>offline</c> (registry checks skip), a feed
/// address or folder (every repository), or unset: the base branch's <c>publish-to</c> when it is an https address,
/// else the public feed, as the command line chooses. A repository's configuration never points the service at a
/// folder or a plain-http address of its own machine or network.
/// </summary>
public static class ServiceRegistries
{
    public const string Offline = "offline";

    public static RegistrySelector? Selector(ServiceSettings settings)
    {
        ArgumentNullException.ThrowIfNull(settings);
        var options = new RegistryOptions { CacheFolder = Path.Combine(settings.DataFolder, "registry-cache") };
        if (string.Equals(settings.Registry, Offline, StringComparison.OrdinalIgnoreCase))
        {
            return null;
        }

        if (settings.Registry is { } configured)
        {
            return config => RegistryFactory.Create(configured, WithOwners(options, config));
        }

        return config =>
        {
            var source = RegistryFactory.ChooseSource(null, config);
            return Uri.TryCreate(source, UriKind.Absolute, out var uri) && uri.Scheme == Uri.UriSchemeHttps
                ? RegistryFactory.Create(source, WithOwners(options, config))
                : null;
        };
    }

    // The owners lookup (the feed's search service) is asked only when the configuration names owners to match.
    private static RegistryOptions WithOwners(RegistryOptions options, Core.Configuration.RepositoryConfig config) =>
        options with { AskOwners = config.GetList("owners").Count > 0 };
}
