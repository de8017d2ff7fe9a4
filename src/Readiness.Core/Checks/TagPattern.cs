namespace Readiness.Core.Checks;

/// <summary>A release tag pattern such as <c>v{version}</c> or <c>{id}/v{version}</c>.</summary>
public sealed record TagPattern(string Pattern)
{
    public static TagPattern Default { get; } = new(Configuration.RepositoryConfig.DefaultTagPattern);

    public bool IsPerPackage => Pattern.Contains("{id}", StringComparison.Ordinal);

    /// <summary>The (package id, version text) a tag name carries, or null when it does not match.</summary>
    public (string? Id, string Version)? Match(string tagName)
    {
        ArgumentNullException.ThrowIfNull(tagName);
        var versionAt = Pattern.IndexOf("{version}", StringComparison.Ordinal);
        var prefix = Pattern[..versionAt];
        var suffix = Pattern[(versionAt + "{version}".Length)..];
        string? id = null;
        var idAt = prefix.IndexOf("{id}", StringComparison.Ordinal);
        if (idAt >= 0)
        {
            var before = prefix[..idAt];
            var after = prefix[(idAt + 4)..];
            if (!tagName.StartsWith(before, StringComparison.Ordinal))
            {
                return null;
            }

            var afterAt = tagName.IndexOf(after, before.Length, StringComparison.Ordinal);
            if (after.Length == 0 || afterAt <= before.Length)
            {
                return null;
            }

            id = tagName[before.Length..afterAt];
            prefix = tagName[..(afterAt + after.Length)];
        }

        if (!tagName.StartsWith(prefix, StringComparison.Ordinal) || !tagName.EndsWith(suffix, StringComparison.Ordinal)
            || tagName.Length <= prefix.Length + suffix.Length)
        {
            return null;
        }

        var version = tagName[prefix.Length..(tagName.Length - suffix.Length)];
        return IsReleaseVersion(version) ? (id, version) : null;
    }

    /// <summary>
    /// A version a release carries: at least MAJOR.MINOR, as NuGet parses it (SemVer 2.0.0 §2, with NuGet's
    /// four-part form). A bare build number such as <c>1234</c> or a word is not a release.
    /// </summary>
    public static bool IsReleaseVersion(string version) =>
        version.Length > 0 && char.IsAsciiDigit(version[0]) && version.Split('-', '+')[0].Contains('.', StringComparison.Ordinal)
        && NuGet.Versioning.NuGetVersion.TryParse(version, out _);

    public string Format(string version, string? id = null) =>
        Pattern.Replace("{version}", version, StringComparison.Ordinal).Replace("{id}", id ?? string.Empty, StringComparison.Ordinal);

    /// <summary>A shell glob that matches every tag of this pattern (for the pre-push hook).</summary>
    public string Glob => Pattern.Replace("{version}", "*", StringComparison.Ordinal).Replace("{id}", "*", StringComparison.Ordinal);
}
