namespace Readiness.Cli.Hooks;

/// <summary>
/// The name a hook run is recorded under: <c>owner/name</c> when the remote URL has that shape, otherwise the URL
/// itself with any credentials removed. URL forms as git-clone(1) "GIT URLS" lists them:
/// <c>https://host/path</c>, <c>ssh://[user@]host[:port]/path</c>, <c>git://host/path</c> and the scp-like
/// <c>[user@]host:path</c> (only when no slash comes before the first colon).
/// </summary>
public static class RemoteRepositoryName
{
    private static readonly string[] NetworkSchemes = ["https", "http", "ssh", "git", "git+ssh", "ssh+git"];

    public static string From(string remoteUrl)
    {
        ArgumentNullException.ThrowIfNull(remoteUrl);
        var url = remoteUrl.Trim();
        var path = NetworkPath(url) ?? ScpLikePath(url);
        return path is not null && OwnerAndName(path) is { } name ? name : PrePushRunner.Redact(url);
    }

    private static string? NetworkPath(string url) =>
        Uri.TryCreate(url, UriKind.Absolute, out var uri) && NetworkSchemes.Contains(uri.Scheme, StringComparer.OrdinalIgnoreCase) && uri.Host.Length > 0
            ? Uri.UnescapeDataString(uri.AbsolutePath)
            : null;

    /// <summary><c>[user@]host:owner/name</c>; a single letter before the colon is a Windows drive, not a host.</summary>
    private static string? ScpLikePath(string url)
    {
        var colon = url.IndexOf(':', StringComparison.Ordinal);
        var slash = url.IndexOf('/', StringComparison.Ordinal);
        if (colon <= 0 || (slash >= 0 && slash < colon) || url.Contains("://", StringComparison.Ordinal))
        {
            return null;
        }

        var host = url[..colon];
        var at = host.LastIndexOf('@');
        host = at >= 0 ? host[(at + 1)..] : host;
        return host.Length > 1 && !host.Contains('\\', StringComparison.Ordinal) ? url[(colon + 1)..] : null;
    }

    /// <summary>Exactly two path segments (a trailing slash and a <c>.git</c> suffix allowed).</summary>
    private static string? OwnerAndName(string path)
    {
        var segments = path.Trim('/').Split('/');
        if (segments.Length != 2)
        {
            return null;
        }

        var owner = segments[0];
        var name = segments[1].EndsWith(".git", StringComparison.OrdinalIgnoreCase) ? segments[1][..^4] : segments[1];
        return Plain(owner) && Plain(name) ? $"{owner}/{name}" : null;
    }

    private static bool Plain(string segment) =>
        segment.Length > 0 && segment != "." && segment != ".." && !segment.StartsWith('~') && segment.All(c => !char.IsControl(c) && !char.IsWhiteSpace(c) && c != '\\');
}
