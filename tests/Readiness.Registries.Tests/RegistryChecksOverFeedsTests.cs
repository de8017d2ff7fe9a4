using Readiness.Core.Checks;
using Readiness.Core.Checks.Registry;
using Readiness.Core.Engine;
using Readiness.Core.Reports;
using Readiness.Testing;

using static Readiness.Testing.RegistryTestProjects;

namespace Readiness.Registries.Tests;

/// <summary>The registry phase over real feeds, then the checks over what it gathered.</summary>
public class RegistryChecksOverFeedsTests
{
    private static CheckContext Context(Core.Registry.RegistryFacts facts, string version, params Core.Projects.ProjectInfo[] projects) =>
        TestSnapshots.Context(TestSnapshots.Snapshot(new InMemoryFileTree()), Model(projects), version, registry: facts);

    [Fact]
    public async Task LocalFolderFeed_VersionTakenAfterNormalisation_Fails()
    {
        // The flat file says 1.0; NuGet reads it as 1.0.0 (package-versioning doc, standards.md oracle 3).
        using var feed = new LocalFeedBuilder().AddFlat("Bramble.Sketches", "1.0");
        var facts = await RegistryPhase.GatherAsync(new LocalFolderRegistry(feed.Folder), ["Bramble.Sketches"], RegistryPhase.DefaultTimeout, CancellationToken.None);

        var finding = Assert.Single(new RegistryVersionFreeCheck().Run(Context(facts, "1.0.0", Library("Bramble.Sketches"))));

        Assert.Equal(CheckStatus.Fail, finding.Status);
    }

    [Fact]
    public async Task HttpFeed_DependenciesAndOwnership()
    {
        using var feed = LocalHttpFeed.Start()
            .Add("Lanternfly.Host.Abstractions", "3.0.0")
            .Add("Lanternfly.Host.Abstractions", "3.2.0")
            .Add("bramble.sketches", "2.3.1");
        var project = Library(
            "Bramble.Sketches",
            "2.4.0",
            Reference("Lanternfly.Host.Abstractions", "3.1.0"),
            Reference("Lanternfly.Host.Runtime", "3.1.0", ("PrivateAssets", "all")));
        using var registry = new NuGetFeedRegistry(new Uri(feed.ServiceIndexUrl), new RegistryOptions { NoCache = true, NuGetConfigFile = EmptyNuGetConfig.Path });
        var facts = await RegistryPhase.GatherAsync(registry, ["Bramble.Sketches", "Lanternfly.Host.Abstractions"], RegistryPhase.DefaultTimeout, CancellationToken.None);
        var context = Context(facts, "2.4.0", project);

        var dependency = Assert.Single(new RegistryDependenciesPublishedCheck().Run(context));
        var owned = Assert.Single(new RegistryIdOwnedCheck().Run(context));
        var ahead = Assert.Single(new RegistryAheadOfPublishedCheck().Run(context));

        Assert.Equal(CheckStatus.Fail, dependency.Status);
        Assert.Contains("consumers would get 3.2.0", dependency.Message, StringComparison.Ordinal);
        Assert.Equal(CheckStatus.Fail, owned.Status);
        Assert.Contains("spells the id 'bramble.sketches'", owned.Message, StringComparison.Ordinal);
        Assert.Equal(CheckStatus.Pass, ahead.Status);
    }

    [Fact]
    public async Task UnreachableFeed_EveryRegistryCheckSkipsWithTheReason()
    {
        var port = LocalHttpFeed.ClosedPort();
        using var registry = new NuGetFeedRegistry(new Uri($"http://127.0.0.1:{port}/v3/index.json"), new RegistryOptions { NoCache = true, NuGetConfigFile = EmptyNuGetConfig.Path });
        var facts = await RegistryPhase.GatherAsync(registry, ["Bramble.Sketches"], TimeSpan.FromSeconds(3), CancellationToken.None);
        var context = Context(facts, "2.4.0", Library("Bramble.Sketches", "2.4.0", Reference("Lanternfly.Host.Abstractions", "3.1.0")));
        ICheck[] checks = [new RegistryVersionFreeCheck(), new RegistryIdOwnedCheck(), new RegistryAheadOfPublishedCheck(), new RegistryDependenciesPublishedCheck(), new RegistryDependenciesCurrentCheck()];

        var findings = checks.SelectMany(c => c.Run(context)).ToList();

        Assert.Equal(5, findings.Count);
        Assert.All(findings, f => Assert.Equal(CheckStatus.Skip, f.Status));
        Assert.All(findings, f => Assert.Contains($"127.0.0.1:{port}", f.Message, StringComparison.Ordinal));
    }
}
