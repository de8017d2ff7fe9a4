using NuGet.Versioning;

using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Registry;

/// <summary>
/// The version is above the newest published version of its line. Without configuration the line is every published
/// version of the id; <c>maintenance-lines</c> (<c>1.x</c>, <c>2.3.x</c>) declare older lines that still get releases,
/// and a version inside one is compared only with the published versions of that line.
/// </summary>
public sealed class RegistryAheadOfPublishedCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.RegistryAheadOfPublished,
        "The version is ahead of what is published",
        Severity.Warn,
        Standards.NuGetVersioning,
        "Consumers' tools pick the highest version that satisfies a range; a release below an already published version "
        + "of the same line is never chosen by a floating or open range, and usually means a version bump was forgotten.",
        "Release a version above the newest published one; for a patch release of an older line, declare the line under "
        + "maintenance-lines (e.g. [\"2.3.x\"]) in .readiness.yml.")
    {
        Settings = ["maintenance-lines", "registry-required"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (RegistrySubjects.Unavailable(context) is { } skip)
        {
            yield return skip;
            yield break;
        }

        var lines = new List<MaintenanceLine>();
        foreach (var text in context.Parameters.Strings("maintenance-lines"))
        {
            if (MaintenanceLine.Parse(text) is { } line)
            {
                lines.Add(line);
            }
            else
            {
                yield return Finding.Error($"maintenance-lines: '{text}' is not a line such as 1.x or 2.3.x.");
                yield break;
            }
        }

        var source = context.Registry!.Source;
        foreach (var project in context.Projects.Packable)
        {
            var id = project.PackageId;
            var (version, text, noVersion) = RegistrySubjects.CandidateVersion(context, project);
            if (noVersion is not null)
            {
                yield return noVersion;
                continue;
            }

            var (lookup, noAnswer) = RegistrySubjects.Lookup(context, id, id);
            if (lookup is null)
            {
                yield return noAnswer!;
                continue;
            }

            var evidence = new Evidence(project.Path);
            var line = lines.Where(l => l.Contains(version!)).OrderByDescending(l => l.Depth).FirstOrDefault();
            var scope = line is null ? $"of {id}" : $"of line {line.Text} (maintenance-lines)";
            var inLine = RegistrySubjects.Parsed(lookup).Where(p => line is null || line.Contains(p.Version)).ToArray();
            if (inLine.Length == 0)
            {
                yield return Finding.Pass($"{id} {text} is the first published version {scope} on {source}.", id, evidence);
                continue;
            }

            // NuGet precedence (VersionComparer.Default): SemVer 2.0.0 order, labels case-insensitive, metadata ignored.
            var newest = inLine.MaxBy(p => p.Version);
            var newestText = newest.Version.ToNormalizedString() + (newest.Entry.Listed == false ? " (unlisted)" : string.Empty);
            if (version! > newest.Version)
            {
                yield return Finding.Pass($"{id} {text} is above {newestText}, the newest published version {scope}.", id, evidence);
            }
            else
            {
                yield return Finding.Fail(
                    $"{id} {text} is not above {newestText}, the newest published version {scope} on {source}.",
                    Descriptor.Fix,
                    id,
                    evidence);
            }
        }
    }

    /// <summary>A declared release line: <c>2.x</c> (one major) or <c>2.3.x</c> (one minor).</summary>
    private sealed record MaintenanceLine(string Text, int Major, int? Minor)
    {
        public int Depth => Minor is null ? 1 : 2;

        public bool Contains(NuGetVersion version) => version.Major == Major && (Minor is null || version.Minor == Minor);

        public static MaintenanceLine? Parse(string text)
        {
            var parts = text.Trim().Split('.');
            if (parts.Length is < 2 or > 3 || parts[^1] is not ("x" or "X" or "*")
                || !int.TryParse(parts[0], System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var major))
            {
                return null;
            }

            if (parts.Length == 2)
            {
                return new MaintenanceLine(text.Trim(), major, null);
            }

            return int.TryParse(parts[1], System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var minor)
                ? new MaintenanceLine(text.Trim(), major, minor)
                : null;
        }
    }
}
