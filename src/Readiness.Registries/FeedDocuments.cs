using System.Text.Json;

using NuGet.Versioning;

namespace Readiness.Registries;

/// <summary>Reads the JSON documents of the V3 protocol that the lookups need. Anything not shaped as documented
/// is a <see cref="FeedException"/> naming the address, never a guess.</summary>
internal static class FeedDocuments
{
    /// <summary>Flat container <c>{"versions": [...]}</c> (learn.microsoft.com/nuget/api/package-base-address-resource).</summary>
    public static IReadOnlyList<string> Versions(JsonElement root, Uri at)
    {
        if (root.ValueKind != JsonValueKind.Object || !root.TryGetProperty("versions", out var versions) || versions.ValueKind != JsonValueKind.Array)
        {
            throw Malformed(at, "no \"versions\" list");
        }

        var list = new List<string>();
        foreach (var v in versions.EnumerateArray())
        {
            if (v.ValueKind != JsonValueKind.String)
            {
                throw Malformed(at, "a version that is not a string");
            }

            var text = v.GetString()!;
            list.Add(NuGetVersion.TryParse(text, out var parsed) ? parsed.ToNormalizedString() : text);
        }

        return list;
    }

    /// <summary>The pages of a registration index: each page's leaves when inlined, else the page's address to fetch
    /// (learn.microsoft.com/nuget/api/registration-base-url-resource).</summary>
    public static IReadOnlyList<(IReadOnlyList<RegistrationLeaf>? Leaves, Uri? Page)> RegistrationPages(JsonElement root, Uri at)
    {
        if (root.ValueKind != JsonValueKind.Object || !root.TryGetProperty("items", out var items) || items.ValueKind != JsonValueKind.Array)
        {
            throw Malformed(at, "no \"items\" list of pages");
        }

        var pages = new List<(IReadOnlyList<RegistrationLeaf>?, Uri?)>();
        foreach (var page in items.EnumerateArray())
        {
            if (page.ValueKind != JsonValueKind.Object)
            {
                throw Malformed(at, "a page that is not an object");
            }

            if (page.TryGetProperty("items", out var leaves) && leaves.ValueKind == JsonValueKind.Array)
            {
                pages.Add((Leaves(leaves, at), null));
            }
            else if (page.TryGetProperty("@id", out var id) && id.ValueKind == JsonValueKind.String
                && Uri.TryCreate(id.GetString(), UriKind.Absolute, out var address) && address.Scheme is "http" or "https")
            {
                pages.Add((null, address));
            }
            else
            {
                throw Malformed(at, "a page with neither items nor an address");
            }
        }

        return pages;
    }

    /// <summary>The leaves of a registration page fetched on its own.</summary>
    public static IReadOnlyList<RegistrationLeaf> RegistrationPage(JsonElement root, Uri at) =>
        root.ValueKind == JsonValueKind.Object && root.TryGetProperty("items", out var items) && items.ValueKind == JsonValueKind.Array
            ? Leaves(items, at)
            : throw Malformed(at, "no \"items\" list of leaves");

    /// <summary>The owners and id spelling the search service gives for exactly <paramref name="id"/>, if it lists it
    /// (learn.microsoft.com/nuget/api/search-query-service-resource: <c>owners</c> is a string or an array).</summary>
    public static (string? Id, IReadOnlyList<string>? Owners) SearchHit(JsonElement root, string id)
    {
        if (root.ValueKind != JsonValueKind.Object || !root.TryGetProperty("data", out var data) || data.ValueKind != JsonValueKind.Array)
        {
            return (null, null);
        }

        foreach (var hit in data.EnumerateArray())
        {
            if (hit.ValueKind != JsonValueKind.Object || !hit.TryGetProperty("id", out var hitId) || hitId.ValueKind != JsonValueKind.String
                || !string.Equals(hitId.GetString(), id, StringComparison.OrdinalIgnoreCase))
            {
                continue;
            }

            IReadOnlyList<string>? owners = !hit.TryGetProperty("owners", out var o) ? null : o.ValueKind switch
            {
                JsonValueKind.String => [o.GetString()!],
                JsonValueKind.Array => o.EnumerateArray().Where(x => x.ValueKind == JsonValueKind.String).Select(x => x.GetString()!).ToArray(),
                _ => null,
            };
            return (hitId.GetString(), owners);
        }

        return (null, null);
    }

    private static List<RegistrationLeaf> Leaves(JsonElement items, Uri at)
    {
        var leaves = new List<RegistrationLeaf>();
        foreach (var leaf in items.EnumerateArray())
        {
            // An inlined leaf carries its catalog entry as an object; a bare address tells nothing here.
            if (leaf.ValueKind != JsonValueKind.Object || !leaf.TryGetProperty("catalogEntry", out var entry) || entry.ValueKind != JsonValueKind.Object)
            {
                continue;
            }

            if (!entry.TryGetProperty("version", out var version) || version.ValueKind != JsonValueKind.String)
            {
                throw Malformed(at, "a catalog entry without a version");
            }

            var id = entry.TryGetProperty("id", out var i) && i.ValueKind == JsonValueKind.String ? i.GetString() : null;
            // "listed": absent means listed (registration-base-url-resource, catalog entry).
            var listed = !entry.TryGetProperty("listed", out var l) || l.ValueKind != JsonValueKind.False;
            var deprecated = entry.TryGetProperty("deprecation", out var d) && d.ValueKind == JsonValueKind.Object;
            leaves.Add(new RegistrationLeaf(id, version.GetString()!, listed, deprecated));
        }

        return leaves;
    }

    private static FeedException Malformed(Uri at, string what) =>
        new($"malformed answer from {FeedUrls.Display(at)}: {what}");
}
