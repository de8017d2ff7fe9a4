namespace Readiness.Core.Projects.MsBuild;

/// <summary>The items of one evaluation that the project model keeps.</summary>
internal sealed record ItemSet(
    IReadOnlyList<PackageReferenceItem> PackageReferences,
    IReadOnlyList<ProjectReferenceItem> ProjectReferences,
    IReadOnlyList<PackItem> PackItems,
    IReadOnlyList<CentralPackageVersion> CentralVersions);
