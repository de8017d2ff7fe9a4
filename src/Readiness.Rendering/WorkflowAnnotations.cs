using System.Globalization;
using System.Text;

using Readiness.Core.Reports;

namespace Readiness.Rendering;

/// <summary>
/// Workflow commands that a CI runner turns into annotations on the changed files: one
/// <c>::error file=PATH,line=N,title=ID::MESSAGE</c> (or <c>::warning</c>, <c>::notice</c>) line per failure or error.
/// Values are escaped as the runner's own toolkit escapes them (actions/toolkit, packages/core/src/command.ts):
/// in the message <c>%</c>, CR and LF become <c>%25</c>, <c>%0D</c>, <c>%0A</c>; in properties also <c>:</c> and
/// <c>,</c> become <c>%3A</c> and <c>%2C</c>. Other control characters are written as visible <c>\uXXXX</c>.
/// </summary>
public sealed class WorkflowAnnotations
{
    /// <summary>The command for a severity: block → error, warn → warning, info → notice.</summary>
    public static string Command(Severity severity) => severity switch
    {
        Severity.Block => "error",
        Severity.Warn => "warning",
        _ => "notice",
    };

    /// <summary>One line per failing or erroring result, most important first; each line ends with LF.</summary>
    public void Render(Report report, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(output);
        foreach (var result in ReportFacts.Failures(report))
        {
            output.Write(Line(result));
            output.Write('\n');
        }
    }

    public static string Line(CheckResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var properties = new List<string>();
        var where = result.Evidence.FirstOrDefault(e => !string.IsNullOrWhiteSpace(e.Path));
        if (where is not null)
        {
            properties.Add("file=" + EscapeProperty(where.Path));
            if (where.Line is { } line)
            {
                properties.Add("line=" + line.ToString(CultureInfo.InvariantCulture));
            }
        }

        var package = string.IsNullOrEmpty(result.Package) ? string.Empty : $" ({result.Package})";
        properties.Add("title=" + EscapeProperty(result.Check + package));

        var message = new StringBuilder(result.Message.Trim());
        if (!string.IsNullOrWhiteSpace(result.Hint))
        {
            message.Append("\nFix: ").Append(result.Hint.Trim());
        }

        if (ReportFacts.IsWebUrl(result.Standard.Url))
        {
            message.Append("\nStandard: ").Append(result.Standard.Name).Append(' ').Append(result.Standard.Url);
        }

        return $"::{Command(result.Severity)} {string.Join(',', properties)}::{EscapeData(message.ToString())}";
    }

    /// <summary>A command's message (its "data"): <c>%</c>, CR, LF percent-encoded; other controls visible.</summary>
    public static string EscapeData(string? text) =>
        VisibleControls.ForLog(text, kept: "\r\n")
            .Replace("%", "%25", StringComparison.Ordinal)
            .Replace("\r", "%0D", StringComparison.Ordinal)
            .Replace("\n", "%0A", StringComparison.Ordinal);

    /// <summary>A property value: as <see cref="EscapeData"/>, and <c>:</c>, <c>,</c> percent-encoded.</summary>
    public static string EscapeProperty(string? text) =>
        EscapeData(text)
            .Replace(":", "%3A", StringComparison.Ordinal)
            .Replace(",", "%2C", StringComparison.Ordinal);
}
