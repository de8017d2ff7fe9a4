using Readiness.Core.Checklists;
using Readiness.Core.Configuration;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Engine;

/// <summary>One inspection as a front end asks for it.</summary>
/// <param name="Snapshot">Which repository and revision.</param>
/// <param name="ChecklistName">A checklist by name; else the configuration's, else <c>library</c>.</param>
/// <param name="Checklist">A checklist already loaded (from a file or a URL); wins over the name.</param>
/// <param name="Version">The candidate version when there is no tag.</param>
/// <param name="Confirmed">Manual items a person confirmed.</param>
/// <param name="Config">The repository configuration to apply instead of the one at the inspected commit
/// (the service passes the base branch's, so a pull request cannot loosen its own rules).</param>
/// <param name="RegistryTimeout">An explicit bound on the whole registry phase (command line or environment); null: the
/// repository's <c>registry-timeout</c>, else 10 s (<see cref="RegistryPhase.Resolve"/>).</param>
public sealed record RunRequest(
    SnapshotRequest Snapshot,
    string? ChecklistName = null,
    ChecklistDefinition? Checklist = null,
    string? Version = null,
    IReadOnlyList<string>? Confirmed = null,
    RepositoryConfig? Config = null,
    TimeSpan? RegistryTimeout = null);
