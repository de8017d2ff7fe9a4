using System.Text;
using Readiness.Core.Reports;
using Readiness.Rendering;

namespace Readiness.Cli.Commands;

/// <summary>
/// Inside a CI job that reads workflow commands (<c>GITHUB_ACTIONS=true</c>): one annotation line per failure, and the
/// Markdown report appended to the job summary file named by <c>GITHUB_STEP_SUMMARY</c>. Nothing happens elsewhere.
/// </summary>
public sealed class WorkflowIntegration(CliConsole console)
{
    public const string ActionsVariable = "GITHUB_ACTIONS";
    public const string SummaryVariable = "GITHUB_STEP_SUMMARY";

    public bool Active => console.Env(ActionsVariable) == "true";

    /// <param name="reportOnStandardOutput">The report itself went to standard output, so the annotations go to
    /// standard error (the runner reads commands from both) and the report stays parseable.</param>
    public async Task WriteAsync(Report report, bool reportOnStandardOutput, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(report);
        if (!Active)
        {
            return;
        }

        var annotations = reportOnStandardOutput ? console.Error : console.Out;
        new WorkflowAnnotations().Render(report, annotations);
        await annotations.FlushAsync(cancellationToken).ConfigureAwait(false);

        if (console.Env(SummaryVariable) is { } summary)
        {
            using var markdown = new StringWriter();
            new MarkdownRenderer().Render(report, markdown);
            var file = console.FullPath(summary);
            await File.AppendAllTextAsync(file, markdown + "\n", new UTF8Encoding(false), cancellationToken).ConfigureAwait(false);
        }
    }
}
