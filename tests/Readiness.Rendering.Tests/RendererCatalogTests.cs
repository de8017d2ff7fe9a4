namespace Readiness.Rendering.Tests;

public sealed class RendererCatalogTests
{
    [Fact]
    public void Formats_AreTheOnesTheCommandLineOffers()
    {
        // cli.md: --format text|markdown|html|json, and the CI formats sarif and junit.
        Assert.Equal(["text", "markdown", "html", "json", "sarif", "junit"], new RendererCatalog().Formats);
    }

    [Theory]
    [InlineData("text", typeof(TextRenderer))]
    [InlineData("markdown", typeof(MarkdownRenderer))]
    [InlineData("html", typeof(HtmlRenderer))]
    [InlineData("json", typeof(JsonRenderer))]
    [InlineData("JSON", typeof(JsonRenderer))]
    [InlineData("sarif", typeof(SarifRenderer))]
    [InlineData("junit", typeof(JunitRenderer))]
    public void Find_ReturnsTheRendererOfTheFormat(string format, Type type)
    {
        var renderer = new RendererCatalog().Find(format);

        Assert.IsType(type, renderer);
        Assert.Equal(format.ToLowerInvariant(), renderer!.Format);
    }

    [Theory]
    [InlineData("junit-xml")]
    [InlineData("")]
    [InlineData(null)]
    public void Find_UnknownFormat_ReturnsNull(string? format) =>
        Assert.Null(new RendererCatalog().Find(format));

    [Fact]
    public void TextRenderer_TakesTheCatalogsOptions()
    {
        var text = Assert.IsType<TextRenderer>(new RendererCatalog(color: true, verbose: true).Find("text"));

        Assert.True(text.Color);
        Assert.True(text.Verbose);
        Assert.Contains('\u001b', SampleReports.Render(text, SampleReports.Demo()));
    }

    [Fact]
    public void EveryRenderer_WritesSomethingForEveryReport()
    {
        var catalog = new RendererCatalog();
        foreach (var format in catalog.Formats)
        {
            foreach (var report in new[] { SampleReports.Demo(), SampleReports.Ready(), SampleReports.Hostile() })
            {
                var output = SampleReports.Render(catalog.Find(format)!, report);
                Assert.EndsWith("\n", output, StringComparison.Ordinal);
                Assert.DoesNotContain("\r", output, StringComparison.Ordinal);
            }
        }
    }
}
