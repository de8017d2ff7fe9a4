namespace Readiness.Core.Projects;

/// <summary>A <c>PackageVersion</c> item of central package management, with any metadata written on it.</summary>
public sealed record CentralPackageVersion(
    string Id,
    string Version,
    IReadOnlyDictionary<string, string> Metadata,
    SourceLocation Location);
