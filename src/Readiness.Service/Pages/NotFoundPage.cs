namespace Readiness.Service.Pages;

/// <summary>Any route the service does not serve: a small HTML page for people, JSON under <c>/api/</c> and <c>/hooks/</c>.</summary>
public static class NotFoundPage
{
    public static IResult Render(HttpContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var path = context.Request.Path.Value ?? "/";
        if (path.StartsWith("/api/", StringComparison.Ordinal) || path.StartsWith("/hooks/", StringComparison.Ordinal))
        {
            return Results.Json(new { error = "no such endpoint" }, statusCode: StatusCodes.Status404NotFound);
        }

        var shown = path.Length > 200 ? path[..200] + "…" : path;
        return HtmlPage.Result(
            HtmlPage.Document("Not found · Readiness", $"<h1>Not found</h1>\n<p>There is no page at <code>{HtmlPage.Encode(shown)}</code>.</p>\n<p><a href=\"/\">Recent runs</a></p>"),
            StatusCodes.Status404NotFound);
    }
}
