using NuGet.Versioning;
using Readiness.Core.Reports;
using Readiness.Core.Versioning;

namespace Readiness.Core.Checks.Version;

/// <summary>The release tag carries the version each packable project declares.</summary>
public sealed class VersionMatchesTagCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.VersionMatchesTag,
        "The release tag matches the declared version",
        Severity.Block,
        Standards.NuGetVersioning,
        "The tag is what people and tools read as the release; the package carries the version the project declares. "
        + "When they differ, the published package and the tagged source disagree, and the next release's numbering breaks.",
        "Set the version in the project (PackageVersion, Version or VersionPrefix) to the tag's version, or move the tag.")
    {
        Settings = ["tag-pattern"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var tag = context.Release.Tag;
        var match = tag is null ? null : context.Release.TagPattern.Match(tag.Name);
        // Before tagging, --version is the release's version: the files must already say it (a forgotten bump fails).
        var candidate = match?.Version
            ?? (tag is null && context.Release.VersionSource == ReleaseFacts.VersionOptionSource ? context.Release.Version : null);
        var says = match is not null ? $"Tag {tag!.Name} says {match.Value.Version}" : $"--version says {candidate}";
        foreach (var project in context.Projects.Packable)
        {
            var declared = DeclaredVersion.Of(project);
            var evidence = declared.Location is { } l ? new Evidence(l.Path, l.Line) : new Evidence(project.Path);
            if (candidate is null)
            {
                yield return Finding.Skip(
                    tag is null
                        ? "No release tag at this commit; nothing to compare (pass --tag or --version, or tag the commit)."
                        : $"Tag {tag.Name} does not match the tag pattern {context.Release.TagPattern.Pattern}.",
                    project.PackageId,
                    evidence);
                continue;
            }

            if (match?.Id is { } taggedId && !string.Equals(taggedId, project.PackageId, StringComparison.OrdinalIgnoreCase))
            {
                yield return Finding.Skip($"Tag {tag!.Name} releases {taggedId}, not this package.", project.PackageId, evidence);
                continue;
            }

            if (VersionSourceDetector.ExternalSource(project, context.Snapshot.Files, declared) is { } external)
            {
                yield return Finding.Pass($"Not compared: {external}.", project.PackageId, evidence);
                continue;
            }

            if (declared.Value is null)
            {
                yield return Finding.Fail(
                    $"{says}, but the project declares no version (the SDK would pack 1.0.0).",
                    $"Add <Version>{candidate}</Version> to {project.Path} or to the Directory.Build.props above it.",
                    project.PackageId,
                    evidence);
                continue;
            }

            if (declared.Unevaluated is { } why)
            {
                yield return Finding.Skip($"{declared.Property} could not be evaluated statically ({why}).", project.PackageId, evidence);
                continue;
            }

            var same = NuGetVersion.TryParse(declared.Value, out var d) && NuGetVersion.TryParse(candidate, out var t)
                && VersionComparer.VersionRelease.Equals(d, t);
            yield return same
                ? Finding.Pass($"{declared.Property} {declared.Value} matches {(tag is null ? "--version" : "tag " + tag.Name)}.", project.PackageId, evidence)
                : Finding.Fail(
                    $"{says}, but {declared.Property} is {declared.Value} at {declared.Location}.",
                    tag is null
                        ? $"Bump {declared.Property} at {declared.Location} to {candidate} before tagging, or release {declared.Value}."
                        : $"Change {declared.Property} at {declared.Location} to {candidate}, or tag the release as {context.Release.TagPattern.Format(declared.Value, project.PackageId)}.",
                    project.PackageId,
                    evidence);
        }
    }
}
