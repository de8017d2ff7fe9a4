using NuGet.Versioning;
using Readiness.Core.Reports;
using Readiness.Core.Versioning;

namespace Readiness.Core.Checks.Version;

/// <summary>Packable projects released together declare the same version.</summary>
public sealed class VersionConsistentCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.VersionConsistent,
        "Packages released together share one version",
        Severity.Warn,
        Standards.SemVer,
        "Packages released from one tag are expected to carry that one version; a package left behind ships with an "
        + "old number and its dependants resolve a mix of releases.",
        "Declare the version once (Directory.Build.props) for all packages released together, or use per-package tags ({id}/v{version}).");

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (context.Release.TagPattern.IsPerPackage)
        {
            yield return Finding.Skip($"Packages are tagged one by one ({context.Release.TagPattern.Pattern}); each keeps its own version.");
            yield break;
        }

        var declared = context.Projects.Packable
            .Select(p => (Project: p, Version: DeclaredVersion.Of(p)))
            .Where(x => x.Version.Value is not null && x.Version.Unevaluated is null
                && VersionSourceDetector.ExternalSource(x.Project, context.Snapshot.Files, x.Version) is null)
            .ToList();
        if (declared.Count < 2)
        {
            yield return Finding.Skip($"{declared.Count} packable project{(declared.Count == 1 ? string.Empty : "s")} with a declared version; nothing to compare.");
            yield break;
        }

        var groups = declared
            .GroupBy(x => NuGetVersion.TryParse(x.Version.Value, out var v) ? v.ToNormalizedString() : x.Version.Value!, StringComparer.OrdinalIgnoreCase)
            .OrderByDescending(g => g.Count())
            .ToList();
        var evidence = declared.Select(x => new Evidence(x.Version.Location!.Path, x.Version.Location.Line)).Distinct().ToArray();
        if (groups.Count == 1)
        {
            yield return Finding.Pass($"All {declared.Count} packable projects declare {groups[0].Key}.", null, evidence);
            yield break;
        }

        var majority = groups[0].Key;
        foreach (var odd in groups.Skip(1).SelectMany(g => g))
        {
            yield return Finding.Fail(
                $"{odd.Project.PackageId} declares {odd.Version.Value} while {groups[0].Count()} other package(s) declare {majority}.",
                $"Set {odd.Version.Property} at {odd.Version.Location} to the release version, or declare it once in Directory.Build.props.",
                odd.Project.PackageId,
                new Evidence(odd.Version.Location!.Path, odd.Version.Location.Line));
        }
    }
}
