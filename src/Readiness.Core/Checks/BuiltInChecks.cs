using Readiness.Core.Checks.Changelog;
using Readiness.Core.Checks.Deps;
using Readiness.Core.Checks.License;
using Readiness.Core.Checks.Matrix;
using Readiness.Core.Checks.Metadata;
using Readiness.Core.Checks.Registry;
using Readiness.Core.Checks.Secrets;
using Readiness.Core.Checks.Signing;
using Readiness.Core.Checks.Version;

namespace Readiness.Core.Checks;

/// <summary>
/// The one list of the built-in checks. Written out rather than found by reflection so the trimmed, ahead-of-time
/// compiled program keeps every check and starts without scanning types; a test compares it with the check classes.
/// </summary>
public static class BuiltInChecks
{
    public static IReadOnlyList<ICheck> Create() =>
    [
        new ChangelogHasEntryCheck(),
        new ChangelogLinksCheck(),
        new ChangelogPresentCheck(),
        new HostCompileOnlyCheck(),
        new HostVersionMarkedCheck(),
        new PackableReferencesCheck(),
        new StableOnlyCheck(),
        new LicenseAgreesCheck(),
        new LicenseDeclaredCheck(),
        new LicenseFileCheck(),
        new SupportedTargetsCheck(),
        new TestedTargetsCheck(),
        new PackageMetadataCheck(),
        new ReproducibleCheck(),
        new RegistryAheadOfPublishedCheck(),
        new RegistryDependenciesCurrentCheck(),
        new RegistryDependenciesPublishedCheck(),
        new RegistryIdOwnedCheck(),
        new RegistryVersionFreeCheck(),
        new NoneCommittedCheck(),
        new SigningCommitCheck(),
        new SigningTagCheck(),
        new VersionConsistentCheck(),
        new VersionMatchesTagCheck(),
        new VersionMovesForwardCheck(),
        new VersionWellFormedCheck(),
    ];
}
