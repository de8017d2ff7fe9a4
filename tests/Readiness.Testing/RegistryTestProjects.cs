using Readiness.Core.Projects;
using Readiness.Core.Registry;

namespace Readiness.Testing;

/// <summary>Hand-made projects, references and registry answers for unit tests of the registry checks.</summary>
public static class RegistryTestProjects
{
    public const string Source = "https://feed.bramblecote.example/v3/index.json";

    /// <summary>A packable SDK-style project <c>src/{id}/{id}.csproj</c> declaring <paramref name="version"/> (if any).</summary>
    public static ProjectInfo Library(string id, string? version = null, params PackageReferenceItem[] references)
    {
        var path = $"src/{id}/{id}.csproj";
        var properties = new Dictionary<string, PropertyValue>(StringComparer.OrdinalIgnoreCase)
        {
            ["TargetFramework"] = new("TargetFramework", "net8.0", new SourceLocation(path, 3)),
            ["PackageId"] = new("PackageId", id, new SourceLocation(path, 4)),
        };
        if (version is not null)
        {
            properties["Version"] = new PropertyValue("Version", version, new SourceLocation(path, 5));
        }

        return new ProjectInfo(
            path,
            properties,
            new Dictionary<string, IReadOnlyDictionary<string, PropertyValue>>(),
            references,
            [],
            [],
            [],
            [path],
            []);
    }

    /// <summary>A <c>PackageReference</c> with optional metadata (name, value) pairs, declared at line 10 of the project.</summary>
    public static PackageReferenceItem Reference(string id, string? version, params (string Name, string Value)[] metadata)
    {
        var at = new SourceLocation("src/Bramble.Sketches/Bramble.Sketches.csproj", 10);
        return new PackageReferenceItem(
            id,
            version,
            version is null ? null : at,
            metadata.ToDictionary(m => m.Name, m => m.Value, StringComparer.OrdinalIgnoreCase),
            at);
    }

    public static ProjectModel Model(params ProjectInfo[] projects) => new(projects, []);

    /// <summary>Registry facts holding exactly these answers.</summary>
    public static RegistryFacts Facts(params PackageLookup[] lookups) =>
        new(Source, lookups.ToDictionary(l => l.Id, StringComparer.OrdinalIgnoreCase));

    /// <summary>An id the registry knows, with these versions (all listed), spelled as given.</summary>
    public static PackageLookup Published(string id, params string[] versions) =>
        new(id, true, id, versions.Select(v => new PublishedVersion(v, true, false)).ToArray());

    /// <summary>An id the registry does not know.</summary>
    public static PackageLookup Unknown(string id) => new(id, false, null, []);
}
