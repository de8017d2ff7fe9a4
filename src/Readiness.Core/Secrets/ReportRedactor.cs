using Readiness.Core.Reports;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Secrets;

/// <summary>
/// Once the secrets check has flagged a file, the flagged values are known: this removes every occurrence of them
/// from the whole report (messages, hints, package ids, evidence, notes, the version and tag), wherever another check
/// happened to quote the same text.
/// </summary>
public static class ReportRedactor
{
    public const string Replacement = "[redacted secret]";

    /// <summary>The report with every value the secrets check flagged (re-read from the flagged files) replaced.</summary>
    public static Report Redact(Report report, IFileTree files)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(files);
        var flagged = report.Results
            .Where(r => r.Check == Checks.CheckIds.SecretsNoneCommitted && r.Status == CheckStatus.Fail)
            .SelectMany(r => r.Evidence.Select(e => e.Path))
            .Distinct(StringComparer.Ordinal)
            .ToList();
        var values = new HashSet<string>(StringComparer.Ordinal);
        foreach (var path in flagged)
        {
            var bytes = files.SizeOf(path) is { } size && size <= FileLimits.ScanMaxBytes ? files.ReadBytes(path, FileLimits.ScanMaxBytes) : null;
            if (bytes is not null)
            {
                var utf16 = SecretScanner.Utf16WithoutMark(bytes);
                values.UnionWith(SecretScanner.MatchedValues(utf16 is null ? FileTreeExtensions.Decode(bytes) : utf16.GetString(bytes)));
            }
        }

        return values.Count == 0 ? report : Apply(report, [.. values.OrderByDescending(v => v.Length)]);
    }

    /// <summary>Replaces each of <paramref name="values"/> (longest first) in every text of the report.</summary>
    public static Report Apply(Report report, IReadOnlyList<string> values)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(values);
        string? Clean(string? text)
        {
            if (string.IsNullOrEmpty(text))
            {
                return text;
            }

            foreach (var value in values)
            {
                text = text.Replace(value, Replacement, StringComparison.Ordinal);
            }

            return text;
        }

        return report with
        {
            Subject = report.Subject with { Tag = Clean(report.Subject.Tag), Version = Clean(report.Subject.Version), Ref = Clean(report.Subject.Ref)! },
            Results = [.. report.Results.Select(r => r with
            {
                Message = Clean(r.Message)!,
                Hint = Clean(r.Hint),
                Package = Clean(r.Package),
                Evidence = [.. r.Evidence.Select(e => e with { Path = Clean(e.Path)! })],
            })],
            Notes = [.. report.Notes.Select(n => Clean(n)!)],
        };
    }
}
