using System.Globalization;

using NuGet.Frameworks;

using Readiness.Core.Matrix;
using Readiness.Core.Projects;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Matrix;

/// <summary>
/// No target framework of a packable project is out of support on the release date (the tag date, else today);
/// with <c>require-targets</c>, each required target is present.
/// </summary>
public sealed class SupportedTargetsCheck : ICheck
{
    /// <summary>Support ending within this many days of the release is noted on a passing result.</summary>
    public const int SoonDays = 183;

    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.MatrixSupportedTargets,
        "Every target framework is in support on the release date",
        Severity.Warn,
        Standards.DotNetLifecycle,
        "A target whose runtime is out of support gets no security fixes; shipping for it invites users to stay on it, "
        + "and the SDK warns about it (NETSDK1138).",
        "Drop the out-of-support targets from TargetFrameworks (net8.0 or later, plus netstandard2.0 for breadth, is "
        + "the current library guidance), or release before the end-of-support date.")
    {
        Settings = ["require-targets"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var required = context.Parameters.Strings("require-targets");
        var date = DateOnly.FromDateTime(context.Release.Date.UtcDateTime);
        var dateSource = context.Release.Tag is { } tag ? $"the date of tag {tag.Name}" : "today";
        foreach (var project in context.Projects.Packable)
        {
            yield return Judge(project, required, date, dateSource);
        }
    }

    /// <summary>The target frameworks of a project, each parsed by NuGet.Frameworks (unsupported ones included).</summary>
    public static IReadOnlyList<(string Text, NuGetFramework Framework)> Targets(ProjectInfo project)
    {
        ArgumentNullException.ThrowIfNull(project);
        return project.TargetFrameworks.Select(t => (t, NuGetFramework.Parse(t))).ToArray();
    }

    /// <summary>Where the project declares its targets: the TargetFrameworks or TargetFramework property.</summary>
    public static Evidence TargetEvidence(ProjectInfo project)
    {
        ArgumentNullException.ThrowIfNull(project);
        var p = project.Property("TargetFrameworks") is { Value.Length: > 0 } many ? many : project.Property("TargetFramework");
        return p is null ? new Evidence(project.Path) : new Evidence(p.Location.Path, p.Location.Line);
    }

    private Finding Judge(ProjectInfo project, IReadOnlyList<string> required, DateOnly date, string dateSource)
    {
        var evidence = TargetEvidence(project);
        var targets = Targets(project);
        if (targets.Count == 0)
        {
            return Finding.Skip("No target framework is declared (or it could not be evaluated).", project.PackageId, evidence);
        }

        var failures = new List<string>();
        var notes = new List<string>();
        foreach (var (text, framework) in targets)
        {
            if (framework.IsUnsupported)
            {
                failures.Add($"'{text}' is not a target framework NuGet recognises");
                continue;
            }

            var support = FrameworkLifecycle.Find(framework);
            if (support is null)
            {
                notes.Add($"{text}: no end-of-support date known");
            }
            else if (support.EndOfSupport is not { } end)
            {
                notes.Add($"{text} ({support.Name}): no end date");
            }
            else if (end < date)
            {
                failures.Add($"{text} ({support.Name}) went out of support on {Iso(end)}, before {dateSource} ({Iso(date)}); source: {support.Source}");
            }
            else if (end.DayNumber - date.DayNumber <= SoonDays)
            {
                notes.Add($"{text} ({support.Name}) leaves support on {Iso(end)}, {end.DayNumber - date.DayNumber} days after {Iso(date)}");
            }
            else
            {
                notes.Add($"{text} supported until {Iso(end)}");
            }
        }

        foreach (var want in required)
        {
            var wanted = NuGetFramework.Parse(want);
            if (!targets.Any(t => t.Framework.Equals(wanted)))
            {
                failures.Add($"the required target {want} (require-targets) is missing");
            }
        }

        var summary = notes.Count == 0 ? string.Empty : " " + string.Join("; ", notes) + ".";
        return failures.Count > 0
            ? Finding.Fail(string.Join("; ", failures) + "." + summary, Descriptor.Fix, project.PackageId, evidence)
            : Finding.Pass($"All {targets.Count} targets are in support on {Iso(date)} ({dateSource}).{summary}", project.PackageId, evidence);
    }

    private static string Iso(DateOnly date) => date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
}
