using System.Text.RegularExpressions;

using NuGet.Versioning;

namespace Readiness.Core.Dependencies;

/// <summary>Host major versions: the one a version or range resolves to, and the one a package id or version marks.</summary>
public static partial class HostMajor
{
    /// <summary>
    /// The single major version that <paramref name="versionOrRange"/> admits (NuGet range syntax, floating
    /// versions included), or null with a reason when it admits none or several.
    /// </summary>
    public static (int? Major, string? Problem) Resolve(string? versionOrRange)
    {
        if (string.IsNullOrWhiteSpace(versionOrRange))
        {
            return (null, "no version is given");
        }

        if (versionOrRange.Contains("$(", StringComparison.Ordinal))
        {
            return (null, $"'{versionOrRange}' could not be evaluated statically");
        }

        if (!VersionRange.TryParse(versionOrRange, allowFloating: true, out var range))
        {
            return (null, $"'{versionOrRange}' is not a NuGet version or range");
        }

        if (range.MinVersion is not { } min)
        {
            return (null, $"'{versionOrRange}' has no lower bound");
        }

        if (range.MaxVersion is { } max)
        {
            // [3.0.0, 4.0.0) stays inside major 3; [3.0.0, 4.0.0] or [3.0.0, 5.0.0) does not.
            var inside = max.Major == min.Major
                || (max.Major == min.Major + 1 && !range.IsMaxInclusive && max.Minor == 0 && max.Patch == 0 && max.Revision == 0 && !max.IsPrerelease);
            return inside ? (min.Major, null) : (null, $"'{versionOrRange}' admits more than one major version");
        }

        return (min.Major, null);
    }

    /// <summary>The trailing number of a package id (<c>Bramble.Sketches.Lanternfly3</c> → 3), or null.</summary>
    public static int? FromIdSuffix(string packageId)
    {
        ArgumentNullException.ThrowIfNull(packageId);
        var m = TrailingNumber().Match(packageId);
        return m.Success && int.TryParse(m.Value, out var n) ? n : null;
    }

    /// <summary>The trailing number of a version's pre-release label or build metadata (<c>2.4.0+host3</c> → 3), or null.</summary>
    public static int? FromVersionSuffix(string version)
    {
        ArgumentNullException.ThrowIfNull(version);
        if (!NuGetVersion.TryParse(version, out var v))
        {
            return null;
        }

        foreach (var part in new[] { v.Metadata, v.Release })
        {
            if (!string.IsNullOrEmpty(part) && FromIdSuffix(part) is { } n)
            {
                return n;
            }
        }

        return null;
    }

    [GeneratedRegex("[0-9]+$", RegexOptions.CultureInvariant)]
    private static partial Regex TrailingNumber();
}
