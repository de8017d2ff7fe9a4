using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Core.Projects;
using Readiness.Core.Registry;
using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Core.Tests.Checks.Registry;

/// <summary>Check contexts for the registry checks: in-memory files, hand-made projects, registry facts built directly.</summary>
internal static class RegistryCheckContexts
{
    public static CheckContext For(
        ProjectModel projects,
        RegistryFacts? registry,
        string? version = null,
        string? yaml = null,
        IReadOnlyList<TagInfo>? tags = null,
        TagInfo? tag = null)
    {
        var config = yaml is null ? RepositoryConfig.Empty : Config(yaml);
        var snapshot = TestSnapshots.Snapshot(new InMemoryFileTree(), tag, tags ?? (tag is null ? [] : [tag]));
        return TestSnapshots.Context(snapshot, projects, version, config, registry: registry);
    }

    /// <summary>Parses <c>.readiness.yml</c> text with the real parser.</summary>
    public static RepositoryConfig Config(string yaml) =>
        new RepositoryConfigParser(new ChecklistParser(CheckIds.All)).Parse(RepositoryConfig.FileName, yaml);

    /// <summary>A release tag at an ancestor commit.</summary>
    public static TagInfo OldTag(string name) =>
        TestSnapshots.Tag(name, commit: "1111111111111111111111111111111111111111");
}
