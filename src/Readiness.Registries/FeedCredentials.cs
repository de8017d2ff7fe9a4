using System.Net;

using NuGet.Configuration;

namespace Readiness.Registries;

/// <summary>
/// Feed credentials from the user's own NuGet configuration (user-wide and machine-wide files, and the
/// <c>NuGetPackageSourceCredentials_*</c> variables NuGet reads), matched by the source URL. Never from the
/// inspected repository: settings are loaded with no root folder, so no repository <c>nuget.config</c> is read.
/// </summary>
internal static class FeedCredentials
{
    public static NetworkCredential? Find(Uri source, string? configFile)
    {
        var settings = configFile is null
            ? Settings.LoadDefaultSettings(root: null)
            : Settings.LoadSettingsGivenConfigPaths([Path.GetFullPath(configFile)]);
        foreach (var package in new PackageSourceProvider(settings).LoadPackageSources())
        {
            if (package.Credentials is { } credentials && package.IsHttp && Same(package.SourceUri, source))
            {
                return new NetworkCredential(credentials.Username, credentials.Password);
            }
        }

        return null;
    }

    /// <summary>Same scheme, host, port and path; case-insensitive, a trailing slash ignored.</summary>
    private static bool Same(Uri? a, Uri b)
    {
        if (a is null || !a.IsAbsoluteUri)
        {
            return false;
        }

        static string Key(Uri u) => u.GetComponents(UriComponents.SchemeAndServer | UriComponents.Path, UriFormat.Unescaped).TrimEnd('/');
        return string.Equals(Key(a), Key(b), StringComparison.OrdinalIgnoreCase);
    }
}
