using Readiness.Core.Checklists;
using Readiness.Core.Engine;
using Readiness.Core.Projects.MsBuild;
using Readiness.Git;

namespace Readiness.Cli;

/// <summary>The objects every command shares, built once per process.</summary>
public sealed class Composition
{
    public Composition(TimeProvider time)
    {
        Time = time;
        Catalog = CheckCatalog.BuiltIn();
        Engine = new ChecklistEngine(Catalog, time);
        Checklists = new BuiltInChecklists();
        Snapshots = new GitSnapshotSource();
        Runner = new ReadinessRunner(Snapshots, new StaticProjectReader(), Checklists, Engine, time);
    }

    public TimeProvider Time { get; }

    public Core.Snapshots.ISnapshotSource Snapshots { get; }

    public CheckCatalog Catalog { get; }

    public ChecklistEngine Engine { get; }

    public IChecklistSource Checklists { get; }

    public ReadinessRunner Runner { get; }
}
