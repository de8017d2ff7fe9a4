namespace Readiness.Core.Projects;

/// <summary>A <c>PackageReference</c> (or <c>GlobalPackageReference</c>) after static evaluation.</summary>
/// <param name="Id">The package id (the item's Include).</param>
/// <param name="Version">The version or range in effect: the reference's own, its VersionOverride, or the central PackageVersion.</param>
/// <param name="VersionLocation">Where that version is declared.</param>
/// <param name="Metadata">All metadata (attribute or child-element form), names as declared; lookups are case-insensitive.</param>
/// <param name="Location">Where the reference is declared.</param>
/// <param name="TargetFramework">The target framework the reference is conditioned on, or null when it applies to all.</param>
public sealed record PackageReferenceItem(
    string Id,
    string? Version,
    SourceLocation? VersionLocation,
    IReadOnlyDictionary<string, string> Metadata,
    SourceLocation Location,
    string? TargetFramework = null)
{
    public string? Meta(string name) => Metadata.TryGetValue(name, out var v) ? v : null;
}
