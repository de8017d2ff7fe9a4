using System.Net;
using System.Text.Json;
using Readiness.Service.Storage;
using Readiness.Service.Worker;

using Readiness.Testing;

namespace Readiness.Service.Tests.EndToEnd;

public sealed class PullRequestFlowTests : ServiceTestBase
{
    private const string Marker = "<!-- readiness-report -->";

    [Fact]
    public async Task SignedReleasePullRequest_GetsOneCommentAndOneStatus()
    {
        var head = Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch);
        var answer = await Host.DeliverAsync(Repo.Payload("opened", 1, head), "delivery-1");
        Assert.Equal(HttpStatusCode.Accepted, answer.StatusCode);
        await Host.WaitForIdleAsync();

        var comment = Assert.Single(Forge.AllComments());
        Assert.Equal(1, comment.Number);
        Assert.StartsWith(Marker, comment.Body, StringComparison.Ordinal);
        Assert.Contains("http://127.0.0.1:5080/runs/1", comment.Body, StringComparison.Ordinal);
        Assert.Contains("Only ticks in the pull request's description count as confirmations", comment.Body, StringComparison.Ordinal);
        var status = Assert.Single(Forge.Statuses());
        Assert.Equal(head, status.Sha);
        Assert.Equal(PullRequestJobProcessor.StatusContext, status.Context);
        Assert.Contains(status.State, new[] { "success", "failure" });
        Assert.InRange(status.Description!.Length, 1, 140);
        Assert.Equal("http://127.0.0.1:5080/runs/1", status.TargetUrl);

        var run = Assert.Single(Host.Runs.RecentByRepository(10));
        Assert.Equal(ReleasePullRequestRepository.FullName, run.Repository);
        Assert.Equal(head, run.Commit);
        Assert.Equal(RunRecord.FromService, run.Source);
        Assert.Equal(status.State == "success" ? RunRecord.Ready : RunRecord.NotReady, run.Verdict);

        // The stored run serves as data and as a page; the Markdown is what was commented.
        using var json = JsonDocument.Parse(await (await Host.GetAsync("/runs/1.json")).Content.ReadAsStringAsync());
        Assert.Equal("readiness-report/1", json.RootElement.GetProperty("schema").GetString());
        Assert.Equal(head, json.RootElement.GetProperty("subject").GetProperty("commit").GetString());
        var markdown = await (await Host.GetAsync("/runs/1.md")).Content.ReadAsStringAsync();
        Assert.StartsWith(markdown.TrimEnd(), comment.Body, StringComparison.Ordinal);
        var page = await Host.GetAsync("/runs/1");
        Assert.Equal(HttpStatusCode.OK, page.StatusCode);
        var html = await page.Content.ReadAsStringAsync();
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        var home = await (await Host.GetAsync("/")).Content.ReadAsStringAsync();
        Assert.Contains(ReleasePullRequestRepository.FullName, home, StringComparison.Ordinal);
        Assert.Contains("href=\"/runs/1\"", home, StringComparison.Ordinal);
        Assert.DoesNotContain("<script", home, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public async Task SecondPush_UpdatesTheSameComment()
    {
        var first = Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch);
        await Host.DeliverAsync(Repo.Payload("opened", 1, first), "delivery-1");
        await Host.WaitForIdleAsync();
        var second = Repo.Push(1, "README.md", "# Bramble.Sketches\n\nQuantiles.\n", "README");
        await Host.DeliverAsync(Repo.Payload("synchronize", 1, second), "delivery-2");
        await Host.WaitForIdleAsync();

        var comment = Assert.Single(Forge.AllComments());
        Assert.Equal(1, comment.Edits);
        Assert.Contains(second[..12], comment.Body, StringComparison.Ordinal);
        Assert.Equal([first, second], Forge.Statuses().Select(s => s.Sha));
        Assert.Equal(2, Host.Runs.Count());
    }

