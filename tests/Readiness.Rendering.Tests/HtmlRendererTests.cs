using System.Security.Cryptography;
using System.Text;

using AngleSharp.Dom;
using AngleSharp.Html.Dom;
using AngleSharp.Html.Parser;

using Readiness.Core.Reports;

namespace Readiness.Rendering.Tests;

/// <summary>
/// The page is read back with AngleSharp, an implementation of the WHATWG HTML parsing algorithm, so the assertions
/// see the document a browser would build, not the string.
/// </summary>
public sealed class HtmlRendererTests
{
    private static (string Html, IHtmlDocument Document) Render(Report report)
    {
        var html = SampleReports.Render(new HtmlRenderer(), report);
        var parser = new HtmlParser(new HtmlParserOptions { IsStrictMode = false });
        return (html, parser.ParseDocument(html));
    }

    private static void AssertSelfContainedAndInert(string html, IHtmlDocument document)
    {
        // Exactly one document: one doctype at the very start, one html, head and body element.
        Assert.StartsWith("<!DOCTYPE html>\n", html, StringComparison.Ordinal);
        Assert.Equal(1, CountOrdinal(html, "<!DOCTYPE", StringComparison.OrdinalIgnoreCase));
        Assert.Equal("html", document.Doctype?.Name);
        Assert.Single(document.QuerySelectorAll("html"));
        Assert.Single(document.QuerySelectorAll("head"));
        Assert.Single(document.QuerySelectorAll("body"));
        Assert.EndsWith("</html>\n", html, StringComparison.Ordinal);

        Assert.Equal("utf-8", document.Head!.QuerySelector("meta[charset]")?.GetAttribute("charset"));
        Assert.False(string.IsNullOrWhiteSpace(document.Title));

        // Nothing runs and nothing loads: no script, no external style sheet, no embedded or framed content,
        // no resource attribute, no event handler attribute, no inline style attribute.
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.Empty(document.QuerySelectorAll("script, link, img, iframe, frame, object, embed, video, audio, source, base, form, svg, math"));
        var all = document.All.ToList();
        Assert.DoesNotContain(all, e => e.Attributes.Any(a => a.Name.StartsWith("on", StringComparison.OrdinalIgnoreCase)));
        Assert.DoesNotContain(all, e => e.HasAttribute("src") || e.HasAttribute("srcset") || e.HasAttribute("style") || e.HasAttribute("formaction"));
        // Links go to a cited standard (https) or to a section of this page that exists.
        Assert.All(document.QuerySelectorAll("a[href]"), a =>
        {
            var href = a.GetAttribute("href")!;
            if (href.StartsWith('#'))
            {
                Assert.NotNull(document.GetElementById(href[1..]));
            }
            else
            {
                Assert.StartsWith("https://", href, StringComparison.Ordinal);
            }
        });

        // One inline style sheet, in the head.
        var style = Assert.Single(document.QuerySelectorAll("style"));
        Assert.Same(document.Head, style.ParentElement);
    }

    private static int CountOrdinal(string text, string value, StringComparison comparison)
    {
        var count = 0;
        for (var i = text.IndexOf(value, comparison); i >= 0; i = text.IndexOf(value, i + value.Length, comparison))
        {
            count++;
        }

        return count;
    }

    [Fact]
    public void DemoReport_IsOneSelfContainedInertDocument()
    {
        var (html, document) = Render(SampleReports.Demo());

        AssertSelfContainedAndInert(html, document);
        Assert.Equal("Not ready: 2.4.0 — Readiness report", document.Title);
    }

    [Fact]
    public void HostileReport_IsOneSelfContainedInertDocument()
    {
        var (html, document) = Render(SampleReports.Hostile());

        AssertSelfContainedAndInert(html, document);
    }

    [Fact]
    public void HostileReport_ScriptTagsAreShownAsEscapedText()
    {
        var (html, document) = Render(SampleReports.Hostile());

        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", html, StringComparison.Ordinal);
        Assert.Contains("<script>alert(1)</script>", document.Body!.TextContent, StringComparison.Ordinal);
        Assert.Contains("<script>alert(2)</script>", document.Body.TextContent, StringComparison.Ordinal);
        Assert.Contains("<img src=x onerror=alert(1)>", document.Body.TextContent, StringComparison.Ordinal);
        Assert.Equal("Not ready: 1.0.0 | x — Readiness report", document.Title);
    }

