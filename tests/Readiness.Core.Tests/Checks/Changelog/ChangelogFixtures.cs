using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Core.Projects;
using Readiness.Testing;

namespace Readiness.Core.Tests.Checks.Changelog;

/// <summary>Contexts for the changelog checks: a tree, a tag (default v2.4.0 at 2026-11-20 12:00 UTC), projects.</summary>
internal static class ChangelogFixtures
{
    public const string Library = "src/Bramble.Sketches/Bramble.Sketches.csproj";
    public const string Plugin = "src/Bramble.Sketches.Lanternfly3/Bramble.Sketches.Lanternfly3.csproj";

    public static CheckContext Context(
        InMemoryFileTree files,
        string? tag = "v2.4.0",
        DateTimeOffset? tagDate = null,
        ProjectModel? projects = null,
        string? version = null,
        RepositoryConfig? config = null,
        IReadOnlyDictionary<string, ConfigNode>? with = null)
    {
        var tagInfo = tag is null ? null : TestSnapshots.Tag(tag, tagDate);
        return TestSnapshots.Context(TestSnapshots.Snapshot(files, tagInfo), projects, version, config, with);
    }

    public static IReadOnlyDictionary<string, ConfigNode> With(string name, string value) => CheckHarness.With($"{name}: {value}\n");

    public static RepositoryConfig PerPackageTags { get; } = RepositoryConfig.Empty with { TagPattern = "{id}/v{version}" };

    public static ProjectInfo Project(string path, string? version = null)
    {
        var builder = ProjectFixtures.Project(path);
        return (version is null ? builder : builder.Property("Version", version)).Build();
    }
}