    [Fact]
    public async Task SameDeliveryTwice_OneRun()
    {
        var head = Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch);
        var payload = Repo.Payload("opened", 1, head);
        Assert.Equal(HttpStatusCode.Accepted, (await Host.DeliverAsync(payload, "delivery-1")).StatusCode);
        Assert.Equal(HttpStatusCode.OK, (await Host.DeliverAsync(payload, "delivery-1")).StatusCode);
        await Host.WaitForIdleAsync();
        Assert.Equal(HttpStatusCode.OK, (await Host.DeliverAsync(payload, "delivery-1")).StatusCode);
        await Host.WaitForIdleAsync();
        Assert.Equal(1, Host.Runs.Count());
        Assert.Single(Forge.AllComments());
        Assert.Single(Forge.Statuses());
    }

    [Theory]
    [InlineData(null)]
    [InlineData("sha256=0000000000000000000000000000000000000000000000000000000000000000")]
    [InlineData("sha256=garbage")]
    public async Task BadOrMissingSignature_Is401_AndNothingIsQueued(string? signature)
    {
        var head = Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch);
        var answer = await Host.DeliverAsync(Repo.Payload("opened", 1, head), "delivery-1", signature: signature);
        Assert.Equal(HttpStatusCode.Unauthorized, answer.StatusCode);
        Assert.Empty(Host.Jobs.CountByState());

        // The same delivery id, properly signed afterwards, is still new: nothing was recorded.
        Assert.Equal(HttpStatusCode.Accepted, (await Host.DeliverAsync(Repo.Payload("opened", 1, head), "delivery-1")).StatusCode);
        await Host.WaitForIdleAsync();
        Assert.Single(Forge.AllComments());
    }

    [Fact]
    public async Task NonReleasePullRequest_GetsNothing()
    {
        Repo.Work.Branch("typo-fix", "main").Checkout("typo-fix");
        Repo.Work.Write("README.md", "# Bramble.Sketches\n\nFixed a typo.\n").Commit("Fix typo");
        var head = Repo.Publish(2, "typo-fix");
        Assert.Equal(HttpStatusCode.Accepted, (await Host.DeliverAsync(Repo.Payload("opened", 2, head, baseRef: "main"), "delivery-1")).StatusCode);
        await Host.WaitForIdleAsync();
        Assert.Empty(Forge.AllComments());
        Assert.Empty(Forge.Statuses());
        Assert.Equal(0, Host.Runs.Count());
        Assert.Equal(1, Host.Jobs.CountByState()[JobState.Skipped]);
    }

    [Fact]
    public async Task PullRequestOnMainThatChangesTheChangelog_IsAReleaseCandidate()
    {
        Repo.Work.Branch("changelog-2.4", "main").Checkout("changelog-2.4");
        Repo.Work.Write("CHANGELOG.md", ReleasePullRequestRepository.Changelog("2.4.0", "2.3.1")).Commit("Changelog for 2.4.0");
        var head = Repo.Publish(3, "changelog-2.4");
        await Host.DeliverAsync(Repo.Payload("opened", 3, head, baseRef: "main"), "delivery-1");
        await Host.WaitForIdleAsync();
        Assert.Single(Forge.Comments("bramblecote", "sketches", 3));
        Assert.Single(Forge.Statuses(head));
    }

    [Fact]
    public async Task ReleaseLabel_MakesAReleaseCandidate()
    {
        Repo.Work.Branch("docs", "main").Checkout("docs");
        Repo.Work.Write("README.md", "# Bramble.Sketches\n\nDocs.\n").Commit("Docs");
        var head = Repo.Publish(4, "docs");
        await Host.DeliverAsync(Repo.Payload("labeled", 4, head, baseRef: "main", labels: ["release"]), "delivery-1");
        await Host.WaitForIdleAsync();
        Assert.Single(Forge.Comments("bramblecote", "sketches", 4));
    }

    [Fact]
    public async Task ForgeBadGatewayThenCreated_RetriedOnce_OneComment()
    {
        Forge.FailNext("POST", "/issues/1/comments$", 502);
        await Host.DeliverAsync(Repo.Payload("opened", 1, Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch)), "delivery-1");
        await Host.WaitForIdleAsync();
        Assert.Single(Forge.AllComments());
        var posts = Forge.Calls.Where(c => c.Method == "POST" && c.Path.EndsWith("/issues/1/comments", StringComparison.Ordinal)).Select(c => c.Status);
        Assert.Equal([502, 201], posts);
        Assert.Single(Forge.Statuses());
    }

    [Fact]
    public async Task LocalCloneUrl_IsRefused_UnlessAllowed()
    {
        var strict = StartHost(new Dictionary<string, string?> { ["Readiness:AllowNonHttpsCloneUrls"] = "false" });
        var answer = await strict.DeliverAsync(Repo.Payload("opened", 1, Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch)), "delivery-1");
        Assert.Equal(HttpStatusCode.BadRequest, answer.StatusCode);
        Assert.Empty(strict.Jobs.CountByState());
    }

    [Fact]
    public async Task ClosedOrUnassignedActions_AreIgnored()
    {
        var head = Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch);
        Assert.Equal(HttpStatusCode.Accepted, (await Host.DeliverAsync(Repo.Payload("closed", 1, head), "delivery-1")).StatusCode);
        Assert.Equal(HttpStatusCode.Accepted, (await Host.DeliverAsync("{\"zen\":\"Keep it simple.\"}", "delivery-2", eventName: "ping")).StatusCode);
        Assert.Empty(Host.Jobs.CountByState());
    }
}
