namespace Readiness.Core.Projects;

/// <summary>One SDK-style project, statically evaluated (nothing executed).</summary>
/// <param name="Path">Repository-relative path of the project file.</param>
/// <param name="Properties">Final global property values (no TargetFramework set), keyed case-insensitively.</param>
/// <param name="PerTarget">Properties re-evaluated with each TargetFramework set, for groups that depend on it.</param>
/// <param name="PackageReferences">Package references from the project and its imports (all targets).</param>
/// <param name="ProjectReferences">Project references.</param>
/// <param name="PackItems">Files packed through None/Content with Pack="true".</param>
/// <param name="CentralVersions">Central PackageVersion items in effect (empty without central management).</param>
/// <param name="Imports">Files read for this project, in evaluation order (Directory.Build.props first).</param>
/// <param name="Unevaluated">What could not be evaluated, each naming file:line; never guessed.</param>
public sealed record ProjectInfo(
    string Path,
    IReadOnlyDictionary<string, PropertyValue> Properties,
    IReadOnlyDictionary<string, IReadOnlyDictionary<string, PropertyValue>> PerTarget,
    IReadOnlyList<PackageReferenceItem> PackageReferences,
    IReadOnlyList<ProjectReferenceItem> ProjectReferences,
    IReadOnlyList<PackItem> PackItems,
    IReadOnlyList<CentralPackageVersion> CentralVersions,
    IReadOnlyList<string> Imports,
    IReadOnlyList<string> Unevaluated)
{
    public string Name => System.IO.Path.GetFileNameWithoutExtension(Path);

    public string Folder => Snapshots.RepoPath.Directory(Path);

    public PropertyValue? Property(string name) => Properties.TryGetValue(name, out var v) ? v : null;

    public string? Value(string name) => Property(name)?.Value is { Length: > 0 } v ? v : null;

    /// <summary>PackageId, defaulting to AssemblyName, then the project file name (as the SDK does).</summary>
    public string PackageId => Value("PackageId") ?? Value("AssemblyName") ?? Name;

    /// <summary>A test project: IsTestProject=true, or a reference to Microsoft.NET.Test.Sdk.</summary>
    public bool IsTestProject =>
        string.Equals(Value("IsTestProject"), "true", StringComparison.OrdinalIgnoreCase)
        || PackageReferences.Any(r => string.Equals(r.Id, "Microsoft.NET.Test.Sdk", StringComparison.OrdinalIgnoreCase));

    /// <summary>Packable: not a test project and IsPackable is not false.</summary>
    public bool IsPackable =>
        !IsTestProject && !string.Equals(Value("IsPackable"), "false", StringComparison.OrdinalIgnoreCase);

    /// <summary>A .NET tool (PackAsTool=true): its package carries the whole program and declares no dependencies.</summary>
    public bool IsTool => string.Equals(Value("PackAsTool"), "true", StringComparison.OrdinalIgnoreCase);

    /// <summary>
    /// SuppressDependenciesWhenPacking=true: the package declares no dependency group at all (NuGet pack target
    /// inputs, learn.microsoft.com/nuget/reference/msbuild-targets#pack-target-inputs).
    /// </summary>
    public bool SuppressesDependencies => string.Equals(Value("SuppressDependenciesWhenPacking"), "true", StringComparison.OrdinalIgnoreCase);

    /// <summary>TargetFrameworks (split on ';') or TargetFramework.</summary>
    public IReadOnlyList<string> TargetFrameworks =>
        (Value("TargetFrameworks") ?? Value("TargetFramework") ?? string.Empty)
            .Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
            .Distinct(StringComparer.OrdinalIgnoreCase)
            .ToArray();
}
