using NuGet.Versioning;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Checks;

/// <summary>What the engine settled about the release before checks run.</summary>
/// <param name="Tag">The release tag, if any.</param>
/// <param name="TagVersion">The version the tag carries (text after the pattern's prefix), if any.</param>
/// <param name="Version">The candidate version: --version, else the tag's, else the declared one.</param>
/// <param name="VersionSource">Where <paramref name="Version"/> came from, for messages.</param>
/// <param name="Date">The release date: the tagger date, else the commit date of a tag, else today.</param>
/// <param name="TagPattern">The tag pattern in force.</param>
/// <param name="TagPatternSource">How the pattern was chosen (configured, inferred from the tags, default), for the report.</param>
public sealed record ReleaseFacts(
    TagInfo? Tag,
    string? TagVersion,
    string? Version,
    string VersionSource,
    DateTimeOffset Date,
    TagPattern TagPattern,
    string TagPatternSource = "tag pattern from the configuration")
{
    /// <summary>The <see cref="VersionSource"/> of a version given on the command line.</summary>
    public const string VersionOptionSource = "--version";

    /// <summary>The candidate version parsed leniently as NuGet does, or null.</summary>
    public NuGetVersion? NuGetVersion => NuGet.Versioning.NuGetVersion.TryParse(Version, out var v) ? v : null;

    public bool IsPrerelease => NuGetVersion?.IsPrerelease ?? false;
}
