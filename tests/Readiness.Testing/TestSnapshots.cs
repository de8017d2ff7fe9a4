using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;

namespace Readiness.Testing;

/// <summary>Builds snapshots and check contexts in memory, for unit tests of single checks.</summary>
public static class TestSnapshots
{
    public const string Commit = "0123456789abcdef0123456789abcdef01234567";

    public static ReleaseSnapshot Snapshot(IFileTree files, TagInfo? tag = null, IReadOnlyList<TagInfo>? tags = null, DateTimeOffset? commitDate = null) =>
        new(
            "memory",
            Commit,
            tag?.Name ?? "HEAD",
            InspectionKind.Commit,
            files,
            tag,
            commitDate ?? new DateTimeOffset(2026, 11, 20, 12, 0, 0, TimeSpan.Zero),
            null,
            tags ?? (tag is null ? [] : [tag]));

    public static TagInfo Tag(string name, DateTimeOffset? date = null, bool annotated = true, string commit = Commit) =>
        new(name, commit, annotated, annotated ? date ?? new DateTimeOffset(2026, 11, 20, 12, 0, 0, TimeSpan.Zero) : null, annotated ? "Dev <dev@bramblecote.example>" : null, annotated ? "Release\n" : null, null);

    /// <summary>A context for one check. <paramref name="projects"/> defaults to none.</summary>
    public static CheckContext Context(
        ReleaseSnapshot snapshot,
        ProjectModel? projects = null,
        string? version = null,
        RepositoryConfig? config = null,
        IReadOnlyDictionary<string, ConfigNode>? with = null,
        Core.Registry.RegistryFacts? registry = null,
        DateTimeOffset? today = null)
    {
        var model = projects ?? new ProjectModel([], []);
        config ??= RepositoryConfig.Empty;
        var now = today ?? new DateTimeOffset(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);
        var release = Core.Engine.ReleaseFactsBuilder.Build(snapshot, model, config, version, now);
        return new CheckContext(snapshot, model, release, new CheckParameters(with ?? new Dictionary<string, ConfigNode>(), config), registry, now);
    }
}
