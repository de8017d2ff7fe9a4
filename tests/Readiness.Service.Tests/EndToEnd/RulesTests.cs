using System.Text.Json;

using Readiness.Testing;

namespace Readiness.Service.Tests.EndToEnd;

public sealed class RulesTests : ServiceTestBase
{
    private const string Checklist = """
        name: bramble
        description: Bramblecote's release rules.
        extends: library
        manual:
          - id: soak
            text: Called 1,000 times in one process without its memory growing.
            severity: block
        """;

    protected override string BaseConfig => "checklist: bramble\nchecks:\n  version.well-formed: { severity: block }\n";

    protected override IReadOnlyDictionary<string, string> OrganisationChecklists => new Dictionary<string, string> { ["bramble"] = Checklist };

    [Fact]
    public async Task PullRequestThatDropsACheckInItsOwnConfig_StillGetsTheBaseBranchRules()
    {
        var head = Repo.Push(1, ".readiness.yml", "checklist: library\nchecks:\n  version.well-formed: { severity: off }\n", "Loosen the rules");
        await Host.DeliverAsync(Repo.Payload("synchronize", 1, head), "delivery-1");
        await Host.WaitForIdleAsync();

        var results = Results(1);
        Assert.Equal("bramble", Subject(1).GetProperty("checklist").GetString());
        Assert.Contains(results, r => r.Check == "version.well-formed" && r.Severity == "block");
        Assert.Contains(results, r => r.Check == "manual.soak");
    }

    [Fact]
    public async Task TickedBoxInTheDescription_ConfirmsTheManualItem()
    {
        var head = Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch);
        await Host.DeliverAsync(Repo.Payload("opened", 1, head), "delivery-1");
        await Host.WaitForIdleAsync();
        Assert.Equal("manual", Results(1).Single(r => r.Check == "manual.soak").Status);
        Assert.Contains("manual.soak", Assert.Single(Forge.AllComments()).Body, StringComparison.Ordinal);

        // The person copies the task item into the description and ticks it; the edit re-runs the report.
        var body = "Release 2.4.0.\n\n- [x] Called 1,000 times in one process without its memory growing. \\(manual.soak\\) **block**\n";
        await Host.DeliverAsync(Repo.Payload("edited", 1, head, body: body), "delivery-2");
        await Host.WaitForIdleAsync();
        Assert.Equal("pass", Results(2).Single(r => r.Check == "manual.soak").Status);
        Assert.Equal(1, Assert.Single(Forge.AllComments()).Edits);
    }

    [Fact]
    public async Task ChecklistsApi_ServesTheOrganisationsAndTheBuiltInOnes()
    {
        using var list = JsonDocument.Parse(await (await Host.GetAsync("/api/checklists")).Content.ReadAsStringAsync());
        var items = list.RootElement.GetProperty("checklists").EnumerateArray()
            .ToDictionary(e => e.GetProperty("name").GetString()!, e => e.GetProperty("origin").GetString());
        Assert.Equal("organisation", items["bramble"]);
        Assert.Equal("built-in", items["library"]);
        Assert.Equal("built-in", items["host-plugin"]);

        var bramble = await Host.GetAsync("/api/checklists/bramble");
        Assert.Equal("application/yaml", bramble.Content.Headers.ContentType?.MediaType);
        Assert.Equal(Checklist, await bramble.Content.ReadAsStringAsync());
        var library = await (await Host.GetAsync("/api/checklists/library")).Content.ReadAsStringAsync();
        Assert.Equal(File.ReadAllText(Path.Combine(RepositoryRoot.Path, "checklists", "library.yml")), library);
        Assert.Equal(System.Net.HttpStatusCode.NotFound, (await Host.GetAsync("/api/checklists/no-such")).StatusCode);
        Assert.Equal(System.Net.HttpStatusCode.NotFound, (await Host.GetAsync("/api/checklists/..%2Fsecrets")).StatusCode);
    }

    private JsonElement Subject(long run)
    {
        using var doc = JsonDocument.Parse(Host.Runs.Find(run)!.ReportJson!);
        return doc.RootElement.GetProperty("subject").Clone();
    }

    private List<(string Check, string Status, string Severity)> Results(long run)
    {
        using var doc = JsonDocument.Parse(Host.Runs.Find(run)!.ReportJson!);
        return doc.RootElement.GetProperty("results").EnumerateArray()
            .Select(r => (r.GetProperty("check").GetString()!, r.GetProperty("status").GetString()!, r.GetProperty("severity").GetString()!))
            .ToList();
    }
}
