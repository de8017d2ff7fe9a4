using NuGet.Versioning;

namespace Readiness.Registries;

/// <summary>
/// Addresses of the NuGet V3 resources, built as the protocol documents them: ids and versions lowercased with
/// <c>ToLowerInvariant()</c>, versions normalised (learn.microsoft.com/nuget/api/package-base-address-resource,
/// learn.microsoft.com/nuget/api/registration-base-url-resource).
/// </summary>
public static class FeedUrls
{
    /// <summary><c>{@id}/{lowerId}/index.json</c>: every version of the id (listed and unlisted).</summary>
    public static Uri VersionsIndex(Uri packageBaseAddress, string id)
    {
        ArgumentNullException.ThrowIfNull(packageBaseAddress);
        ArgumentNullException.ThrowIfNull(id);
        return new Uri(WithSlash(packageBaseAddress), $"{id.ToLowerInvariant()}/index.json");
    }

    /// <summary><c>{@id}/{lowerId}/{lowerVersion}/{lowerId}.{lowerVersion}.nupkg</c>.</summary>
    public static Uri Package(Uri packageBaseAddress, string id, NuGetVersion version)
    {
        ArgumentNullException.ThrowIfNull(packageBaseAddress);
        ArgumentNullException.ThrowIfNull(id);
        ArgumentNullException.ThrowIfNull(version);
        var lowerId = id.ToLowerInvariant();
        var lowerVersion = version.ToNormalizedString().ToLowerInvariant();
        return new Uri(WithSlash(packageBaseAddress), $"{lowerId}/{lowerVersion}/{lowerId}.{lowerVersion}.nupkg");
    }

    /// <summary><c>{@id}/{lowerId}/index.json</c> of a registration hive: the registration index of the id.</summary>
    public static Uri RegistrationIndex(Uri registrationsBaseUrl, string id)
    {
        ArgumentNullException.ThrowIfNull(registrationsBaseUrl);
        ArgumentNullException.ThrowIfNull(id);
        return new Uri(WithSlash(registrationsBaseUrl), $"{id.ToLowerInvariant()}/index.json");
    }

    /// <summary>The search service asked for exactly one id, pre-release and SemVer 2.0.0 versions included
    /// (learn.microsoft.com/nuget/api/search-query-service-resource).</summary>
    public static Uri Search(Uri searchQueryService, string id)
    {
        ArgumentNullException.ThrowIfNull(searchQueryService);
        ArgumentNullException.ThrowIfNull(id);
        var query = Uri.EscapeDataString($"packageid:{id}");
        return new Uri($"{searchQueryService.GetLeftPart(UriPartial.Path)}?q={query}&prerelease=true&semVerLevel=2.0.0&take=1");
    }

    /// <summary>The address as it may appear in a report: no user name, password, query or fragment.</summary>
    public static string Display(Uri address)
    {
        ArgumentNullException.ThrowIfNull(address);
        return address.IsFile ? address.LocalPath : address.GetComponents(UriComponents.SchemeAndServer | UriComponents.Path, UriFormat.UriEscaped);
    }

    private static Uri WithSlash(Uri address) =>
        address.AbsoluteUri.EndsWith('/') ? address : new Uri(address.AbsoluteUri + "/");
}
