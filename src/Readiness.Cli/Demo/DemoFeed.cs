using NuGet.Packaging;
using NuGet.Packaging.Core;
using NuGet.Versioning;

namespace Readiness.Cli.Demo;

/// <summary>
/// A local folder feed for the demo (invented packages): the two earlier Bramble.Sketches releases and the Lanternfly
/// host packages, so the registry checks run for real without the network.
/// </summary>
public static class DemoFeed
{
    public static void Create(string folder)
    {
        ArgumentNullException.ThrowIfNull(folder);
        Directory.CreateDirectory(folder);
        Write(folder, "Bramble.Sketches", "2.3.0");
        Write(folder, "Bramble.Sketches", "2.3.1");
        Write(folder, "Lanternfly.Host.Abstractions", "3.2.0");
        Write(folder, "Lanternfly.Host.Runtime", "3.2.0");
        Write(folder, "Lanternfly.Host.Runtime", "3.3.0");
    }

    private static void Write(string folder, string id, string version)
    {
        var builder = new PackageBuilder(deterministic: true)
        {
            Id = id,
            Version = NuGetVersion.Parse(version),
            Description = $"{id} (invented demo package).",
        };
        builder.Authors.Add(id.StartsWith("Bramble", StringComparison.Ordinal) ? "Bramblecote Software" : "Lanternfly maintainers");
        builder.Files.Add(new PhysicalPackageFile(new MemoryStream("invented demo package\n"u8.ToArray())) { TargetPath = "readme.txt" });
        using var file = File.Create(Path.Combine(folder, $"{id.ToLowerInvariant()}.{version}.nupkg"));
        builder.Save(file);
    }
}
