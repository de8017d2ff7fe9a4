using System.Net;
using Microsoft.Data.Sqlite;

using Readiness.Testing;

namespace Readiness.Service.Tests.EndToEnd;

public sealed class SecretsTests : ServiceTestBase
{
    private static readonly string[] Secrets = [ServiceHost.Token, ServiceHost.Secret, ServiceHost.ApiToken];

    [Fact]
    public async Task Secrets_NeverAppearInLogsPagesOrStoredRows()
    {
        var head = Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch);
        Forge.FailNext("POST", "/statuses/", 502);
        Assert.Equal(HttpStatusCode.Unauthorized, (await Host.DeliverAsync(Repo.Payload("opened", 1, head), "bad", signature: "sha256=00")).StatusCode);
        await Host.DeliverAsync(Repo.Payload("opened", 1, head), "delivery-1");
        await Host.WaitForIdleAsync();
        Assert.Single(Forge.AllComments());

        var pages = new List<string>();
        foreach (var path in new[] { "/", "/runs/1", "/runs/1.json", "/runs/1.md", "/api/checklists", "/healthz" })
        {
            pages.Add(await (await Host.GetAsync(path)).Content.ReadAsStringAsync());
        }

        var rows = DumpDatabase(Path.Combine(Data.Path, "readiness.db"));
        Assert.NotEmpty(Logs.Lines);
        Assert.NotEmpty(rows);
        foreach (var secret in Secrets)
        {
            Assert.DoesNotContain(Logs.Lines, l => l.Contains(secret, StringComparison.Ordinal));
            Assert.DoesNotContain(pages, p => p.Contains(secret, StringComparison.Ordinal));
            Assert.DoesNotContain(rows, r => r.Contains(secret, StringComparison.Ordinal));
            Assert.DoesNotContain(Forge.AllComments(), c => c.Body.Contains(secret, StringComparison.Ordinal));
            Assert.DoesNotContain(Forge.Statuses(), s => (s.Description + s.TargetUrl).Contains(secret, StringComparison.Ordinal));
        }

        // The token did reach the forge, and only in the Authorization header.
        Assert.All(Forge.Calls, c => Assert.Equal("Token " + ServiceHost.Token, c.Authorization));
        Assert.DoesNotContain(Forge.Calls, c => c.Path.Contains(ServiceHost.Token, StringComparison.Ordinal) || c.Body.Contains(ServiceHost.Token, StringComparison.Ordinal));
    }

    private static List<string> DumpDatabase(string path)
    {
        var rows = new List<string>();
        using var connection = new SqliteConnection($"Data Source={path};Mode=ReadOnly;Pooling=False");
        connection.Open();
        var tables = new List<string>();
        using (var list = connection.CreateCommand())
        {
            list.CommandText = "SELECT name FROM sqlite_master WHERE type = 'table'";
            using var reader = list.ExecuteReader();
            while (reader.Read())
            {
                tables.Add(reader.GetString(0));
            }
        }

        foreach (var table in tables)
        {
            using var select = connection.CreateCommand();
            select.CommandText = $"SELECT * FROM \"{table}\"";
            using var reader = select.ExecuteReader();
            while (reader.Read())
            {
                rows.Add(table + ": " + string.Join(" | ", Enumerable.Range(0, reader.FieldCount).Select(i => reader.IsDBNull(i) ? "" : Convert.ToString(reader.GetValue(i), System.Globalization.CultureInfo.InvariantCulture))));
            }
        }

        return rows;
    }
}
