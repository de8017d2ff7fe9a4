using System.Net.Http.Headers;
using System.Text;
using System.Text.Json;
using Readiness.Core.Reports;
using Readiness.Rendering;

namespace Readiness.Cli.Hooks;

/// <summary>
/// Records each checked release ref with the service (<c>POST &lt;service&gt;/api/runs</c>, see
/// <see cref="ServiceRecording"/>): the report and the waivers that let blocking failures through. Bounded in time
/// and size; a failure is one line on standard error and never changes the push's verdict. Settings are read on the
/// first ref; with no service configured nothing is sent and nothing is said.
/// </summary>
public sealed class RunRecorder(CliConsole console, string repository) : IDisposable
{
    public static readonly TimeSpan Timeout = PrePushRunner.RegistryTimeout;
    public const int MaxAnswerBytes = 64 * 1024;
    private const int MaxReasonChars = 300;

    private bool settingsRead;
    private ServiceRecording? settings;
    private string? problem;
    private HttpClient? client;

    /// <summary>Sends one run. <paramref name="waivers"/>: check id → the reason given for bypassing it.</summary>
    public async Task RecordAsync(string remoteUrl, Report report, IReadOnlyList<KeyValuePair<string, string>> waivers, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(waivers);
        if (!settingsRead)
        {
            settingsRead = true;
            settings = ServiceRecording.Read(console, repository);
            if (settings?.TokenNotice is { } notice)
            {
                await console.Error.WriteLineAsync($"readiness: {notice}").ConfigureAwait(false);
            }

            if (settings?.Problem() is { } reason)
            {
                problem = reason;
                await FailAsync(reason).ConfigureAwait(false);
            }
        }

        if (settings is null || problem is not null)
        {
            return;
        }

        var (line, recorded) = await SendAsync(settings, RemoteRepositoryName.From(remoteUrl), report, waivers, cancellationToken).ConfigureAwait(false);
        await console.Error.WriteLineAsync(line).ConfigureAwait(false);
        if (!recorded)
        {
            // One failure is enough: the other refs of this push are not tried, so a service that never answers costs
            // one timeout per push, not one per ref.
            problem = line;
        }
    }

    public void Dispose() => client?.Dispose();

