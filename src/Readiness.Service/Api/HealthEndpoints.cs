using Readiness.Service.Configuration;
using Readiness.Service.Storage;

namespace Readiness.Service.Api;

/// <summary>
/// What an orchestrator probes. <c>GET /healthz</c> (liveness): the process answers. <c>GET /readyz</c>
/// (readiness): 200 when the database answers, with the queue's depth and the oldest waiting job's age;
/// 503 with the reason when it does not.
/// </summary>
public sealed class HealthEndpoints(IJobStore jobs, ServiceSettings settings, SecretRedactor redactor, ILogger<HealthEndpoints> logger)
{
    public IResult Live() => Results.Json(new { status = "ok" }, ServiceJson.Options);

    public IResult Ready()
    {
        try
        {
            var status = jobs.Status();
            return Results.Json(
                new
                {
                    status = "ready",
                    store = settings.PostgresConnection is null ? "sqlite" : "postgresql",
                    queued = status.Queued,
                    running = status.Running,
                    oldestWaitingSeconds = status.OldestWaiting is { } age ? Math.Round(Math.Max(age.TotalSeconds, 0), 1) : (double?)null,
                },
                ServiceJson.Options);
        }
#pragma warning disable CA1031 // any failure to reach the database is an answer here, not a crash
        catch (Exception e)
#pragma warning restore CA1031
        {
            var reason = redactor.Redact(e.Message.Split('\n')[0]);
            logger.LogWarning("Readiness probe: the database does not answer: {Reason}", reason);
            return Results.Json(new { status = "unavailable", reason = "the database does not answer: " + reason }, ServiceJson.Options, statusCode: StatusCodes.Status503ServiceUnavailable);
        }
    }
}
