using Readiness.Core.Projects;

namespace Readiness.Core.Tests;

/// <summary>Hand-made project models for version check tests (the static reader has its own oracle tests).</summary>
internal static class VersionProjects
{
    public static ProjectInfo Project(string path, params (string Name, string Value, int Line)[] properties) =>
        Project(path, [], properties);

    public static ProjectInfo Project(string path, IReadOnlyList<PackageReferenceItem> references, params (string Name, string Value, int Line)[] properties)
    {
        var map = properties.ToDictionary(
            p => p.Name,
            p => new PropertyValue(p.Name, p.Value, new SourceLocation(p.Name == "Version" && p.Line < 0 ? "Directory.Build.props" : path, Math.Abs(p.Line))),
            StringComparer.OrdinalIgnoreCase);
        return new ProjectInfo(
            path,
            map,
            new Dictionary<string, IReadOnlyDictionary<string, PropertyValue>>(),
            references,
            [],
            [],
            [],
            [path],
            []);
    }

    public static ProjectModel Model(params ProjectInfo[] projects) => new(projects, []);
}
