using System.Collections.Frozen;

namespace Readiness.Core.Licensing;

/// <summary>
/// What replaces each deprecated SPDX id (license or exception). Which ids are deprecated comes from the list
/// NuGet.Packaging embeds; the replacements are from memory of the SPDX license list's deprecation notes
/// (https://spdx.org/licenses/, "Deprecated License Identifiers") and should be confirmed there.
/// </summary>
public static class DeprecatedLicenseIds
{
    private static readonly FrozenDictionary<string, string> Replacements = new Dictionary<string, string>
    {
        ["AGPL-1.0"] = "AGPL-1.0-only or AGPL-1.0-or-later",
        ["AGPL-3.0"] = "AGPL-3.0-only or AGPL-3.0-or-later",
        ["GFDL-1.1"] = "GFDL-1.1-only or GFDL-1.1-or-later",
        ["GFDL-1.2"] = "GFDL-1.2-only or GFDL-1.2-or-later",
        ["GFDL-1.3"] = "GFDL-1.3-only or GFDL-1.3-or-later",
        ["GPL-1.0"] = "GPL-1.0-only",
        ["GPL-1.0+"] = "GPL-1.0-or-later",
        ["GPL-2.0"] = "GPL-2.0-only or GPL-2.0-or-later",
        ["GPL-2.0+"] = "GPL-2.0-or-later",
        ["GPL-3.0"] = "GPL-3.0-only or GPL-3.0-or-later",
        ["GPL-3.0+"] = "GPL-3.0-or-later",
        ["LGPL-2.0"] = "LGPL-2.0-only",
        ["LGPL-2.0+"] = "LGPL-2.0-or-later",
        ["LGPL-2.1"] = "LGPL-2.1-only",
        ["LGPL-2.1+"] = "LGPL-2.1-or-later",
        ["LGPL-3.0"] = "LGPL-3.0-only",
        ["LGPL-3.0+"] = "LGPL-3.0-or-later",
        ["GPL-2.0-with-autoconf-exception"] = "GPL-2.0-only WITH Autoconf-exception-2.0",
        ["GPL-2.0-with-bison-exception"] = "GPL-2.0-or-later WITH Bison-exception-2.2",
        ["GPL-2.0-with-classpath-exception"] = "GPL-2.0-only WITH Classpath-exception-2.0",
        ["GPL-2.0-with-font-exception"] = "GPL-2.0-only WITH Font-exception-2.0",
        ["GPL-2.0-with-GCC-exception"] = "GPL-2.0-only WITH GCC-exception-2.0",
        ["GPL-3.0-with-autoconf-exception"] = "GPL-3.0-only WITH Autoconf-exception-3.0",
        ["GPL-3.0-with-GCC-exception"] = "GPL-3.0-only WITH GCC-exception-3.1",
        ["BSD-2-Clause-NetBSD"] = "BSD-2-Clause",
        ["BSD-2-Clause-FreeBSD"] = "BSD-2-Clause-Views",
        ["eCos-2.0"] = "GPL-2.0-or-later WITH eCos-exception-2.0",
        ["wxWindows"] = "GPL-2.0-or-later WITH WxWindows-exception-3.1",
        ["Nunit"] = "Zlib-acknowledgement",
        ["StandardML-NJ"] = "SMLNJ",
        ["bzip2-1.0.5"] = "bzip2-1.0.6",
        ["Nokia-Qt-exception-1.1"] = "Qt-LGPL-exception-1.1",
    }.ToFrozenDictionary(StringComparer.OrdinalIgnoreCase);

    /// <summary>The id(s) to use instead of <paramref name="id"/>, when known.</summary>
    public static string? ReplacementFor(string id)
    {
        ArgumentNullException.ThrowIfNull(id);
        return Replacements.GetValueOrDefault(id);
    }

    /// <summary>
    /// Deprecated ids (licenses or exceptions) written in <paramref name="expression"/>, in the list's own spelling.
    /// A token such as <c>GPL-2.0+</c> is looked up whole first, since the list holds it as an id of its own.
    /// </summary>
    public static IReadOnlyList<string> In(string expression)
    {
        ArgumentNullException.ThrowIfNull(expression);
        var found = new List<string>();
        foreach (var token in expression.Split([' ', '\t', '(', ')'], StringSplitOptions.RemoveEmptyEntries))
        {
            var hit = Deprecated(token) ?? (token.EndsWith('+') ? Deprecated(token[..^1]) : null);
            if (hit is not null && !found.Contains(hit, StringComparer.Ordinal))
            {
                found.Add(hit);
            }
        }

        return found;
    }

    private static string? Deprecated(string token)
    {
        if (SpdxLicenseList.License(token) is { IsDeprecatedLicenseId: true } license)
        {
            return license.LicenseID;
        }

        return SpdxLicenseList.Exception(token) is { IsDeprecatedLicenseId: true } exception ? exception.LicenseExceptionID : null;
    }
}
