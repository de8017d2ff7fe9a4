using System.Globalization;
using Readiness.Core.Configuration;
using Readiness.Core.Engine;
using Readiness.Core.Forge;
using Readiness.Core.Registry;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;
using Readiness.Service.Configuration;
using Readiness.Service.Forge;
using Readiness.Service.Mirrors;
using Readiness.Service.Storage;

namespace Readiness.Service.Worker;

/// <summary>
/// One job: fetch the mirror, read the base branch's configuration, decide whether the pull request is a release
/// candidate, run the engine on the head commit, store the run, then comment and set the status.
/// </summary>
public sealed class PullRequestJobProcessor(
    ServiceSettings settings,
    MirrorStore mirrors,
    ISnapshotSource snapshots,
    ReadinessRunner runner,
    ReleaseCandidateTriage triage,
    ReportDocuments documents,
    IForgeCredentials credentials,
    IForge forge,
    IJobStore jobs,
    IRunStore runs,
    SecretRedactor redactor,
    ILogger<PullRequestJobProcessor> logger)
{
    private readonly RegistrySelector? registries = ServiceRegistries.Selector(settings);

    /// <summary>The hidden first line of the report comment, by which it is found again.</summary>
    public const string CommentMarker = "<!-- readiness-report -->";

    /// <summary>Said under every report: a tick anywhere else (a comment, this comment) confirms nothing.</summary>
    public const string ConfirmationNote =
        "Only ticks in the pull request's description count as confirmations of manual items; ticks in comments, this one included, are not read.";

    /// <summary>The commit status's context.</summary>
    public const string StatusContext = "readiness";

    /// <summary>Comments longer than this are cut (the forge refuses bodies over 65,536 characters; observed API limit, from memory).</summary>
    public const int MaxCommentChars = 60_000;

    public async Task<JobOutcome> ProcessAsync(Job job, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(job);
        var request = job.Request;
        var parts = request.Repository.Split('/');
        var repository = new ForgeRepository(parts[0], parts[1], request.InstallationId);
        var pullRequest = new ForgePullRequest(repository, request.Number);
        if (jobs.HasNewer(job))
        {
            return new JobOutcome(JobState.Superseded, null, "a newer event for the pull request is queued");
        }

        var token = await credentials.TokenAsync(request.InstallationId, cancellationToken).ConfigureAwait(false);
        var mirror = await mirrors.UpdateAsync(request.Repository, request.CloneUrl, token, cancellationToken).ConfigureAwait(false);

        RunRecord run;
        try
        {
            var baseConfig = ReadBaseConfig(mirror, request.BaseRef);
            var reason = request.ReleaseReason ?? Triage(mirror, request, baseConfig);
            if (reason is null)
            {
                return new JobOutcome(JobState.Skipped, null, "not a release candidate");
            }

            logger.LogInformation("Reporting on {PullRequest} at {Sha}: {Reason}", pullRequest, request.HeadSha, reason);
            var report = await runner.RunAsync(
                new RunRequest(new SnapshotRequest(mirror, request.HeadSha), Confirmed: TaskListConfirmations.Parse(request.Body), Config: baseConfig),
                registries,
                cancellationToken).ConfigureAwait(false);
            report = report with { Subject = report.Subject with { Repository = request.Repository, Ref = $"pull/{request.Number}" } };
            run = ReportRun(job, report);
        }
        catch (ConfigurationException e)
        {
            // The rules themselves are wrong: say so on the pull request; retrying would not help.
            run = ErrorRun(job, $"The release rules could not be read: {e.Message}");
        }

        if (jobs.HasNewer(job))
        {
            return new JobOutcome(JobState.Superseded, null, "a newer event for the pull request is queued");
        }

        var runId = await runs.AddAsync(run, cancellationToken).ConfigureAwait(false);
        var link = RunLink(runId);
        await forge.UpsertCommentAsync(pullRequest, CommentMarker, CommentBody(run, link), cancellationToken).ConfigureAwait(false);
        await forge.SetStatusAsync(repository, Status(run, request.HeadSha, link), cancellationToken).ConfigureAwait(false);
        return new JobOutcome(JobState.Done, runId, null);
    }

    /// <summary>After the last attempt failed: an error status on the head commit, if the forge takes it.</summary>
    public async Task ReportFailureAsync(Job job, string message, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(job);
        var parts = job.Request.Repository.Split('/');
        var repository = new ForgeRepository(parts[0], parts[1], job.Request.InstallationId);
        var status = new ForgeCommitStatus(job.Request.HeadSha, ForgeCommitState.Error, ForgeCommitStatus.FitDescription("Could not inspect: " + message), null, StatusContext);
        await forge.SetStatusAsync(repository, status, cancellationToken).ConfigureAwait(false);
    }

    internal static string Description(RunRecord run) => ForgeCommitStatus.FitDescription(run.Verdict switch
    {
        RunRecord.Ready => $"Ready: {run.Summary}",
        RunRecord.NotReady => $"Not ready: {run.Summary}",
        _ => $"Could not run: {run.Error}",
    });

    private RepositoryConfig ReadBaseConfig(string mirror, string baseRef)
    {
        using var snapshot = snapshots.Open(new SnapshotRequest(mirror, "refs/heads/" + baseRef));
        return runner.ReadConfig(snapshot.Files);
    }

    private string? Triage(string mirror, JobRequest request, RepositoryConfig baseConfig)
    {
        var changes = PullRequestChanges.Compute(mirror, request.BaseRef, request.HeadSha);
        var opened = new List<ReleaseSnapshot>();
        try
        {
            IFileTree Files(string commit)
            {
                var snapshot = snapshots.Open(new SnapshotRequest(mirror, commit));
                opened.Add(snapshot);
                return snapshot.Files;
            }

            return triage.Reason(request.BaseRef, baseConfig, changes, () => Files(changes.MergeBase), () => Files(request.HeadSha));
        }
        finally
        {
            opened.ForEach(s => s.Dispose());
        }
    }

    private RunRecord ReportRun(Job job, Report report)
    {
        var s = report.Summary;
        var summary = string.Create(CultureInfo.InvariantCulture, $"{s.Blocking} blocking; {s.Pass} pass, {s.Fail} fail, {s.Error} error, {s.Manual} manual, {s.Skip} skip");
        return new RunRecord(
            0,
            job.Request.Repository,
            job.Request.Number,
            job.Request.HeadSha,
            $"pull/{job.Request.Number}",
            report.Subject.Checklist,
            report.Ready ? RunRecord.Ready : RunRecord.NotReady,
            summary,
            RunRecord.FromService,
            job.Id,
            redactor.Redact(documents.Render(report, ReportDocuments.Json)),
            redactor.Redact(documents.Render(report, ReportDocuments.Markdown)),
            null,
            [],
            report.GeneratedAt);
    }

    private RunRecord ErrorRun(Job job, string message) => new(
        0,
        job.Request.Repository,
        job.Request.Number,
        job.Request.HeadSha,
        $"pull/{job.Request.Number}",
        null,
        RunRecord.ErrorVerdict,
        null,
        RunRecord.FromService,
        job.Id,
        null,
        null,
        redactor.Redact(message),
        [],
        DateTimeOffset.UnixEpoch);

    private string RunLink(long runId)
    {
        var root = settings.PublicUrl.ToString().TrimEnd('/');
        return $"{root}/runs/{runId}";
    }

    private static string CommentBody(RunRecord run, string link)
    {
        string body;
        if (run.ReportMarkdown is { } markdown)
        {
            body = markdown.StartsWith(CommentMarker, StringComparison.Ordinal) ? markdown : CommentMarker + "\n" + markdown;
            if (body.Length > MaxCommentChars)
            {
                body = body[..MaxCommentChars] + "\n\n… (cut: the report is longer than a comment may be)";
            }
        }
        else
        {
            var message = (run.Error ?? string.Empty).Replace("`", "'", StringComparison.Ordinal);
            body = $"{CommentMarker}\n## ⚠️ Readiness could not run\n\n```text\n{message}\n```\n";
        }

        return body.TrimEnd() + $"\n\n{ConfirmationNote}\n\n[Full report]({link}) · commit `{run.Commit[..12]}`\n";
    }

    private static ForgeCommitStatus Status(RunRecord run, string sha, string link) => new(
        sha,
        run.Verdict switch
        {
            RunRecord.Ready => ForgeCommitState.Success,
            RunRecord.NotReady => ForgeCommitState.Failure,
            _ => ForgeCommitState.Error,
        },
        Description(run),
        link.StartsWith("http", StringComparison.Ordinal) ? link : null,
        StatusContext);
}
