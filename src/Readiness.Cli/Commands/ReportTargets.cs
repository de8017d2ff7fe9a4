using Readiness.Core.Configuration;

namespace Readiness.Cli.Commands;

/// <summary>
/// Where one run's report goes, from <c>--format</c> and the repeatable <c>--output</c>: <c>--output FILE</c> takes
/// <c>--format</c> (else the format its extension names), <c>--output FORMAT=FILE</c> names its own. When no plain
/// <c>--output FILE</c> takes <c>--format</c>, the report in that format goes to standard output as well; with no
/// option at all, it goes there in the default format. So CI writes SARIF, JUnit and JSON from one inspection.
/// </summary>
public static class ReportTargets
{
    /// <param name="format">The <c>--format</c> value, if given.</param>
    /// <param name="outputs">The <c>--output</c> values, in order.</param>
    /// <param name="formats">The known format names.</param>
    /// <param name="defaultFormat">The format for standard output when <paramref name="format"/> is not given.</param>
    public static IReadOnlyList<ReportTarget> Plan(string? format, IReadOnlyList<string> outputs, IReadOnlyList<string> formats, string defaultFormat)
    {
        ArgumentNullException.ThrowIfNull(outputs);
        ArgumentNullException.ThrowIfNull(formats);
        var targets = new List<ReportTarget>();
        var formatUsed = false;
        foreach (var output in outputs)
        {
            if (string.IsNullOrWhiteSpace(output))
            {
                throw Usage("--output needs a FILE or FORMAT=FILE");
            }

            var equals = output.IndexOf('=', StringComparison.Ordinal);
            var named = equals > 0 ? formats.FirstOrDefault(f => string.Equals(f, output[..equals], StringComparison.OrdinalIgnoreCase)) : null;
            if (named is not null)
            {
                var file = output[(equals + 1)..];
                if (file.Length == 0)
                {
                    throw Usage($"--output {output}: name the file after '='");
                }

                targets.Add(new ReportTarget(named, file));
            }
            else
            {
                targets.Add(new ReportTarget(format ?? FromExtension(output), output));
                formatUsed |= format is not null;
            }
        }

        var duplicate = targets.GroupBy(t => Path.GetFullPath(t.File!)).FirstOrDefault(g => g.Count() > 1);
        if (duplicate is not null)
        {
            throw Usage($"--output names {duplicate.First().File} twice");
        }

        if (targets.Count == 0 || (format is not null && !formatUsed))
        {
            targets.Insert(0, new ReportTarget(format ?? defaultFormat, null));
        }

        return targets;
    }

    /// <summary>The format a file's extension names: .json, .sarif, .xml (JUnit), .html, .md; anything else is text.</summary>
    public static string FromExtension(string file) => Path.GetExtension(file).ToLowerInvariant() switch
    {
        ".json" => "json",
        ".sarif" => "sarif",
        ".xml" => "junit",
        ".html" or ".htm" => "html",
        ".md" or ".markdown" => "markdown",
        _ => "text",
    };

    private static ConfigurationException Usage(string problem) => new(new ConfigMark("(command line)", 1, 1), problem);
}
