using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Core.Engine;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Testing;

namespace Readiness.Core.Tests.Engine;

public sealed class ChecklistEngineTests
{
    private sealed class ThrowingCheck : ICheck
    {
        public CheckDescriptor Descriptor { get; } = new("version.well-formed", "boom", Severity.Block, Standards.SemVer, "why", "fix");

        public IEnumerable<Finding> Run(CheckContext context) => throw new InvalidOperationException("exploded on purpose");
    }

    private sealed class FailingCheck(string id) : ICheck
    {
        public CheckDescriptor Descriptor { get; } = new(id, "always fails here", Severity.Warn, Standards.KeepAChangelog, "why", "the fix");

        public IEnumerable<Finding> Run(CheckContext context) => [new Finding(CheckStatus.Fail, "bad", null, "Bramble.Sketches", [new("CHANGELOG.md", 7)])];
    }

    private static EngineInput Input(ResolvedChecklist checklist, params string[] confirmed)
    {
        var snapshot = TestSnapshots.Snapshot(new InMemoryFileTree(), TestSnapshots.Tag("v2.4.0"));
        var model = new ProjectModel([], []);
        var release = ReleaseFactsBuilder.Build(snapshot, model, RepositoryConfig.Empty, null, DateTimeOffset.UnixEpoch);
        return new EngineInput(snapshot, model, checklist, RepositoryConfig.Empty, release, null, confirmed.ToHashSet(), []);
    }

    private static readonly IReadOnlyDictionary<string, ConfigNode> NoWith = new Dictionary<string, ConfigNode>();

    [Fact]
    public void ThrowingCheck_BecomesAnErrorAndTheRunGoesOn()
    {
        var engine = new ChecklistEngine(new CheckCatalog([new ThrowingCheck(), new FailingCheck("changelog.links")]), TimeProvider.System);
        var checklist = new ResolvedChecklist("t", null, [new("version.well-formed", Severity.Block, NoWith), new("changelog.links", Severity.Info, NoWith)], [], []);
        var report = engine.Run(Input(checklist));
        var error = report.Results.Single(r => r.Check == "version.well-formed");
        Assert.Equal(CheckStatus.Error, error.Status);
        Assert.Contains("exploded on purpose", error.Message, StringComparison.Ordinal);
        Assert.Contains(report.Results, r => r.Check == "changelog.links" && r.Status == CheckStatus.Fail);
        Assert.False(report.Ready); // an error on a block check makes the release not ready (checks.md)
        Assert.Equal(1, report.Summary.Blocking);
    }

    [Fact]
    public void ChecklistSeverity_OverridesTheDefault_AndWarnFailuresDoNotBlock()
    {
        var engine = new ChecklistEngine(new CheckCatalog([new FailingCheck("changelog.links")]), TimeProvider.System);
        var checklist = new ResolvedChecklist("t", null, [new("changelog.links", Severity.Info, NoWith)], [], []);
        var report = engine.Run(Input(checklist));
        var result = Assert.Single(report.Results);
        Assert.Equal(Severity.Info, result.Severity);
        Assert.Equal("the fix", result.Hint);
        Assert.Equal(new Evidence("CHANGELOG.md", 7), Assert.Single(result.Evidence));
        Assert.True(report.Ready);
    }

    [Fact]
    public void BlockingManualItem_KeepsTheReleaseNotReadyUntilConfirmed()
    {
        var engine = new ChecklistEngine(new CheckCatalog([]), TimeProvider.System);
        var checklist = new ResolvedChecklist("t", null, [], [new ManualItem("soak", "Soak test done", Severity.Block)], []);
        var open = engine.Run(Input(checklist));
        Assert.False(open.Ready);
        Assert.Equal(CheckStatus.Manual, open.Results.Single().Status);
        var confirmed = engine.Run(Input(checklist, "soak"));
        Assert.True(confirmed.Ready);
        Assert.Equal(CheckStatus.Pass, confirmed.Results.Single().Status);
    }

    [Fact]
    public void BuiltInCatalog_HasUniqueIdsFromTheCatalogList_AndEveryCheckCitesAStandard()
    {
        var catalog = CheckCatalog.BuiltIn();
        Assert.NotEmpty(catalog.Checks);
        Assert.All(catalog.Checks, c =>
        {
            Assert.Contains(c.Descriptor.Id, CheckIds.All);
            Assert.StartsWith("https://", c.Descriptor.Standard.Url, StringComparison.Ordinal);
            Assert.False(string.IsNullOrWhiteSpace(c.Descriptor.Why));
            Assert.False(string.IsNullOrWhiteSpace(c.Descriptor.Fix));
        });
    }
}
