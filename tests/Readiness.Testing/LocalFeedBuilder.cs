using System.Security.Cryptography;

using NuGet.Packaging;
using NuGet.Packaging.Core;
using NuGet.Versioning;

namespace Readiness.Testing;

/// <summary>
/// A local folder feed in a temporary folder, filled with real .nupkg files made by NuGet.Packaging's
/// <see cref="PackageBuilder"/>. Flat files are named <c>{id}.{version}.nupkg</c> as given; the hierarchical layout is
/// written the way NuGet's own tools lay it out (<c>VersionFolderPathResolver</c>: lowercase id and normalised
/// version folders, the nupkg, its nuspec and its <c>.sha512</c>).
/// </summary>
public sealed class LocalFeedBuilder : IDisposable
{
    public LocalFeedBuilder()
    {
        Folder = Path.Combine(Path.GetTempPath(), "readiness-feed-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Folder);
    }

    public string Folder { get; }

    /// <summary>Adds <c>{Folder}/{id}.{version}.nupkg</c>, the id and version spelled as given.</summary>
    public LocalFeedBuilder AddFlat(string id, string version, params (string Id, string Range)[] dependencies)
    {
        File.WriteAllBytes(Path.Combine(Folder, $"{id}.{version}.nupkg"), Package(id, version, dependencies));
        return this;
    }

    /// <summary>Adds <c>{id}/{version}/</c> with the nupkg, <c>{id}.nuspec</c> and <c>{id}.{version}.nupkg.sha512</c>.</summary>
    public LocalFeedBuilder AddHierarchical(string id, string version, params (string Id, string Range)[] dependencies)
    {
        var resolver = new VersionFolderPathResolver(Folder);
        var nuGetVersion = NuGetVersion.Parse(version);
        var bytes = Package(id, version, dependencies);
        Directory.CreateDirectory(resolver.GetInstallPath(id, nuGetVersion));
        File.WriteAllBytes(resolver.GetPackageFilePath(id, nuGetVersion), bytes);
        using (var reader = new PackageArchiveReader(new MemoryStream(bytes)))
        using (var nuspec = reader.GetNuspec())
        using (var target = File.Create(resolver.GetManifestFilePath(id, nuGetVersion)))
        {
            nuspec.CopyTo(target);
        }

        File.WriteAllText(resolver.GetHashPath(id, nuGetVersion), Convert.ToBase64String(SHA512.HashData(bytes)));
        return this;
    }

    /// <summary>A real package: nuspec with id, version, description, authors and dependencies, and one readme file.</summary>
    public static byte[] Package(string id, string version, params (string Id, string Range)[] dependencies)
    {
        var builder = new PackageBuilder(deterministic: true)
        {
            Id = id,
            Version = NuGetVersion.Parse(version),
            Description = $"{id}, made by a test.",
        };
        builder.Authors.Add("Bramblecote Software");
        builder.Files.Add(new PhysicalPackageFile(new MemoryStream("made by a test\n"u8.ToArray())) { TargetPath = "readme.txt" });
        if (dependencies.Length > 0)
        {
            builder.DependencyGroups.Add(new PackageDependencyGroup(
                NuGet.Frameworks.NuGetFramework.AnyFramework,
                dependencies.Select(d => new PackageDependency(d.Id, VersionRange.Parse(d.Range)))));
        }

        using var stream = new MemoryStream();
        builder.Save(stream);
        return stream.ToArray();
    }

    public void Dispose()
    {
        try
        {
            Directory.Delete(Folder, recursive: true);
        }
        catch (IOException)
        {
            // A temporary folder left behind does no harm.
        }
    }
}
