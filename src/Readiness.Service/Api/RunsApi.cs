using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using Readiness.Service.Configuration;
using Readiness.Service.Storage;
using Readiness.Service.Worker;

namespace Readiness.Service.Api;

/// <summary><c>POST /api/runs</c>: hook clients record their results and waivers, with the configured bearer token.</summary>
public sealed class RunsApi(ServiceSettings settings, IRunStore runs, ReportDocuments documents, SecretRedactor redactor, ILogger<RunsApi> logger)
{
    public const int MaxBodyBytes = 4 * 1024 * 1024;
    public const int MaxWaivers = 200;
    public const int MaxReasonChars = 2000;

    public async Task<IResult> PostAsync(HttpContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (settings.ApiToken is null)
        {
            return Results.Json(new { error = "recording runs is not enabled on this service (Readiness:ApiToken is not set)" }, statusCode: StatusCodes.Status403Forbidden);
        }

        if (!Authorized(context.Request.Headers.Authorization.ToString(), settings.ApiToken))
        {
            context.Response.Headers.WWWAuthenticate = "Bearer";
            return Results.Json(new { error = "a valid bearer token is required" }, statusCode: StatusCodes.Status401Unauthorized);
        }

        if (context.Request.ContentLength > MaxBodyBytes)
        {
            return Results.Json(new { error = $"the body is larger than {MaxBodyBytes} bytes" }, statusCode: StatusCodes.Status413PayloadTooLarge);
        }

        RunSubmission? submission;
        try
        {
            submission = await JsonSerializer.DeserializeAsync<RunSubmission>(context.Request.Body, ServiceJson.Options, context.RequestAborted).ConfigureAwait(false);
        }
        catch (JsonException e)
        {
            return Results.Json(new { error = $"the body is not a run: {e.Message}" }, statusCode: StatusCodes.Status400BadRequest);
        }

        if (submission is null || submission.Report.ValueKind != JsonValueKind.Object)
        {
            return Results.Json(new { error = "the body needs a 'report' object (schema readiness-report/1)" }, statusCode: StatusCodes.Status400BadRequest);
        }

        var waivers = submission.Waivers ?? [];
        if (waivers.Count > MaxWaivers || waivers.Any(w => string.IsNullOrWhiteSpace(w.Check) || string.IsNullOrWhiteSpace(w.Reason) || w.Reason.Length > MaxReasonChars))
        {
            return Results.Json(new { error = $"each waiver needs a 'check' and a 'reason' (at most {MaxReasonChars} characters; at most {MaxWaivers} waivers)" }, statusCode: StatusCodes.Status400BadRequest);
        }

        Core.Reports.Report report;
        var json = submission.Report.GetRawText();
        try
        {
            report = documents.ReadJson(json);
        }
        catch (FormatException e)
        {
            return Results.Json(new { error = $"the report is not a readiness-report/1 document: {e.Message}" }, statusCode: StatusCodes.Status400BadRequest);
        }

        var repository = string.IsNullOrWhiteSpace(submission.Repository) ? report.Subject.Repository : submission.Repository.Trim();
        var s = report.Summary;
        var run = new RunRecord(
            0,
            redactor.Redact(repository.Length > 300 ? repository[..300] : repository),
            null,
            report.Subject.Commit,
            report.Subject.Tag ?? report.Subject.Ref,
            report.Subject.Checklist,
            report.Ready ? RunRecord.Ready : RunRecord.NotReady,
            $"{s.Blocking} blocking; {s.Pass} pass, {s.Fail} fail, {s.Error} error, {s.Manual} manual, {s.Skip} skip",
            RunRecord.FromHook,
            null,
            redactor.Redact(documents.Render(report, ReportDocuments.Json)),
            redactor.Redact(documents.Render(report, ReportDocuments.Markdown)),
            null,
            waivers.Select(w => new Waiver(w.Check.Trim(), redactor.Redact(w.Reason.Trim()))).ToArray(),
            report.GeneratedAt);
        var id = await runs.AddAsync(run, context.RequestAborted).ConfigureAwait(false);
        logger.LogInformation("Recorded hook run {Run} for {Repository} ({Waivers} waived)", id, run.Repository, run.Waivers.Count);
        return Results.Json(new { id, url = $"/runs/{id}" }, ServiceJson.Options, statusCode: StatusCodes.Status201Created);
    }

    /// <summary>Compares the bearer token in constant time.</summary>
    internal static bool Authorized(string header, string token)
    {
        const string Scheme = "Bearer ";
        if (!header.StartsWith(Scheme, StringComparison.OrdinalIgnoreCase))
        {
            return false;
        }

        var given = SHA256.HashData(Encoding.UTF8.GetBytes(header[Scheme.Length..].Trim()));
        var expected = SHA256.HashData(Encoding.UTF8.GetBytes(token));
        return CryptographicOperations.FixedTimeEquals(given, expected);
    }
}
