using Readiness.Core.Engine;

namespace Readiness.Rendering;

/// <summary>The report formats by name, as <c>--format</c> takes them (cli.md).</summary>
public sealed class RendererCatalog
{
    private readonly IReadOnlyList<IReportRenderer> renderers;

    /// <param name="color">Colour for the text format (see <see cref="ConsoleColorPolicy"/>).</param>
    /// <param name="verbose">The text format lists every pass.</param>
    /// <param name="checks">The check descriptors machine formats describe their rules with.</param>
    /// <param name="pages">Where the check pages are published (SARIF help links).</param>
    public RendererCatalog(bool color = false, bool verbose = false, CheckCatalog? checks = null, CheckPages? pages = null)
    {
        renderers =
        [
            new TextRenderer(color, verbose), new MarkdownRenderer(), new HtmlRenderer(), new JsonRenderer(),
            new SarifRenderer(checks, pages), new JunitRenderer(),
        ];
    }

    /// <summary>The format names, in the order <c>--help</c> lists them.</summary>
    public IReadOnlyList<string> Formats => renderers.Select(r => r.Format).ToArray();

    /// <summary>The renderer for <paramref name="format"/> (case-insensitive), or null when there is none.</summary>
    public IReportRenderer? Find(string? format) =>
        renderers.FirstOrDefault(r => string.Equals(r.Format, format?.Trim(), StringComparison.OrdinalIgnoreCase));
}
