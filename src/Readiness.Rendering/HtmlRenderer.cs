using System.Net;

using Markdig;
using Markdig.Extensions.AutoIdentifiers;
using Markdig.Extensions.AutoLinks;
using Markdig.Extensions.GenericAttributes;
using Markdig.Syntax;
using Markdig.Syntax.Inlines;

using Readiness.Core.Reports;

namespace Readiness.Rendering;

/// <summary>
/// One self-contained HTML page: the Markdown report rendered by Markdig with raw HTML disabled, inline CSS for light
/// and dark schemes, no script and no external resource (a Content-Security-Policy says so to the browser too).
/// </summary>
public sealed class HtmlRenderer : IReportRenderer
{
    /// <summary>
    /// Built once and shared: a Markdig pipeline is immutable and thread-safe once built. Raw HTML is disabled, and
    /// two of the advanced extensions are taken out again: generic attributes (<c>{onclick=...}</c> after an
    /// element), so nothing that slipped past <see cref="MarkdownText"/> can add attributes, and bare-URL autolinks,
    /// so an address quoted in a repository's text stays text: the page links only the standards it cites.
    /// </summary>
    private static readonly MarkdownPipeline Pipeline = BuildPipeline();

    public string Format => "html";

    public void Render(Report report, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(output);
        var document = Markdown.Parse(MarkdownRenderer.RenderBody(report), Pipeline);
        NeutraliseLinks(document);
        var body = document.ToHtml(Pipeline);

        var verdict = report.Ready ? "Ready" : "Not ready";
        var version = UntrustedText.OneLine(report.Subject.Version);
        var title = version.Length > 0 ? $"{verdict}: {version} — Readiness report" : $"{verdict} — Readiness report";

        output.Write("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        output.Write("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        output.Write("<meta name=\"color-scheme\" content=\"light dark\">\n");
        output.Write($"<meta http-equiv=\"Content-Security-Policy\" content=\"{HtmlPageStyle.ContentSecurityPolicy}\">\n");
        output.Write($"<title>{WebUtility.HtmlEncode(title)}</title>\n");
        output.Write($"<style>{HtmlPageStyle.Css}</style>\n</head>\n<body>\n<main>\n");
        output.Write(body.Replace("\r\n", "\n", StringComparison.Ordinal));
        output.Write("</main>\n</body>\n</html>\n");
    }

    private static MarkdownPipeline BuildPipeline()
    {
        var builder = new MarkdownPipelineBuilder().UseAdvancedExtensions().DisableHtml();
        builder.Extensions.TryRemove<GenericAttributesExtension>();
        builder.Extensions.TryRemove<AutoLinkExtension>();
        // Heading ids as the forge makes them, so the summary tables' links to detail sections work in both places.
        builder.Extensions.TryRemove<AutoIdentifierExtension>();
        builder.UseAutoIdentifiers(AutoIdentifierOptions.GitHub);
        return builder.Build();
    }

    /// <summary>
    /// Second line of defence: a link or image whose target is not an http(s) URL or an in-page anchor becomes plain
    /// text, and images become their alternative text (the page loads nothing from elsewhere).
    /// </summary>
    private static void NeutraliseLinks(MarkdownDocument document)
    {
        foreach (var link in document.Descendants<LinkInline>().ToList())
        {
            if (link.IsImage || !IsSafeTarget(link.Url))
            {
                link.ReplaceBy(new LiteralInline(PlainText(link)));
            }
        }

        foreach (var autolink in document.Descendants<AutolinkInline>().ToList())
        {
            if (autolink.IsEmail ? false : !IsSafeTarget(autolink.Url))
            {
                autolink.ReplaceBy(new LiteralInline(autolink.Url));
            }
        }
    }

    private static bool IsSafeTarget(string? url) =>
        url is not null && (url.StartsWith('#') || ReportFacts.IsWebUrl(url));

    private static string PlainText(ContainerInline container) =>
        string.Concat(container.Descendants<LiteralInline>().Select(l => l.Content.ToString()));
}
