using NuGet.Versioning;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Version;

/// <summary>The version is above every earlier release tag in the commit's history (SemVer precedence).</summary>
public sealed class VersionMovesForwardCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.VersionMovesForward,
        "The version moves forward",
        Severity.Block,
        Standards.SemVer,
        "Consumers' tools take the highest version as the newest. A release numbered at or below an earlier one is "
        + "never picked up as an update, or collides with a version already published (SemVer §11 precedence).",
        "Choose a version above the newest earlier release tag (bump PATCH, MINOR or MAJOR as SemVer says).");

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var release = context.Release;
        if (release.Version is null || !NuGetVersion.TryParse(release.Version, out var candidate))
        {
            yield return Finding.Skip(release.Version is null
                ? "No candidate version (no tag, no --version, no declared version)."
                : $"The candidate version '{release.Version}' cannot be compared (see version.well-formed).");
            yield break;
        }

        var releasedId = release.Tag is { } tag ? release.TagPattern.Match(tag.Name)?.Id : null;
        var earlier = context.Snapshot.Tags
            // Tags on the release commit itself (a second name for the same release) are never earlier than it;
            // tags that carry no release version (build numbers, words) never match the pattern (TagPattern.Match).
            .Where(t => (release.Tag is null || t.Name != release.Tag.Name) && t.TargetCommit != context.Snapshot.Commit)
            .Select(t => (Tag: t, Match: release.TagPattern.Match(t.Name)))
            .Where(x => x.Match is not null
                && (releasedId is null || string.Equals(x.Match.Value.Id, releasedId, StringComparison.OrdinalIgnoreCase)))
            .Select(x => (x.Tag, Version: NuGetVersion.TryParse(x.Match!.Value.Version, out var v) ? v : null))
            .Where(x => x.Version is not null)
            .ToList();
        if (earlier.Count == 0)
        {
            yield return Finding.Pass($"{candidate} is the first release tagged in this history.", releasedId);
            yield break;
        }

        // SemVer 2.0.0 §11 precedence, build metadata ignored (VersionComparer.VersionRelease).
        var newest = earlier.MaxBy(x => x.Version!, VersionComparer.VersionRelease);
        var compare = VersionComparer.VersionRelease.Compare(candidate, newest.Version);
        yield return compare > 0
            ? Finding.Pass($"{candidate} is above the newest earlier release {newest.Tag.Name}.", releasedId)
            : Finding.Fail(
                compare == 0
                    ? $"{candidate} was already released as {newest.Tag.Name} (commit {newest.Tag.TargetCommit[..Math.Min(7, newest.Tag.TargetCommit.Length)]})."
                    : $"{candidate} is below the earlier release {newest.Tag.Name}.",
                $"Release a version above {newest.Version!.ToNormalizedString()}, e.g. {Bump(newest.Version!)}.",
                releasedId);
    }

    private static string Bump(NuGetVersion v) =>
        v.IsPrerelease ? new NuGetVersion(v.Major, v.Minor, v.Patch).ToNormalizedString() : new NuGetVersion(v.Major, v.Minor, v.Patch + 1).ToNormalizedString();
}
