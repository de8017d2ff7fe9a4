using Readiness.Core.Projects;
using Readiness.Core.Snapshots;

namespace Readiness.Testing;

/// <summary>
/// Builds <see cref="ProjectInfo"/> records by hand, for check tests that need no MSBuild reading. Properties are
/// placed on consecutive lines of the project file from line 3 (as in one PropertyGroup), in the order given.
/// </summary>
public static class TestProjects
{
    public const int FirstPropertyLine = 3;

    /// <summary>A project at <paramref name="path"/> with the given properties.</summary>
    /// <param name="path">Repository-relative project path, e.g. <c>src/Bramble.Sketches/Bramble.Sketches.csproj</c>.</param>
    /// <param name="properties">Property name → value, declared in the project file itself.</param>
    /// <param name="packItems">Pack items (see <see cref="Pack"/>).</param>
    /// <param name="packageReferences">Package references (see <see cref="Reference"/>).</param>
    /// <param name="unevaluated">Property name → why its value is uncertain; the property is added if missing.</param>
    public static ProjectInfo Project(
        string path,
        IEnumerable<KeyValuePair<string, string>>? properties = null,
        IEnumerable<PackItem>? packItems = null,
        IEnumerable<PackageReferenceItem>? packageReferences = null,
        IEnumerable<KeyValuePair<string, string>>? unevaluated = null)
    {
        ArgumentNullException.ThrowIfNull(path);
        var values = new Dictionary<string, PropertyValue>(StringComparer.OrdinalIgnoreCase);
        var line = FirstPropertyLine;
        foreach (var (name, value) in properties ?? [])
        {
            values[name] = new PropertyValue(name, value, new SourceLocation(path, line++));
        }

        foreach (var (name, why) in unevaluated ?? [])
        {
            values[name] = values.TryGetValue(name, out var existing)
                ? existing with { Unevaluated = why }
                : new PropertyValue(name, string.Empty, new SourceLocation(path, line++), why);
        }

        var unevaluatedNotes = values.Values.Where(v => v.Unevaluated is not null)
            .Select(v => $"{v.Location}: {v.Name}: {v.Unevaluated}").ToArray();
        return new ProjectInfo(
            path,
            values,
            new Dictionary<string, IReadOnlyDictionary<string, PropertyValue>>(StringComparer.OrdinalIgnoreCase),
            (packageReferences ?? []).ToArray(),
            [],
            (packItems ?? []).ToArray(),
            [],
            [path],
            unevaluatedNotes);
    }

    /// <summary>
    /// A <c>None Include="…" Pack="true"</c> item of <paramref name="projectPath"/>: the Include is relative to the
    /// project's folder; a wildcard Include leaves <see cref="PackItem.Path"/> null, as the reader does.
    /// </summary>
    public static PackItem Pack(string projectPath, string include, string? packagePath, int line = 30)
    {
        ArgumentNullException.ThrowIfNull(projectPath);
        ArgumentNullException.ThrowIfNull(include);
        var path = include.Contains('*', StringComparison.Ordinal) || include.Contains('?', StringComparison.Ordinal)
            ? null
            : RepoPath.TryNormalize(RepoPath.Combine(RepoPath.Directory(projectPath), include.Replace('\\', '/')));
        return new PackItem(include, path, packagePath, new SourceLocation(projectPath, line));
    }

    /// <summary>A <c>PackageReference</c> of <paramref name="projectPath"/> with optional metadata.</summary>
    public static PackageReferenceItem Reference(string projectPath, string id, string? version, int line = 40, IEnumerable<KeyValuePair<string, string>>? metadata = null)
    {
        ArgumentNullException.ThrowIfNull(projectPath);
        var location = new SourceLocation(projectPath, line);
        return new PackageReferenceItem(
            id,
            version,
            version is null ? null : location,
            new Dictionary<string, string>(metadata ?? [], StringComparer.OrdinalIgnoreCase),
            location);
    }

    /// <summary>A model of the given projects, with no problems.</summary>
    public static ProjectModel Model(params ProjectInfo[] projects) => new(projects, []);

    /// <summary>Shorthand for property lists: <c>Props(("Version", "2.4.0"), ...)</c>.</summary>
    public static IEnumerable<KeyValuePair<string, string>> Props(params (string Name, string Value)[] properties) =>
        properties.Select(p => new KeyValuePair<string, string>(p.Name, p.Value));
}