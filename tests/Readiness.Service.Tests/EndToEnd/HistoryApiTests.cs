using System.Net;
using System.Net.Http.Headers;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using Readiness.Service.Storage;

using Readiness.Testing;

namespace Readiness.Service.Tests.EndToEnd;

public sealed class HistoryApiTests : ServiceTestBase
{
    [Fact]
    public async Task HookClient_RecordsItsRunAndWaivers_WithTheBearerToken()
    {
        var report = await ReportJsonAsync();
        var body = new JsonObject
        {
            ["repository"] = "https://git.example/bramblecote/sketches",
            ["report"] = JsonNode.Parse(report),
            ["waivers"] = new JsonArray(new JsonObject { ["check"] = "signing.tag", ["reason"] = "The signing key is being rotated <today>." }),
        }.ToJsonString();

        Assert.Equal(HttpStatusCode.Unauthorized, (await PostRunAsync(body, null)).StatusCode);
        Assert.Equal(HttpStatusCode.Unauthorized, (await PostRunAsync(body, "wrong-token")).StatusCode);
        var created = await PostRunAsync(body, ServiceHost.ApiToken);
        Assert.Equal(HttpStatusCode.Created, created.StatusCode);
        using var answer = JsonDocument.Parse(await created.Content.ReadAsStringAsync());
        var id = answer.RootElement.GetProperty("id").GetInt64();

        var run = Host.Runs.Find(id)!;
        Assert.Equal(RunRecord.FromHook, run.Source);
        Assert.Equal("https://git.example/bramblecote/sketches", run.Repository);
        Assert.Equal(new Waiver("signing.tag", "The signing key is being rotated <today>."), Assert.Single(run.Waivers));

        var page = await (await Host.GetAsync($"/runs/{id}")).Content.ReadAsStringAsync();
        Assert.Contains("The signing key is being rotated &lt;today&gt;.", page, StringComparison.Ordinal);
        var home = await (await Host.GetAsync("/")).Content.ReadAsStringAsync();
        Assert.Contains("https://git.example/bramblecote/sketches", home, StringComparison.Ordinal);
        Assert.Contains("1 waived", home, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("{}")]
    [InlineData("{\"report\": {\"schema\": \"something-else/1\"}}")]
    [InlineData("not json")]
    [InlineData("{\"report\": {}, \"waivers\": [{\"check\": \"signing.tag\"}]}")]
    public async Task NotARun_Is400(string body)
    {
        var answer = await PostRunAsync(body, ServiceHost.ApiToken);
        Assert.Equal(HttpStatusCode.BadRequest, answer.StatusCode);
        Assert.Equal(0, Host.Runs.Count());
    }

    [Fact]
    public async Task Health_AnswersOk()
    {
        var answer = await Host.GetAsync("/healthz");
        Assert.Equal(HttpStatusCode.OK, answer.StatusCode);
        using var json = JsonDocument.Parse(await answer.Content.ReadAsStringAsync());
        Assert.Equal("ok", json.RootElement.GetProperty("status").GetString());
    }

    [Fact]
    public async Task UnknownRun_Is404()
    {
        Assert.Equal(HttpStatusCode.NotFound, (await Host.GetAsync("/runs/99")).StatusCode);
        Assert.Equal(HttpStatusCode.NotFound, (await Host.GetAsync("/runs/99.json")).StatusCode);
        Assert.Equal(HttpStatusCode.NotFound, (await Host.GetAsync("/runs/99.md")).StatusCode);
    }

    [Fact]
    public async Task UnknownRoute_GetsASmallHtmlPage_AndApiRoutesJson()
    {
        var page = await Host.GetAsync("/no/such/page?x=<b>");
        Assert.Equal(HttpStatusCode.NotFound, page.StatusCode);
        Assert.Equal("text/html", page.Content.Headers.ContentType?.MediaType);
        var html = await page.Content.ReadAsStringAsync();
        Assert.Contains("<h1>Not found</h1>", html, StringComparison.Ordinal);
        Assert.Contains("href=\"/\"", html, StringComparison.Ordinal);
        Assert.DoesNotContain("<b>", html, StringComparison.Ordinal);
        Assert.True(page.Headers.Contains("Content-Security-Policy"));

        var api = await Host.GetAsync("/api/nothing");
        Assert.Equal(HttpStatusCode.NotFound, api.StatusCode);
        Assert.Equal("application/json", api.Content.Headers.ContentType?.MediaType);
    }

    private async Task<string> ReportJsonAsync()
    {
        await Host.DeliverAsync(Repo.Payload("opened", 1, Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch)), "delivery-1");
        await Host.WaitForIdleAsync();
        return await (await Host.GetAsync("/runs/1.json")).Content.ReadAsStringAsync();
    }

    private async Task<HttpResponseMessage> PostRunAsync(string body, string? token)
    {
        using var client = Host.CreateClient();
        using var request = new HttpRequestMessage(HttpMethod.Post, "/api/runs") { Content = new StringContent(body, Encoding.UTF8, "application/json") };
        if (token is not null)
        {
            request.Headers.Authorization = new AuthenticationHeaderValue("Bearer", token);
        }

        return await client.SendAsync(request);
    }
}
