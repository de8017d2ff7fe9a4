using System.Net.Http.Headers;
using System.Text;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.AspNetCore.TestHost;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using Readiness.Service.Storage;
using Readiness.Service.Webhooks;

namespace Readiness.Service.Tests.EndToEnd;

/// <summary>The real service in-process (real SQLite file, real mirrors), pointed at the forge stand-in.</summary>
public sealed class ServiceHost : WebApplicationFactory<Program>
{
    public const string Token = "forge-token-Xq81-do-not-log";
    public const string Secret = "webhook-secret-Zr52-do-not-log";
    public const string ApiToken = "api-token-Kp07-do-not-log";

    private readonly Dictionary<string, string?> settings;

    public ServiceHost(Uri forgeUrl, string dataFolder, CapturedLogs logs, IReadOnlyDictionary<string, string?>? extra = null)
    {
        Logs = logs;
        settings = new Dictionary<string, string?>
        {
            ["Readiness:Forge:ApiUrl"] = forgeUrl.ToString(),
            ["Readiness:Forge:Token"] = Token,
            ["Readiness:Forge:WebhookSecret"] = Secret,
            ["Readiness:Forge:MaxRetries"] = "3",
            ["Readiness:Forge:MaxRetryDelayMilliseconds"] = "20",
            ["Readiness:ApiToken"] = ApiToken,
            ["Readiness:DataFolder"] = dataFolder,
            ["Readiness:Registry"] = "offline",
            ["Readiness:AllowNonHttpsCloneUrls"] = "true",
            ["Readiness:ReleaseBranches:0"] = "release/*",
            ["Readiness:Worker:PollMilliseconds"] = "100",
            ["Readiness:Worker:QuietMilliseconds"] = "0",
            ["Readiness:Worker:LeaseSeconds"] = "3",
            ["Readiness:Worker:RetryDelayMilliseconds"] = "100",
            ["Readiness:PublicUrl"] = "http://127.0.0.1:5080/",
        };
        foreach (var (key, value) in extra ?? new Dictionary<string, string?>())
        {
            settings[key] = value;
        }
    }

    public CapturedLogs Logs { get; }

    public IJobStore Jobs => Services.GetRequiredService<IJobStore>();

    public IRunStore Runs => Services.GetRequiredService<IRunStore>();

    /// <summary>Sends a delivery signed with the configured secret (or the given signature header).</summary>
    public async Task<HttpResponseMessage> DeliverAsync(string payload, string deliveryId, string eventName = "pull_request", string? signature = "sign")
    {
        using var client = CreateClient();
        using var request = new HttpRequestMessage(HttpMethod.Post, WebhookEndpoint.Path)
        {
            Content = new StringContent(payload, Encoding.UTF8, "application/json"),
        };
        request.Headers.Add(WebhookEndpoint.EventHeader, eventName);
        request.Headers.Add(WebhookEndpoint.DeliveryHeader, deliveryId);
        if (signature is not null)
        {
            request.Headers.Add(WebhookSignature.Header, signature == "sign" ? WebhookSignature.Compute(Secret, Encoding.UTF8.GetBytes(payload)) : signature);
        }

        return await client.SendAsync(request);
    }

    /// <summary>Waits until no job is queued or running.</summary>
    public async Task WaitForIdleAsync(TimeSpan? timeout = null)
    {
        var until = DateTime.UtcNow + (timeout ?? TimeSpan.FromSeconds(60));
        while (DateTime.UtcNow < until)
        {
            var counts = Jobs.CountByState();
            if (!counts.ContainsKey(JobState.Queued) && !counts.ContainsKey(JobState.Running))
            {
                return;
            }

            await Task.Delay(50);
        }

        throw new TimeoutException("jobs still pending: " + string.Join(", ", Jobs.CountByState().Select(kv => $"{kv.Key}={kv.Value}")));
    }

    public async Task<HttpResponseMessage> GetAsync(string path, string? bearer = null)
    {
        using var client = CreateClient();
        if (bearer is not null)
        {
            client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", bearer);
        }

        return await client.GetAsync(path);
    }

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        foreach (var (key, value) in settings)
        {
            builder.UseSetting(key, value);
        }

        builder.UseEnvironment("Testing");
        builder.ConfigureLogging(l =>
        {
            l.SetMinimumLevel(LogLevel.Trace);
            l.AddProvider(Logs);
        });
        builder.ConfigureTestServices(_ => { });
    }
}
