using Readiness.Core.Reports;

namespace Readiness.Rendering;

/// <summary>Turns a report into one output format. Stateless; one instance per format.</summary>
public interface IReportRenderer
{
    /// <summary>The format's name on the command line: text, markdown, html, json.</summary>
    string Format { get; }

    void Render(Report report, TextWriter output);
}
