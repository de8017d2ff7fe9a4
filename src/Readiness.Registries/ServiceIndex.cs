using System.Text.Json;

using NuGet.Protocol;

namespace Readiness.Registries;

/// <summary>
/// The resources of a NuGet V3 service index that the registry checks use
/// (learn.microsoft.com/nuget/api/service-index). Resource types are taken in NuGet.Protocol's order of preference
/// (<see cref="ServiceTypes"/>), leaving out the client-version-templated ones.
/// </summary>
internal sealed record ServiceIndex(Uri PackageBaseAddress, Uri? Registrations, Uri? Search)
{
    public static ServiceIndex Parse(JsonElement root, Uri at)
    {
        if (root.ValueKind != JsonValueKind.Object || !root.TryGetProperty("resources", out var resources)
            || resources.ValueKind != JsonValueKind.Array)
        {
            throw new FeedException($"{FeedUrls.Display(at)} is not a NuGet V3 service index (it has no \"resources\" list)");
        }

        var byType = new Dictionary<string, Uri>(StringComparer.OrdinalIgnoreCase);
        foreach (var resource in resources.EnumerateArray())
        {
            if (resource.ValueKind != JsonValueKind.Object
                || !resource.TryGetProperty("@id", out var id) || id.ValueKind != JsonValueKind.String
                || !Uri.TryCreate(id.GetString(), UriKind.Absolute, out var address)
                || address.Scheme is not ("http" or "https")
                || !resource.TryGetProperty("@type", out var type))
            {
                continue;
            }

            // @type is a string; some servers send an array of strings.
            var types = type.ValueKind switch
            {
                JsonValueKind.String => [type.GetString()!],
                JsonValueKind.Array => type.EnumerateArray().Where(t => t.ValueKind == JsonValueKind.String).Select(t => t.GetString()!).ToArray(),
                _ => Array.Empty<string>(),
            };
            foreach (var t in types)
            {
                byType.TryAdd(t, address);
            }
        }

        var baseAddress = Pick(byType, ServiceTypes.PackageBaseAddress)
            ?? throw new FeedException($"{FeedUrls.Display(at)} lists no PackageBaseAddress/3.0.0 resource, so its versions cannot be read");
        return new ServiceIndex(
            baseAddress,
            Pick(byType, ServiceTypes.RegistrationsBaseUrl),
            Pick(byType, ["SearchQueryService/3.5.0", .. ServiceTypes.SearchQueryService]));
    }

    private static Uri? Pick(Dictionary<string, Uri> byType, IEnumerable<string> preferred) =>
        preferred.Where(t => !t.EndsWith(ServiceTypes.Versioned, StringComparison.Ordinal))
            .Select(t => byType.GetValueOrDefault(t))
            .FirstOrDefault(u => u is not null);
}
