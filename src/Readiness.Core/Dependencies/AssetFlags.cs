namespace Readiness.Core.Dependencies;

/// <summary>
/// The asset kinds a <c>PackageReference</c> or <c>ProjectReference</c> may include, exclude or keep private
/// (https://learn.microsoft.com/nuget/consume-packages/package-references-in-project-files#controlling-dependency-assets).
/// </summary>
[Flags]
public enum AssetFlags
{
    None = 0,
    Compile = 1,
    Runtime = 2,
    ContentFiles = 4,
    Build = 8,
    BuildMultitargeting = 16,
    BuildTransitive = 32,
    Analyzers = 64,
    Native = 128,
    All = Compile | Runtime | ContentFiles | Build | BuildMultitargeting | BuildTransitive | Analyzers | Native,
}
