using System.Globalization;
using System.Text.RegularExpressions;

using NuGet.Frameworks;

namespace Readiness.Core.Matrix;

/// <summary>SDK version texts as CI files write them, and which targets an SDK can build.</summary>
public static partial class SdkVersions
{
    /// <summary>
    /// The major version of an SDK spec as <c>actions/setup-dotnet</c> accepts it (<c>8</c>, <c>8.0</c>, <c>8.x</c>,
    /// <c>8.0.x</c>, <c>8.0.1xx</c>, <c>8.0.100</c>, <c>9.0.100-rc.1.24452.12</c>), or null.
    /// </summary>
    public static int? Major(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var m = Spec().Match(text.Trim());
        return m.Success && int.TryParse(m.Groups[1].Value, NumberStyles.None, CultureInfo.InvariantCulture, out var major) ? major : null;
    }

    /// <summary>
    /// An SDK of major N builds .NET N and older (an SDK cannot target a newer runtime than its own: NETSDK1045);
    /// .NET Standard and .NET Framework targets build with any SDK since 2.0 (reference assemblies come as packages).
    /// </summary>
    public static bool CanBuild(int sdkMajor, NuGetFramework framework)
    {
        ArgumentNullException.ThrowIfNull(framework);
        return framework.Framework == FrameworkConstants.FrameworkIdentifiers.NetCoreApp
            ? sdkMajor >= framework.Version.Major
            : sdkMajor >= 2;
    }

    [GeneratedRegex(@"^v?([0-9]{1,3})(?:\.(?:[0-9]+|x|\*)(?:\.(?:[0-9]+|[0-9]xx|x|\*))?(?:-[0-9A-Za-z.-]+)?|\.x)?$", RegexOptions.CultureInvariant)]
    private static partial Regex Spec();
}
