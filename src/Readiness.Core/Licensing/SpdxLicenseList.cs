using System.Collections.Frozen;

using NuGet.Packaging.Licenses;

namespace Readiness.Core.Licensing;

/// <summary>
/// The SPDX license and exception lists as NuGet.Packaging embeds them (<see cref="NuGetLicenseData"/>), looked up
/// case-insensitively as SPDX requires for ids (NuGet's own parser matches them case-sensitively).
/// </summary>
public static class SpdxLicenseList
{
    private static readonly FrozenDictionary<string, LicenseData> Licenses =
        NuGetLicenseData.LicenseList.Values.ToFrozenDictionary(l => l.LicenseID, StringComparer.OrdinalIgnoreCase);

    private static readonly FrozenDictionary<string, ExceptionData> Exceptions =
        NuGetLicenseData.ExceptionList.Values.ToFrozenDictionary(e => e.LicenseExceptionID, StringComparer.OrdinalIgnoreCase);

    /// <summary>The list version NuGet.Packaging carries.</summary>
    public static string Version => NuGetLicenseData.LicenseListVersion;

    /// <summary>The license with this id in any case, or null.</summary>
    public static LicenseData? License(string id) => Licenses.GetValueOrDefault(id);

    /// <summary>The exception with this id in any case, or null.</summary>
    public static ExceptionData? Exception(string id) => Exceptions.GetValueOrDefault(id);
}