    [Fact]
    public void HostileReport_JavascriptLinkAttemptsStayText()
    {
        var (html, document) = Render(SampleReports.Hostile());

        Assert.DoesNotContain(document.All, e => e.Attributes.Any(a => a.Value.Contains("javascript:", StringComparison.OrdinalIgnoreCase)));
        Assert.DoesNotContain("href=\"javascript", html, StringComparison.OrdinalIgnoreCase);
        var text = document.Body!.TextContent;
        Assert.Contains("See [the fix](javascript:alert(1))", text, StringComparison.Ordinal); // hint
        Assert.Contains("](javascript:alert(1)):3", text, StringComparison.Ordinal); // evidence path
        Assert.Contains("[link](javascript:alert(3))", text, StringComparison.Ordinal); // note
        Assert.Contains("<javascript:alert(1)>", text, StringComparison.Ordinal); // autolink form
        Assert.Contains("Standard: Click <me>", text, StringComparison.Ordinal); // standard with a javascript: url
        // The only link that leaves the page is the one standard with an https URL; the others go to its sections.
        var link = Assert.Single(document.QuerySelectorAll("a"), a => !a.GetAttribute("href")!.StartsWith('#'));
        Assert.Equal("https://keepachangelog.com/en/1.1.0/", link.GetAttribute("href"));
    }

    [Fact]
    public void HostileReport_AttributeSyntaxAddsNoAttribute()
    {
        var (_, document) = Render(SampleReports.Hostile());

        Assert.Contains("{onclick=alert(1)}", document.Body!.TextContent, StringComparison.Ordinal);
        Assert.DoesNotContain(document.All, e => e.HasAttribute("onclick"));
    }

    [Fact]
    public void ContentSecurityPolicy_AllowsExactlyTheInlineStyleSheet()
    {
        var (_, document) = Render(SampleReports.Demo());

        var policy = document.Head!.QuerySelector("meta[http-equiv=Content-Security-Policy]")?.GetAttribute("content");
        Assert.NotNull(policy);
        Assert.StartsWith("default-src 'none';", policy, StringComparison.Ordinal);
        // CSP Level 3 §8.3 hash-source: base64 of the SHA-256 of the style element's text, as the browser reads it.
        var css = document.QuerySelector("style")!.TextContent;
        var hash = Convert.ToBase64String(SHA256.HashData(Encoding.UTF8.GetBytes(css)));
        Assert.Contains($"style-src 'sha256-{hash}'", policy, StringComparison.Ordinal);
    }

    [Fact]
    public void StyleSheet_HasALightAndADarkScheme()
    {
        var (_, document) = Render(SampleReports.Demo());

        var css = document.QuerySelector("style")!.TextContent;
        // CSS Media Queries Level 5 §11.5 prefers-color-scheme; CSS Color Adjustment Level 1 color-scheme.
        Assert.Contains("@media (prefers-color-scheme: dark)", css, StringComparison.Ordinal);
        Assert.Contains("color-scheme: light dark", css, StringComparison.Ordinal);
        Assert.Equal("light dark", document.Head!.QuerySelector("meta[name=color-scheme]")?.GetAttribute("content"));
    }

    [Fact]
    public void DemoReport_ShowsTheTableTaskListAndSections()
    {
        var report = SampleReports.Demo();
        var (_, document) = Render(report);

        // Every judged result has one row; manual items are the task list.
        Assert.Equal(report.Results.Count(r => !r.Check.StartsWith("manual.", StringComparison.Ordinal)), document.QuerySelectorAll("table tbody tr").Length);
        Assert.All(document.QuerySelectorAll("table"), t => Assert.Equal(["check", "package", "finding", "where"], t.QuerySelectorAll("thead th").Select(th => th.TextContent)));
        // A failure's row links to its detail section (the ids come from Markdig's GitHub-style identifiers).
        var first = document.QuerySelector("table tbody tr td a")!;
        Assert.Equal("changelog.has-entry", first.TextContent);
        Assert.Equal("changelog.has-entry — Bramble.Sketches", document.GetElementById(first.GetAttribute("href")![1..])?.TextContent);
        var boxes = document.QuerySelectorAll("li input[type=checkbox]").Cast<IHtmlInputElement>().ToList();
        Assert.Equal(2, boxes.Count);
        Assert.Single(boxes, b => b.IsChecked);
        Assert.Contains(document.QuerySelectorAll("h4"), h => h.TextContent == "changelog.has-entry — Bramble.Sketches");
        Assert.Equal("Release check: NOT READY", document.QuerySelector("h2")?.TextContent);
        // The Markdown marker comment is not rendered as text (raw HTML is disabled, so it is left out).
        Assert.DoesNotContain("readiness-report -->", document.Body!.TextContent, StringComparison.Ordinal);
        Assert.Empty(document.Body.Descendants<IComment>());
    }
}
