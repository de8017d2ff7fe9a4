using System.Text;
using Readiness.Service.Storage;
using Readiness.Service.Worker;

namespace Readiness.Service.Pages;

/// <summary><c>GET /runs/{id}</c> (HTML), <c>/runs/{id}.json</c> and <c>/runs/{id}.md</c>.</summary>
public sealed class RunPages(IRunStore runs, ReportDocuments documents)
{
    public IResult Html(long id)
    {
        if (runs.Find(id) is not { } run)
        {
            return NotFound(id);
        }

        if (run.ReportJson is null)
        {
            var body = new StringBuilder()
                .Append("<h1>Could not run</h1>\n<p>").Append(HtmlPage.Encode(run.Repository))
                .Append(run.PullRequest is { } pr ? $" #{pr}" : string.Empty).Append(" at <code>").Append(HtmlPage.Encode(run.Commit)).Append("</code></p>\n<pre>")
                .Append(HtmlPage.Encode(run.Error)).Append("</pre>\n<p><a href=\"/\">All runs</a></p>");
            return HtmlPage.Result(HtmlPage.Document($"Run {id} — could not run", body.ToString()));
        }

        var html = documents.Render(documents.ReadJson(run.ReportJson), ReportDocuments.Html);
        var extra = new StringBuilder();
        if (run.Waivers.Count > 0)
        {
            extra.Append("<section><h2>Bypassed by a person</h2>\n<ul>\n");
            foreach (var w in run.Waivers)
            {
                extra.Append("<li><code>").Append(HtmlPage.Encode(w.Check)).Append("</code>: ").Append(HtmlPage.Encode(w.Reason)).Append("</li>\n");
            }

            extra.Append("</ul></section>\n");
        }

        extra.Append("<p><a href=\"/\">All runs</a> · <a href=\"/runs/").Append(id).Append(".json\">JSON</a> · <a href=\"/runs/").Append(id).Append(".md\">Markdown</a></p>\n");
        var at = html.LastIndexOf("</main>", StringComparison.Ordinal);
        html = at < 0 ? html + extra : html.Insert(at, extra.ToString());
        return HtmlPage.Result(html);
    }

    public IResult Json(long id) =>
        runs.Find(id) is { ReportJson: { } json } ? Results.Text(json, "application/json; charset=utf-8") : NotFound(id);

    public IResult Markdown(long id)
    {
        if (runs.Find(id) is not { } run)
        {
            return NotFound(id);
        }

        var markdown = run.ReportMarkdown ?? (run.ReportJson is { } json ? documents.Render(documents.ReadJson(json), ReportDocuments.Markdown) : null);
        return markdown is null ? NotFound(id) : Results.Text(markdown, "text/markdown; charset=utf-8");
    }

    private static IResult NotFound(long id) =>
        HtmlPage.Result(HtmlPage.Document("Not found", $"<h1>No run {id}</h1>\n<p><a href=\"/\">All runs</a></p>"), StatusCodes.Status404NotFound);
}
