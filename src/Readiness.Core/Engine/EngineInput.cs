using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Core.Projects;
using Readiness.Core.Registry;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Engine;

/// <summary>Everything one engine run reads.</summary>
public sealed record EngineInput(
    ReleaseSnapshot Snapshot,
    ProjectModel Projects,
    ResolvedChecklist Checklist,
    RepositoryConfig Config,
    ReleaseFacts Release,
    RegistryFacts? Registry,
    IReadOnlySet<string> Confirmed,
    IReadOnlyList<string> Notes);
