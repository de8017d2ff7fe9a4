using System.Net;
using System.Text;

namespace Readiness.Service.Pages;

/// <summary>The service's own pages: plain server-rendered HTML, inline CSS, no script.</summary>
public static class HtmlPage
{
    public const string ContentSecurityPolicy = "default-src 'none'; style-src 'unsafe-inline'; img-src 'none'; base-uri 'none'; form-action 'none'";

    private const string Css = """
        body{font-family:system-ui,sans-serif;margin:2rem auto;max-width:60rem;padding:0 1rem;line-height:1.5}
        table{border-collapse:collapse;width:100%;margin-bottom:2rem}th,td{text-align:left;padding:.3rem .6rem;border-bottom:1px solid #8884}
        .ready{color:#1a7f37}.not-ready{color:#cf222e}.error{color:#9a6700}code{font-size:.9em}
        @media (prefers-color-scheme:dark){body{background:#0d1117;color:#e6edf3}a{color:#58a6ff}}
        """;

    public static string Document(string title, string bodyHtml)
    {
        var sb = new StringBuilder();
        sb.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        sb.Append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        sb.Append("<meta name=\"color-scheme\" content=\"light dark\">\n");
        sb.Append("<title>").Append(Encode(title)).Append("</title>\n<style>").Append(Css).Append("</style>\n</head>\n<body>\n");
        sb.Append(bodyHtml);
        sb.Append("\n</body>\n</html>\n");
        return sb.ToString();
    }

    public static string Encode(string? text) => WebUtility.HtmlEncode(text ?? string.Empty);

    public static IResult Result(string html, int status = StatusCodes.Status200OK) =>
        new HtmlResult(html, status);

    private sealed class HtmlResult(string html, int status) : IResult
    {
        public Task ExecuteAsync(HttpContext httpContext)
        {
            httpContext.Response.StatusCode = status;
            httpContext.Response.ContentType = "text/html; charset=utf-8";
            httpContext.Response.Headers.ContentSecurityPolicy = ContentSecurityPolicy;
            httpContext.Response.Headers.XContentTypeOptions = "nosniff";
            return httpContext.Response.WriteAsync(html, httpContext.RequestAborted);
        }
    }
}
