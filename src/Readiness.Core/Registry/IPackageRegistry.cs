namespace Readiness.Core.Registry;

/// <summary>
/// Port: what a package registry says about package ids. Implemented outside Core (NuGet.Protocol adapter);
/// checks never see it, only the <see cref="RegistryFacts"/> gathered before they run.
/// </summary>
public interface IPackageRegistry
{
    /// <summary>The feed, for reports (a service index URL or a folder). Never carries credentials.</summary>
    string Source { get; }

    /// <summary>What the registry holds for one id. Throws on a transport failure; the caller turns it into a skip.</summary>
    Task<PackageLookup> LookupAsync(string packageId, CancellationToken cancellationToken);
}
