using Readiness.Core.Projects;
using Readiness.Core.Registry;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Checks;

/// <summary>Everything a check may read. Immutable; built once per run.</summary>
/// <param name="Snapshot">The release candidate's files, tags and signatures.</param>
/// <param name="Projects">The statically evaluated projects.</param>
/// <param name="Release">Tag, version and date of the release.</param>
/// <param name="Parameters">This check's parameters.</param>
/// <param name="Registry">Registry facts, or null when offline or when no registry check runs.</param>
/// <param name="Today">The current date and time (injected, for tests).</param>
public sealed record CheckContext(
    ReleaseSnapshot Snapshot,
    ProjectModel Projects,
    ReleaseFacts Release,
    CheckParameters Parameters,
    RegistryFacts? Registry,
    DateTimeOffset Today)
{
    public Configuration.RepositoryConfig Config => Parameters.Config;
}
