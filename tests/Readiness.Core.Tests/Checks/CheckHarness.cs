using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Core.Tests.Checks;

/// <summary>Runs one check over in-memory files and hand-made projects.</summary>
internal static class CheckHarness
{
    public static RepositoryConfig Config(string yaml) =>
        new RepositoryConfigParser(new ChecklistParser(CheckIds.All)).Parse(RepositoryConfig.FileName, yaml);

    public static IReadOnlyDictionary<string, ConfigNode> With(string yaml) =>
        ((ConfigMap)YamlReader.Read("checklist.yml", yaml)).Entries.ToDictionary(e => e.Key, e => e.Value);

    public static IReadOnlyList<Finding> Run(
        ICheck check,
        ProjectModel? projects = null,
        IFileTree? files = null,
        string? config = null,
        string? with = null,
        TagInfo? tag = null,
        string? version = null,
        DateTimeOffset? today = null)
    {
        var snapshot = TestSnapshots.Snapshot(files ?? new InMemoryFileTree(), tag);
        var context = TestSnapshots.Context(
            snapshot,
            projects,
            version,
            config is null ? null : Config(config),
            with is null ? null : With(with),
            today: today);
        return check.Run(context).ToList();
    }

    public static Finding Single(IReadOnlyList<Finding> findings, string? package = null)
    {
        var matching = package is null ? findings : findings.Where(f => f.Package == package).ToList();
        Assert.Single(matching);
        return matching[0];
    }

    public static IEnumerable<string> EvidenceText(Finding finding) => (finding.Evidence ?? []).Select(e => e.ToString());

    public static void AssertStatus(CheckStatus expected, Finding finding) =>
        Assert.True(expected == finding.Status, $"expected {expected}, got {finding.Status}: {finding.Message}");
}
