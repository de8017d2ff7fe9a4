using Readiness.Core.Checklists;
using Readiness.Core.Configuration;

namespace Readiness.Cli;

/// <summary>Resolves <c>--checklist NAME|PATH|URL</c> into a definition (names are left to the runner).</summary>
public sealed class ChecklistLoader(ChecklistParser parser, HttpMessageHandler? handler = null)
{
    public const int MaxBytes = 256 * 1024;
    public static readonly TimeSpan Timeout = TimeSpan.FromSeconds(10);

    /// <summary>A definition for a path or URL; null when <paramref name="value"/> is a plain name.</summary>
    public async Task<ChecklistDefinition?> LoadAsync(string value, string currentDirectory, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(value);
        if (Uri.TryCreate(value, UriKind.Absolute, out var uri) && (uri.Scheme == Uri.UriSchemeHttps || uri.Scheme == Uri.UriSchemeHttp))
        {
            return parser.Parse(uri.GetLeftPart(UriPartial.Path), await FetchAsync(uri, cancellationToken).ConfigureAwait(false));
        }

        var looksLikePath = value.Contains('/', StringComparison.Ordinal) || value.Contains('\\', StringComparison.Ordinal)
            || value.EndsWith(".yml", StringComparison.OrdinalIgnoreCase) || value.EndsWith(".yaml", StringComparison.OrdinalIgnoreCase);
        if (!looksLikePath)
        {
            return null;
        }

        var path = Path.GetFullPath(value, currentDirectory);
        if (!File.Exists(path))
        {
            throw new ConfigurationException(new ConfigMark(value, 1, 1), "checklist file not found");
        }

        if (new FileInfo(path).Length > MaxBytes)
        {
            throw new ConfigurationException(new ConfigMark(value, 1, 1), $"checklist file larger than {MaxBytes:N0} bytes");
        }

        return parser.Parse(value, await File.ReadAllTextAsync(path, cancellationToken).ConfigureAwait(false));
    }

    private async Task<string> FetchAsync(Uri uri, CancellationToken cancellationToken)
    {
        var where = new ConfigMark(uri.GetLeftPart(UriPartial.Path), 1, 1);
        using var client = handler is null ? new HttpClient() : new HttpClient(handler, disposeHandler: false);
        client.Timeout = Timeout;
        try
        {
            using var response = await client.GetAsync(uri, HttpCompletionOption.ResponseHeadersRead, cancellationToken).ConfigureAwait(false);
            if (!response.IsSuccessStatusCode)
            {
                throw new ConfigurationException(where, $"the checklist service answered {(int)response.StatusCode} {response.ReasonPhrase}");
            }

            await using var stream = await response.Content.ReadAsStreamAsync(cancellationToken).ConfigureAwait(false);
            var buffer = new byte[MaxBytes + 1];
            var read = 0;
            int n;
            while (read < buffer.Length && (n = await stream.ReadAsync(buffer.AsMemory(read), cancellationToken).ConfigureAwait(false)) > 0)
            {
                read += n;
            }

            return read > MaxBytes
                ? throw new ConfigurationException(where, $"the checklist is larger than {MaxBytes:N0} bytes")
                : Core.Snapshots.FileTreeExtensions.Decode(buffer.AsSpan(0, read));
        }
        catch (Exception e) when (e is HttpRequestException or TaskCanceledException)
        {
            throw new ConfigurationException(where, $"the checklist could not be fetched: {e.Message}");
        }
    }
}
