using NuGet.Versioning;
using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Core.Projects;
using Readiness.Core.Snapshots;
using Readiness.Core.Versioning;

namespace Readiness.Core.Engine;

/// <summary>Settles the release's tag, version and date from the snapshot, the configuration and the command line.</summary>
public static class ReleaseFactsBuilder
{
    public static ReleaseFacts Build(
        ReleaseSnapshot snapshot, ProjectModel projects, RepositoryConfig config, string? versionOverride, DateTimeOffset now)
    {
        ArgumentNullException.ThrowIfNull(snapshot);
        ArgumentNullException.ThrowIfNull(projects);
        ArgumentNullException.ThrowIfNull(config);
        var (pattern, patternSource) = config.Values.ContainsKey("tag-pattern") || config.TagPattern != RepositoryConfig.DefaultTagPattern
            ? (new TagPattern(config.TagPattern), $"tag pattern {config.TagPattern}: from tag-pattern in {RepositoryConfig.FileName}")
            : TagPatternInference.Infer(snapshot, projects);
        var tag = snapshot.Tag ?? FindReleaseTag(snapshot, pattern);
        var tagVersion = tag is null ? null : pattern.Match(tag.Name)?.Version;

        string? version;
        string source;
        if (!string.IsNullOrWhiteSpace(versionOverride))
        {
            version = versionOverride.Trim();
            source = ReleaseFacts.VersionOptionSource;
        }
        else if (tagVersion is not null)
        {
            version = tagVersion;
            source = $"tag {tag!.Name}";
        }
        else
        {
            var declared = projects.Packable.Select(p => (Project: p, Declared: DeclaredVersion.Of(p)))
                .FirstOrDefault(x => x.Declared.Value is not null);
            version = declared.Declared?.Value;
            source = declared.Project is null ? "nothing (no tag, no declared version)" : $"{declared.Declared!.Property} in {declared.Declared.Location}";
        }

        var date = tag?.TaggerDate ?? (tag is not null ? snapshot.CommitDate : now);
        return new ReleaseFacts(tag, tagVersion, version, source, date, pattern, patternSource);
    }

    /// <summary>Among tags at the inspected commit that match the pattern, the one with the highest version.</summary>
    public static TagInfo? FindReleaseTag(ReleaseSnapshot snapshot, TagPattern pattern)
    {
        ArgumentNullException.ThrowIfNull(snapshot);
        ArgumentNullException.ThrowIfNull(pattern);
        return snapshot.Tags
            .Where(t => t.TargetCommit == snapshot.Commit)
            .Select(t => (Tag: t, Match: pattern.Match(t.Name)))
            .Where(x => x.Match is not null)
            .OrderByDescending(x => NuGetVersion.TryParse(x.Match!.Value.Version, out var v) ? v : new NuGetVersion(0, 0, 0))
            .Select(x => x.Tag)
            .FirstOrDefault();
    }
}
