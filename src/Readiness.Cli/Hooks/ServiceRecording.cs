using System.Net;
using System.Text;

namespace Readiness.Cli.Hooks;

/// <summary>
/// Where the hook records its runs (<c>POST &lt;service&gt;/api/runs</c>) and the bearer token it presents.
/// The URL comes from <c>READINESS_SERVICE_URL</c>, else git config <c>readiness.service</c>; the token from
/// <c>READINESS_SERVICE_TOKEN</c>, else the first line of the file git config <c>readiness.serviceTokenFile</c> names
/// (so pushes from tools that do not pass the environment still record). The token never appears in
/// <see cref="ToString"/>, in output or in exceptions.
/// </summary>
/// <param name="ServiceText">The service's base URL as configured.</param>
/// <param name="Token">The bearer token, when one was found.</param>
/// <param name="TokenProblem">Why the token file could not be used (never its content).</param>
/// <param name="TokenNotice">A warning about a token file that was used (other users may read it).</param>
public sealed record ServiceRecording(string ServiceText, string? Token, string? TokenProblem = null, string? TokenNotice = null)
{
    public const string UrlVariable = "READINESS_SERVICE_URL";
    public const string TokenVariable = "READINESS_SERVICE_TOKEN";
    public const string UrlSetting = "readiness.service";
    public const string TokenFileSetting = "readiness.serviceTokenFile";
    public const int MaxTokenFileBytes = 4096;

    /// <summary>The base URL when it is an absolute http(s) URL.</summary>
    public Uri? Service =>
        Uri.TryCreate(ServiceText.Trim(), UriKind.Absolute, out var uri) && (uri.Scheme == Uri.UriSchemeHttps || uri.Scheme == Uri.UriSchemeHttp)
            ? uri
            : null;

    /// <summary>The base URL requests start from: no credentials, query or fragment, no trailing slash.</summary>
    public string? BaseUrl => Service is { } uri
        ? new UriBuilder(uri) { UserName = string.Empty, Password = string.Empty, Query = string.Empty, Fragment = string.Empty }.Uri.AbsoluteUri.TrimEnd('/')
        : null;

    /// <summary>The base URL as it may be shown (credentials removed).</summary>
    public string Display => BaseUrl ?? PrePushRunner.Redact(ServiceText.Trim()).TrimEnd('/');

    /// <summary>Reads the settings; null when no service is configured (then nothing is sent and nothing said).</summary>
    public static ServiceRecording? Read(CliConsole console, string repository)
    {
        ArgumentNullException.ThrowIfNull(console);
        var service = console.Env(UrlVariable) ?? GitConfig(repository, "--get", UrlSetting);
        if (string.IsNullOrWhiteSpace(service))
        {
            return null;
        }

        if (console.Env(TokenVariable) is { } token)
        {
            return new ServiceRecording(service, token.Trim());
        }

        var file = GitConfig(repository, "--type=path", "--get", TokenFileSetting);
        if (string.IsNullOrWhiteSpace(file))
        {
            return new ServiceRecording(service, null);
        }

        var path = Path.GetFullPath(file, repository);
        var (fileToken, problem) = ReadTokenFile(path);
        return new ServiceRecording(service, fileToken, problem, fileToken is null ? null : ReadableByOthers(path));
    }

    /// <summary>Why nothing may be sent, or null when the run can be recorded.</summary>
    public string? Problem()
    {
        if (Service is not { } service)
        {
            return $"{UrlVariable} or git config {UrlSetting} must be an http(s) URL";
        }

        if (TokenProblem is not null)
        {
            return TokenProblem;
        }

        if (string.IsNullOrEmpty(Token))
        {
            return $"no token: set {TokenVariable}, or git config {TokenFileSetting} to a file holding it";
        }

        // RFC 9110 §5.5: a field value is visible ASCII; anything else could split or corrupt the header.
        if (!Token.All(c => c is > ' ' and < '\u007f'))
        {
            return "the token holds characters an Authorization header cannot carry";
        }

        return service.Scheme == Uri.UriSchemeHttp && !IsLoopback(service)
            ? "refusing to send the token over plain http to another machine; use https (http only to this machine)"
            : null;
    }

    /// <summary>
    /// The host is this machine: <c>localhost</c> (RFC 6761 §6.3), 127.0.0.0/8 (RFC 1122 §3.2.1.3) or ::1
    /// (RFC 4291 §2.5.3). Other names are not trusted to stay on this machine.
    /// </summary>
    public static bool IsLoopback(Uri uri)
    {
        ArgumentNullException.ThrowIfNull(uri);
        var host = uri.IdnHost.Trim('[', ']').TrimEnd('.');
        return string.Equals(host, "localhost", StringComparison.OrdinalIgnoreCase)
            || (uri.HostNameType is UriHostNameType.IPv4 or UriHostNameType.IPv6 && IPAddress.TryParse(host, out var address) && IPAddress.IsLoopback(address));
    }

    /// <summary>The settings without the token.</summary>
    public override string ToString() =>
        $"ServiceRecording {{ Service = {Display}, Token = {(Token is null ? "none" : "(set)")}{(TokenProblem is null ? string.Empty : ", TokenProblem = " + TokenProblem)}{(TokenNotice is null ? string.Empty : ", TokenNotice = " + TokenNotice)} }}";

    private static string? GitConfig(string repository, params string[] arguments)
    {
        var (code, output, _) = GitProcess.Run(repository, ["config", .. arguments]);
        return code == 0 && output.Trim().Length > 0 ? output.Trim() : null;
    }

    /// <summary>On Unix, a notice when the group or other users may read the token file (as ssh warns of key files).</summary>
    private static string? ReadableByOthers(string path)
    {
        if (OperatingSystem.IsWindows())
        {
            return null;
        }

        var mode = File.GetUnixFileMode(path);
        return (mode & (UnixFileMode.GroupRead | UnixFileMode.OtherRead)) == 0
            ? null
            : $"the token file {path} can be read by other users (mode {Convert.ToString((int)mode, 8).PadLeft(3, '0')}); "
              + "restrict it (chmod 600) and keep it as your organisation's security policy says";
    }

    private static (string? Token, string? Problem) ReadTokenFile(string path)
    {
        var where = $"the token file {path} (git config {TokenFileSetting})";
        byte[] bytes;
        try
        {
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, bufferSize: 1, FileOptions.None);
            bytes = new byte[MaxTokenFileBytes];
            var read = stream.ReadAtLeast(bytes, bytes.Length, throwOnEndOfStream: false);
            Array.Resize(ref bytes, read);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return (null, $"{where} cannot be read: {e.Message}");
        }

        var text = Encoding.UTF8.GetString(bytes);
        var end = text.IndexOf('\n', StringComparison.Ordinal);
        if (end < 0 && bytes.Length == MaxTokenFileBytes)
        {
            return (null, $"{where} has no line break in its first {MaxTokenFileBytes} bytes");
        }

        var token = (end < 0 ? text : text[..end]).Trim().TrimStart('\uFEFF');
        return token.Length == 0 ? (null, $"{where} has an empty first line") : (token, null);
    }
}
