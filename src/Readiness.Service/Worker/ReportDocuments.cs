using Readiness.Core.Reports;
using Readiness.Rendering;

namespace Readiness.Service.Worker;

/// <summary>The report formats the service stores and serves, by format name, and the JSON reader for stored reports.</summary>
public sealed class ReportDocuments(IEnumerable<IReportRenderer> renderers, Func<string, Report> readJson)
{
    public const string Markdown = "markdown";
    public const string Json = "json";
    public const string Html = "html";

    private readonly Dictionary<string, IReportRenderer> byFormat = renderers.ToDictionary(r => r.Format, StringComparer.Ordinal);

    public string Render(Report report, string format)
    {
        ArgumentNullException.ThrowIfNull(report);
        if (!byFormat.TryGetValue(format, out var renderer))
        {
            throw new InvalidOperationException($"no renderer for {format}");
        }

        using var writer = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        renderer.Render(report, writer);
        return writer.ToString();
    }

    /// <summary>Reads a JSON report (schema readiness-report/1); throws <see cref="FormatException"/> when it is not one.</summary>
    public Report ReadJson(string json)
    {
        ArgumentNullException.ThrowIfNull(json);
        return readJson(json);
    }
}
