using System.Globalization;
using System.Text;
using Readiness.Service.Storage;

namespace Readiness.Service.Pages;

/// <summary><c>GET /</c>: the newest runs of each repository.</summary>
public sealed class HomePage(IRunStore runs)
{
    public const int RunsPerRepository = 20;

    public IResult Render()
    {
        var all = runs.RecentByRepository(RunsPerRepository);
        var sb = new StringBuilder("<h1>Readiness</h1>\n");
        if (all.Count == 0)
        {
            sb.Append("<p>No runs yet. Runs appear here when a release pull request is reported on, or a hook client records one.</p>\n");
        }

        foreach (var group in all.GroupBy(r => r.Repository, StringComparer.Ordinal))
        {
            sb.Append("<h2>").Append(HtmlPage.Encode(group.Key)).Append("</h2>\n<table>\n<thead><tr><th>Run</th><th>When (UTC)</th><th>Verdict</th><th>Where</th><th>Commit</th><th>Checklist</th><th>Summary</th><th>From</th></tr></thead>\n<tbody>\n");
            foreach (var run in group)
            {
                var where = run.PullRequest is { } pr ? $"#{pr}" : run.Ref ?? string.Empty;
                sb.Append(CultureInfo.InvariantCulture, $"<tr><td><a href=\"/runs/{run.Id}\">{run.Id}</a></td>")
                    .Append("<td>").Append(run.Created.UtcDateTime.ToString("yyyy-MM-dd HH:mm", CultureInfo.InvariantCulture)).Append("</td>")
                    .Append("<td class=\"").Append(HtmlPage.Encode(run.Verdict)).Append("\">").Append(HtmlPage.Encode(Verdict(run.Verdict))).Append("</td>")
                    .Append("<td>").Append(HtmlPage.Encode(where)).Append("</td>")
                    .Append("<td><code>").Append(HtmlPage.Encode(run.Commit.Length > 12 ? run.Commit[..12] : run.Commit)).Append("</code></td>")
                    .Append("<td>").Append(HtmlPage.Encode(run.Checklist)).Append("</td>")
                    .Append("<td>").Append(HtmlPage.Encode(run.Summary ?? run.Error)).Append("</td>")
                    .Append("<td>").Append(HtmlPage.Encode(run.Source)).Append(run.Waivers.Count > 0 ? $" ({run.Waivers.Count} waived)" : string.Empty).Append("</td></tr>\n");
            }

            sb.Append("</tbody>\n</table>\n");
        }

        sb.Append("<p><a href=\"/api/checklists\">Checklists</a> · <a href=\"/healthz\">Health</a></p>");
        return HtmlPage.Result(HtmlPage.Document("Readiness — recent runs", sb.ToString()));
    }

    public static string Verdict(string verdict) => verdict switch
    {
        RunRecord.Ready => "Ready",
        RunRecord.NotReady => "Not ready",
        _ => "Could not run",
    };
}