    /// <summary>The request body: <c>{repository, report, waivers}</c>, the report as <c>readiness-report/1</c>.</summary>
    public static string Body(string repositoryName, Report report, IReadOnlyList<KeyValuePair<string, string>> waivers)
    {
        ArgumentNullException.ThrowIfNull(waivers);
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer))
        {
            json.WriteStartObject();
            json.WriteString("repository", repositoryName);
            json.WritePropertyName("report");
            json.WriteRawValue(JsonRenderer.ToJson(report));
            json.WriteStartArray("waivers");
            foreach (var (check, reason) in waivers)
            {
                json.WriteStartObject();
                json.WriteString("check", check);
                json.WriteString("reason", reason);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    private async Task<(string Line, bool Recorded)> SendAsync(ServiceRecording recording, string repositoryName, Report report, IReadOnlyList<KeyValuePair<string, string>> waivers, CancellationToken cancellationToken)
    {
        var endpoint = new Uri(recording.BaseUrl + "/api/runs");
        using var limit = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
        limit.CancelAfter(Timeout);
        try
        {
            client ??= new HttpClient(new SocketsHttpHandler { AllowAutoRedirect = false, UseCookies = false, ConnectTimeout = Timeout })
            {
                Timeout = System.Threading.Timeout.InfiniteTimeSpan,
            };
            using var request = new HttpRequestMessage(HttpMethod.Post, endpoint)
            {
                Content = new StringContent(Body(repositoryName, report, waivers), Encoding.UTF8, "application/json"),
            };
            request.Headers.Authorization = new AuthenticationHeaderValue("Bearer", recording.Token);
            using var response = await client.SendAsync(request, HttpCompletionOption.ResponseHeadersRead, limit.Token).ConfigureAwait(false);
            var answer = await ReadBoundedAsync(response.Content, limit.Token).ConfigureAwait(false);
            if (!response.IsSuccessStatusCode)
            {
                var detail = ErrorText(answer);
                return (Failure(recording, $"the service answered {(int)response.StatusCode} {response.ReasonPhrase}{(detail is null ? string.Empty : $" ({detail})")}"), false);
            }

            return RunPath(answer) is { } path
                ? ($"readiness: recorded at {recording.Display}{path}", true)
                : (Failure(recording, "the answer names no run"), false);
        }
        catch (OperationCanceledException) when (!cancellationToken.IsCancellationRequested)
        {
            return (Failure(recording, $"no answer within {Timeout.TotalSeconds:0} s"), false);
        }
        catch (Exception e) when (e is HttpRequestException or IOException or JsonException or InvalidOperationException or FormatException)
        {
            return (Failure(recording, e.Message), false);
        }
    }

    private async Task FailAsync(string reason) =>
        await console.Error.WriteLineAsync(Failure(settings!, reason)).ConfigureAwait(false);

    /// <summary>The one failure line; the token is scrubbed from the reason should anything have echoed it.</summary>
    private static string Failure(ServiceRecording recording, string reason)
    {
        var text = OneLine(reason);
        if (!string.IsNullOrEmpty(recording.Token))
        {
            text = text.Replace(recording.Token, "***", StringComparison.Ordinal);
        }

        return $"readiness: could not record the run with {recording.Display}: {text}";
    }

    private static async Task<byte[]> ReadBoundedAsync(HttpContent content, CancellationToken cancellationToken)
    {
        var stream = await content.ReadAsStreamAsync(cancellationToken).ConfigureAwait(false);
        await using (stream.ConfigureAwait(false))
        {
            var buffer = new byte[MaxAnswerBytes + 1];
            var read = await stream.ReadAtLeastAsync(buffer, buffer.Length, throwOnEndOfStream: false, cancellationToken).ConfigureAwait(false);
            return read > MaxAnswerBytes ? throw new IOException($"the answer is larger than {MaxAnswerBytes} bytes") : buffer[..read];
        }
    }

    /// <summary>The run's page: the answer's <c>url</c> when it is a plain path, else <c>/runs/{id}</c>.</summary>
    private static string? RunPath(byte[] answer)
    {
        using var json = JsonDocument.Parse(answer);
        var root = json.RootElement;
        if (root.ValueKind != JsonValueKind.Object)
        {
            return null;
        }

        if (root.TryGetProperty("url", out var url) && url.ValueKind == JsonValueKind.String && url.GetString() is { } path
            && path.StartsWith('/') && !path.StartsWith("//", StringComparison.Ordinal) && path.Length <= 200
            && path.All(c => char.IsAsciiLetterOrDigit(c) || c is '/' or '-' or '_' or '.'))
        {
            return path;
        }

        return root.TryGetProperty("id", out var id) && id.ValueKind == JsonValueKind.Number && id.TryGetInt64(out var number)
            ? $"/runs/{number}"
            : null;
    }

    /// <summary>The service's own <c>error</c> text, when the answer is a JSON object carrying one.</summary>
    private static string? ErrorText(byte[] answer)
    {
        try
        {
            using var json = JsonDocument.Parse(answer);
            return json.RootElement.ValueKind == JsonValueKind.Object && json.RootElement.TryGetProperty("error", out var error) && error.ValueKind == JsonValueKind.String
                ? error.GetString()
                : null;
        }
        catch (JsonException)
        {
            return null;
        }
    }

    /// <summary>Control characters from the network or an exception become spaces; long text is cut.</summary>
    private static string OneLine(string text)
    {
        var clean = new string(text.Select(c => char.IsControl(c) ? ' ' : c).ToArray()).Trim();
        return clean.Length > MaxReasonChars ? clean[..MaxReasonChars] + "…" : clean;
    }
}
