using Readiness.Core.Configuration;

namespace Readiness.Core.Registry;

/// <summary>Chooses the registry for a run once the repository configuration is known; null means offline.</summary>
public delegate IPackageRegistry? RegistrySelector(RepositoryConfig config);
