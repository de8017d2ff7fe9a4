using System.Text;
using Readiness.Service.Webhooks;

using Readiness.Testing;

namespace Readiness.Service.Tests.Webhooks;

public sealed class PullRequestEventTests
{
    [Fact]
    public void DocumentedFields_AreRead()
    {
        // Field names from the forge's pull_request webhook payload reference (standards.md §8).
        var json = WebhookPayloads.PullRequest("synchronize", 7, "bramblecote/sketches", "file:///tmp/x.git", new string('a', 40), "release/2.4", ["release", "docs"], "- [x] Soak \\(manual.soak\\)", 42);
        var e = PullRequestEvent.Parse(Encoding.UTF8.GetBytes(json), out var problem);
        Assert.Null(problem);
        Assert.NotNull(e);
        Assert.Equal("synchronize", e.Action);
        Assert.Equal(7, e.Number);
        Assert.Equal("bramblecote", e.Owner);
        Assert.Equal("sketches", e.Name);
        Assert.Equal("file:///tmp/x.git", e.CloneUrl);
        Assert.Equal(new string('a', 40), e.HeadSha);
        Assert.Equal("release/2.4", e.BaseRef);
        Assert.Equal(["release", "docs"], e.Labels);
        Assert.Equal(42, e.InstallationId);
    }

    [Fact]
    public void FieldsOfTheWrongType_AreIgnoredOrRefused_NeverThrown()
    {
        var json = """{"action":"opened","number":1,"installation":{"id":"many"},"pull_request":{"head":{"sha":"aaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaa"},"base":{"ref":"main"},"labels":[1,{"name":2},{"name":"release"}],"body":7},"repository":{"full_name":"a/b","clone_url":"https://git.example/a/b.git"}}""";
        var e = PullRequestEvent.Parse(Encoding.UTF8.GetBytes(json), out var problem);
        Assert.Null(problem);
        Assert.Null(e!.InstallationId);
        Assert.Null(e.Body);
        Assert.Equal(["release"], e.Labels);
    }

    [Theory]
    [InlineData("[1, 2]")]
    [InlineData("null")]
    [InlineData("""{"action":"opened","pull_request":{"number":"seven"}}""")]
    [InlineData("not json")]
    [InlineData("{}")]
    [InlineData("""{"action":"opened","number":1,"repository":{"full_name":"a/b","clone_url":"u"},"pull_request":{"head":{"sha":"nothex"},"base":{"ref":"main"}}}""")]
    [InlineData("""{"action":"opened","number":1,"repository":{"full_name":"../b","clone_url":"u"},"pull_request":{"head":{"sha":"aaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaa"},"base":{"ref":"main"}}}""")]
    public void UnusablePayload_GivesAProblem(string json)
    {
        Assert.Null(PullRequestEvent.Parse(Encoding.UTF8.GetBytes(json), out var problem));
        Assert.False(string.IsNullOrEmpty(problem));
    }
}
