using NuGet.Packaging;

namespace Readiness.Registries;

/// <summary>Refuses an id that is not a valid package id before it becomes part of a URL or a path: ids come from
/// the inspected repository, and one such as <c>../x</c> must not reach another resource or folder.</summary>
internal static class PackageIds
{
    public static void ThrowIfInvalid(string id)
    {
        ArgumentNullException.ThrowIfNull(id);
        // PackageIdValidator: ^\w+([.-]\w+)*$ and at most 100 characters (NuGet.Packaging; standards.md §4).
        if (id.Length > PackageIdValidator.MaxPackageIdLength || !PackageIdValidator.IsValidPackageId(id))
        {
            throw new FeedException($"'{id}' is not a valid package id, so it was not looked up");
        }
    }
}
