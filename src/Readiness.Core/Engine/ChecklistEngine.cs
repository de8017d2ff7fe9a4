using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Reports;

namespace Readiness.Core.Engine;

/// <summary>
/// Runs a resolved checklist over a snapshot. Stateless and thread-safe: one instance serves every run.
/// A check that throws gives an <c>error</c> result for that check; the run goes on.
/// </summary>
public sealed class ChecklistEngine(CheckCatalog catalog, TimeProvider time)
{
    public static readonly StandardReference ManualStandard =
        new("Manual confirmation (no published standard)", string.Empty);

    public CheckCatalog Catalog => catalog;

    public Report Run(EngineInput input)
    {
        ArgumentNullException.ThrowIfNull(input);
        var now = time.GetUtcNow();
        var results = new List<CheckResult>();
        foreach (var planned in input.Checklist.Checks)
        {
            var check = catalog.Find(planned.Id);
            if (check is null)
            {
                continue;
            }

            results.AddRange(RunOne(check, planned, input, now));
        }

        var unconfirmedBlocking = 0;
        foreach (var item in input.Checklist.Manual)
        {
            var confirmed = input.Confirmed.Contains(item.Id);
            if (!confirmed && item.Severity == Severity.Block)
            {
                unconfirmedBlocking++;
            }

            results.Add(new CheckResult(
                "manual." + item.Id,
                item.Text,
                confirmed ? CheckStatus.Pass : CheckStatus.Manual,
                item.Severity,
                null,
                confirmed ? "Confirmed by a person." : "A person must confirm this before the release.",
                confirmed ? null : $"Confirm with --confirm {item.Id}, or tick the box in the release pull request.",
                [],
                ManualStandard));
        }

        var summary = ReportSummary.From(results, unconfirmedBlocking);
        var subject = new ReportSubject(
            input.Snapshot.Repository,
            input.Snapshot.Commit,
            input.Snapshot.Ref,
            input.Release.Tag?.Name,
            input.Release.Version,
            input.Checklist.Name,
            input.Snapshot.Inspected);
        return new Report(subject, summary.Blocking == 0, summary, results, now, input.Notes);
    }

    private static IEnumerable<CheckResult> RunOne(ICheck check, PlannedCheck planned, EngineInput input, DateTimeOffset now)
    {
        var d = check.Descriptor;
        List<Finding> findings;
        try
        {
            var context = new CheckContext(
                input.Snapshot,
                input.Projects,
                input.Release,
                new CheckParameters(planned.With, input.Config),
                input.Registry,
                now);
            findings = check.Run(context).ToList();
        }
#pragma warning disable CA1031 // a failing check must not stop the run (style.md: errors become results)
        catch (Exception e)
#pragma warning restore CA1031
        {
            findings = [Finding.Error($"The check could not run: {e.GetType().Name}: {e.Message}")];
        }

        if (findings.Count == 0)
        {
            var unreadable = input.Projects.Problems.Count(p => p.Kind == Projects.ProjectProblemKind.Unreadable);
            findings.Add(Finding.Skip(unreadable > 0
                ? $"Nothing to check among the projects that were read: {unreadable} project file(s) could not be read ({CheckIds.BuildReadable} names them)."
                : "Nothing to check: no subject this check applies to."));
        }

        return findings.Select(f => new CheckResult(
            d.Id,
            d.Title,
            f.Status,
            planned.Severity,
            f.Package,
            f.Message,
            f.Status is CheckStatus.Fail or CheckStatus.Error ? f.Hint ?? d.Fix : f.Hint,
            Evidence.Condense(f.Evidence ?? []),
            d.Standard));
    }
}
