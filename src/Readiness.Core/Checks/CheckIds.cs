namespace Readiness.Core.Checks;

/// <summary>Every check id of the catalog (checks.md), in one place. Ids are stable: never rename one.</summary>
public static class CheckIds
{
    public const string BuildReadable = "build.readable";
    public const string VersionWellFormed = "version.well-formed";
    public const string VersionMatchesTag = "version.matches-tag";
    public const string VersionConsistent = "version.consistent";
    public const string VersionMovesForward = "version.moves-forward";
    public const string ChangelogPresent = "changelog.present";
    public const string ChangelogHasEntry = "changelog.has-entry";
    public const string ChangelogLinks = "changelog.links";
    public const string LicenseFile = "license.file";
    public const string LicenseDeclared = "license.declared";
    public const string LicenseAgrees = "license.agrees";
    public const string DepsHostCompileOnly = "deps.host-compile-only";
    public const string DepsHostVersionMarked = "deps.host-version-marked";
    public const string DepsStableOnly = "deps.stable-only";
    public const string DepsPackableReferences = "deps.packable-references";
    public const string MatrixSupportedTargets = "matrix.supported-targets";
    public const string MatrixTestedTargets = "matrix.tested-targets";
    public const string SigningTag = "signing.tag";
    public const string SigningCommit = "signing.commit";
    public const string MetadataPackage = "metadata.package";
    public const string MetadataReproducible = "metadata.reproducible";
    public const string SecretsNoneCommitted = "secrets.none-committed";
    public const string RegistryVersionFree = "registry.version-free";
    public const string RegistryIdOwned = "registry.id-owned";
    public const string RegistryAheadOfPublished = "registry.ahead-of-published";
    public const string RegistryDependenciesPublished = "registry.dependencies-published";
    public const string RegistryDependenciesCurrent = "registry.dependencies-current";

    public static IReadOnlySet<string> All { get; } = typeof(CheckIds)
        .GetFields(System.Reflection.BindingFlags.Public | System.Reflection.BindingFlags.Static)
        .Where(f => f.IsLiteral)
        .Select(f => (string)f.GetRawConstantValue()!)
        .ToHashSet(StringComparer.Ordinal);
}
