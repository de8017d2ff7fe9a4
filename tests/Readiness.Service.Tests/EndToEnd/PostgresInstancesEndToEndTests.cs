using System.Net;
using System.Text.Json;
using Npgsql;
using Readiness.Service.Storage;
using Readiness.Service.Tests.Storage;
using Readiness.Testing;

namespace Readiness.Service.Tests.EndToEnd;

/// <summary>Two real service instances (own data folders and mirrors) sharing one PostgreSQL database and one forge.</summary>
[Collection(PostgresCollection.Name)]
public sealed class PostgresInstancesEndToEndTests(PostgresCluster cluster) : ServiceTestBase
{
    private readonly string database = cluster.CreateDatabase();

    [Fact]
    public async Task TwoInstancesRacingOnOnePullRequest_LeaveOneCommentAndOneJobPerDelivery()
    {
        var a = Instance("a");
        var b = Instance("b");
        var head = Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch);

        // The same deliveries reach both instances at once (a redelivery, a load balancer retrying), plus new events.
        var sends = new List<Task<HttpResponseMessage>>();
        for (var i = 0; i < 6; i++)
        {
            var payload = Repo.Payload(i == 0 ? "opened" : "synchronize", 1, head);
            sends.Add(a.DeliverAsync(payload, $"delivery-{i}"));
            sends.Add(b.DeliverAsync(payload, $"delivery-{i}"));
        }

        var answers = await Task.WhenAll(sends);
        Assert.All(answers, r => Assert.True(r.IsSuccessStatusCode, r.StatusCode.ToString()));
        Assert.Equal(6, answers.Count(r => r.StatusCode == HttpStatusCode.OK)); // one of each pair is the duplicate
        await a.WaitForIdleAsync();
        await b.WaitForIdleAsync();

        var comment = Assert.Single(Forge.AllComments());
        Assert.Equal(1, comment.Number);
        Assert.NotEmpty(Forge.Statuses(head));
        Assert.Equal(a.Runs.Count(), b.Runs.Count());
        Assert.InRange(a.Runs.Count(), 1, 6);

        // A second event after the race updates that comment; it never adds one.
        await b.DeliverAsync(Repo.Payload("edited", 1, head, body: "- [x] notes reviewed"), "delivery-late");
        await b.WaitForIdleAsync();
        Assert.Single(Forge.AllComments());
    }

    [Fact]
    public async Task Readiness_ReportsTheQueue_AndTurns503WhenTheDatabaseGoes()
    {
        var a = Instance("a");
        var ready = await a.GetAsync("/readyz");
        Assert.Equal(HttpStatusCode.OK, ready.StatusCode);
        using (var json = JsonDocument.Parse(await ready.Content.ReadAsStringAsync()))
        {
            Assert.Equal("postgresql", json.RootElement.GetProperty("store").GetString());
            Assert.Equal(0, json.RootElement.GetProperty("queued").GetInt64());
        }

        var name = new NpgsqlConnectionStringBuilder(database).Database;
        await using (var c = new NpgsqlConnection(cluster.ConnectionString))
        {
            await c.OpenAsync();
            await using var drop = new NpgsqlCommand($"DROP DATABASE {name} WITH (FORCE)", c);
            await drop.ExecuteNonQueryAsync();
        }

        NpgsqlConnection.ClearAllPools();
        var gone = await a.GetAsync("/readyz");
        Assert.Equal(HttpStatusCode.ServiceUnavailable, gone.StatusCode);
        Assert.Contains("the database does not answer", await gone.Content.ReadAsStringAsync(), StringComparison.Ordinal);
        Assert.Equal(HttpStatusCode.OK, (await a.GetAsync("/healthz")).StatusCode);
    }

    private ServiceHost Instance(string name)
    {
        var folder = Data.Combine(name);
        Directory.CreateDirectory(folder);
        var host = new ServiceHost(Forge.BaseUrl, folder, Logs, new Dictionary<string, string?>
        {
            ["Readiness:PostgresConnection"] = database,
            ["Readiness:Worker:QuietMilliseconds"] = "200",
        });
        Track(host);
        _ = host.Server;
        return host;
    }
}
