using Microsoft.Extensions.Logging.Abstractions;
using Microsoft.Extensions.Time.Testing;
using Readiness.Core.Forge;
using Readiness.Service.Forge;
using Readiness.Testing;

namespace Readiness.Service.Tests.Forge;

public sealed class OctokitForgeTests : IAsyncLifetime
{
    private const string Marker = "<!-- readiness-report -->";
    private static readonly ForgePullRequest Pr = new(new ForgeRepository("bramblecote", "sketches"), 7);
    private ForgeStandIn standIn = null!;
    private OctokitConnections connections = null!;

    public async Task InitializeAsync()
    {
        standIn = await ForgeStandIn.StartAsync();
        standIn.AcceptToken("forge-token-Xq81");
        connections = new OctokitConnections(TestSettings.Create(standIn.BaseUrl, "unused"));
    }

    public async Task DisposeAsync()
    {
        connections.Dispose();
        await standIn.DisposeAsync();
    }

    [Fact]
    public async Task FirstReport_CreatesTheComment_SecondUpdatesIt()
    {
        var forge = Forge(TimeProvider.System);
        var first = await forge.UpsertCommentAsync(Pr, Marker, Marker + "\nfirst", default);
        var second = await forge.UpsertCommentAsync(Pr, Marker, Marker + "\nsecond", default);
        Assert.True(first.Created);
        Assert.False(second.Created);
        Assert.Equal(first.Id, second.Id);
        var comment = Assert.Single(standIn.Comments("bramblecote", "sketches", 7));
        Assert.Equal(Marker + "\nsecond", comment.Body);
        Assert.Equal(1, comment.Edits);
    }

    [Fact]
    public async Task OtherPeoplesComments_AreLeftAlone()
    {
        var forge = Forge(TimeProvider.System);
        standIn.AcceptToken("someone-else");
        using (var other = new OctokitConnections(TestSettings.Create(standIn.BaseUrl, "unused", token: "someone-else")))
        {
            await other.Client(new Octokit.Credentials("someone-else")).Issue.Comment.Create("bramblecote", "sketches", 7, "Looks good to me");
        }

        await forge.UpsertCommentAsync(Pr, Marker, Marker + "\nreport", default);
        var comments = standIn.Comments("bramblecote", "sketches", 7);
        Assert.Equal(2, comments.Count);
        Assert.Equal("Looks good to me", comments[0].Body);
        Assert.Equal(0, comments[0].Edits);
    }

    [Fact]
    public async Task BadGatewayThenCreated_RetriesOnce_OneComment()
    {
        standIn.FailNext("POST", "/issues/7/comments$", 502);
        await Forge(TimeProvider.System).UpsertCommentAsync(Pr, Marker, Marker + "\nreport", default);
        Assert.Single(standIn.Comments("bramblecote", "sketches", 7));
        var posts = standIn.Calls.Where(c => c.Method == "POST" && c.Path.EndsWith("/issues/7/comments", StringComparison.Ordinal)).ToList();
        Assert.Equal([502, 201], posts.Select(p => p.Status));
    }

    [Fact]
    public async Task RateLimitWithRetryAfter_WaitsThatLongBeforeTheRetry()
    {
        // Retry-After honoured (the forge's rate-limit docs): nothing is retried before the clock passes 2 s.
        var time = new FakeTimeProvider(DateTimeOffset.UtcNow);
        standIn.FailNext("POST", "/statuses/", 403, new Dictionary<string, string> { ["retry-after"] = "2", ["x-ratelimit-remaining"] = "0" });
        var retry = new ForgeRetryPolicy(3, TimeSpan.FromMinutes(5), time, NullLogger<ForgeRetryPolicy>.Instance);
        var forge = new OctokitForge(connections, new PlainTokenCredentials("forge-token-Xq81"), retry);
        var sha = new string('b', 40);
        var call = forge.SetStatusAsync(Pr.Repository, new ForgeCommitStatus(sha, ForgeCommitState.Success, "Ready", null, "readiness"), default);

        await WaitUntil(() => retry.Retries == 1);
        time.Advance(TimeSpan.FromMilliseconds(1999));
        await Task.Delay(100);
        Assert.False(call.IsCompleted);
        Assert.Empty(standIn.Statuses(sha));
        time.Advance(TimeSpan.FromMilliseconds(1));
        await call.WaitAsync(TimeSpan.FromSeconds(10));
        Assert.Equal("success", Assert.Single(standIn.Statuses(sha)).State);
    }

    [Fact]
    public async Task HungCall_IsCancelledAfterItsTimeout_AndRetried()
    {
        var (reached, _) = standIn.Hold("POST", "/statuses/");
        var retry = new ForgeRetryPolicy(2, TimeSpan.FromMilliseconds(20), TimeProvider.System, NullLogger<ForgeRetryPolicy>.Instance, callTimeout: TimeSpan.FromMilliseconds(500));
        var forge = new OctokitForge(connections, new PlainTokenCredentials("forge-token-Xq81"), retry);
        var sha = new string('d', 40);
        var started = System.Diagnostics.Stopwatch.StartNew();
        await forge.SetStatusAsync(Pr.Repository, new ForgeCommitStatus(sha, ForgeCommitState.Success, "Ready", null, "readiness"), default);
        Assert.True(reached.IsCompleted);
        Assert.Equal(1, retry.Retries);
        Assert.InRange(started.Elapsed, TimeSpan.FromMilliseconds(400), TimeSpan.FromSeconds(20));
        Assert.Equal("success", Assert.Single(standIn.Statuses(sha)).State);
    }

    [Fact]
    public async Task LongDescription_IsShortenedToWhatTheForgeAccepts()
    {
        var sha = new string('c', 40);
        await Forge(TimeProvider.System).SetStatusAsync(Pr.Repository, new ForgeCommitStatus(sha, ForgeCommitState.Failure, new string('x', 300), "http://127.0.0.1:5080/runs/1", "readiness"), default);
        var status = Assert.Single(standIn.Statuses(sha));
        Assert.Equal(140, status.Description!.Length);
        Assert.Equal("failure", status.State);
        Assert.Equal("readiness", status.Context);
    }

    [Fact]
    public async Task NotFound_IsNotRetried()
    {
        var forge = Forge(TimeProvider.System);
        var wrong = new ForgeRepository("bramblecote", "sketches");
        standIn.FailNext("GET", "/issues/9/comments$", 404);
        await Assert.ThrowsAsync<Octokit.NotFoundException>(() => forge.UpsertCommentAsync(new ForgePullRequest(wrong, 9), Marker, "x", default));
        Assert.Single(standIn.Calls, c => c.Path.EndsWith("/issues/9/comments", StringComparison.Ordinal));
    }

    private OctokitForge Forge(TimeProvider time) =>
        new(connections, new PlainTokenCredentials("forge-token-Xq81"), new ForgeRetryPolicy(3, TimeSpan.FromMilliseconds(20), time, NullLogger<ForgeRetryPolicy>.Instance));

    private static async Task WaitUntil(Func<bool> condition)
    {
        for (var i = 0; i < 200 && !condition(); i++)
        {
            await Task.Delay(25);
        }

        Assert.True(condition());
    }
}
