using NuGet.Common;
using NuGet.Protocol;
using NuGet.Versioning;

using Readiness.Core.Registry;

namespace Readiness.Registries;

/// <summary>
/// A local folder feed, in either layout NuGet reads (learn.microsoft.com/nuget/hosting-packages/local-feeds):
/// flat <c>{id}.{version}.nupkg</c> files (one level of sub-folders included), or the hierarchical
/// <c>{id}/{version}/{id}.{version}.nupkg</c> layout with its <c>.nuspec</c> and <c>.sha512</c> beside it. Both are read
/// with NuGet.Protocol's <see cref="LocalFolderUtility"/>, so a folder resolves here exactly as it does for a restore.
/// A folder has no listing or deprecation: those are unknown (null).
/// </summary>
public sealed class LocalFolderRegistry : IPackageRegistry
{
    private readonly string root;

    public LocalFolderRegistry(string folder)
    {
        ArgumentNullException.ThrowIfNull(folder);
        root = Path.GetFullPath(folder);
        Source = root;
    }

    public string Source { get; }

    public Task<PackageLookup> LookupAsync(string packageId, CancellationToken cancellationToken)
    {
        PackageIds.ThrowIfInvalid(packageId);
        return Task.Run(() => Lookup(packageId, cancellationToken), cancellationToken);
    }

    private PackageLookup Lookup(string id, CancellationToken cancellationToken)
    {
        if (!Directory.Exists(root))
        {
            throw new FeedException($"the folder {root} does not exist");
        }

        // Hierarchical first (an id folder), then the flat files; the nuspec inside decides the id, so a file such as
        // Bramble.Sketches.3.1.0.0.nupkg of the id Bramble.Sketches.3 is not taken for Bramble.Sketches 3.1.0.0.
        var packages = LocalFolderUtility.GetPackagesV3(root, id, NullLogger.Instance)
            .Concat(LocalFolderUtility.GetPackagesV2(root, id, NullLogger.Instance))
            .ToList();
        cancellationToken.ThrowIfCancellationRequested();
        if (packages.Count == 0)
        {
            return new PackageLookup(id, false, null, []);
        }

        var versions = packages
            .Select(p => p.Identity.Version)
            .Distinct(VersionComparer.Default)
            .OrderBy(v => v, VersionComparer.Default)
            .Select(v => new PublishedVersion(v.ToNormalizedString()))
            .ToArray();
        var spelled = packages.Select(p => p.Nuspec.GetId()).FirstOrDefault(i => !string.IsNullOrEmpty(i));
        return new PackageLookup(id, true, spelled, versions);
    }
}
