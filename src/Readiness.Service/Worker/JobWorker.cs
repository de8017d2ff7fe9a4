using Readiness.Service.Configuration;
using Readiness.Service.Forge;
using Readiness.Service.Storage;

namespace Readiness.Service.Worker;

/// <summary>
/// Worker loops that claim jobs with a lease, keep the lease alive while they work, and finish, retry or give up.
/// On shutdown a job in hand goes back to the queue; a process that dies leaves its lease to run out.
/// </summary>
public sealed class JobWorker(
    ServiceSettings settings,
    IJobStore jobs,
    JobSignal signal,
    PullRequestJobProcessor processor,
    TimeProvider time,
    SecretRedactor redactor,
    ILogger<JobWorker> logger) : BackgroundService
{
    private static readonly TimeSpan MinWait = TimeSpan.FromMilliseconds(50);
    private readonly string instance = $"{Environment.MachineName}:{Environment.ProcessId}:{Guid.NewGuid():N}";

    protected override Task ExecuteAsync(CancellationToken stoppingToken) =>
        Task.WhenAll(Enumerable.Range(0, settings.WorkerCount).Select(i => LoopAsync($"{instance}:{i}", stoppingToken)));

    private async Task LoopAsync(string owner, CancellationToken stoppingToken)
    {
        await Task.Yield();
        while (!stoppingToken.IsCancellationRequested)
        {
            try
            {
                var job = await jobs.ClaimAsync(owner, settings.Lease, stoppingToken).ConfigureAwait(false);
                if (job is null)
                {
                    await signal.WaitAsync(IdleWait(), stoppingToken).ConfigureAwait(false);
                    continue;
                }

                if (job.State == JobState.Failed)
                {
                    // Its last attempt's process died holding it: the store gave up at claim time.
                    logger.LogError("Job {Job} failed after {Attempts} attempts: {Error}", job.Id, job.Attempts, job.Error);
                    await ReportFailureAsync(job, job.Error ?? JobState.Failed).ConfigureAwait(false);
                    continue;
                }

                await RunAsync(job, owner, stoppingToken).ConfigureAwait(false);
                signal.Notify();
            }
            catch (OperationCanceledException) when (stoppingToken.IsCancellationRequested)
            {
                return;
            }
#pragma warning disable CA1031 // a failing loop iteration (the database was busy) must not end the worker
            catch (Exception e)
#pragma warning restore CA1031
            {
                logger.LogError("Worker loop failed: {Error}", redactor.Redact(e.Message));
                await Task.Delay(settings.Poll, stoppingToken).ConfigureAwait(false);
            }
        }
    }

    /// <summary>Until the next queued job is due (its quiet period or retry delay ends), at most the poll interval.</summary>
    private TimeSpan IdleWait()
    {
        if (jobs.NextDue() is not { } due)
        {
            return settings.Poll;
        }

        var wait = due - time.GetUtcNow();
        return wait < MinWait ? MinWait : wait > settings.Poll ? settings.Poll : wait;
    }

    private async Task RunAsync(Job job, string owner, CancellationToken stoppingToken)
    {
        // Every line logged for this job, here and in the processor, forge and mirror code it calls, carries these.
        using var scope = logger.BeginScope(new Dictionary<string, object>
        {
            ["DeliveryId"] = job.DeliveryId,
            ["JobId"] = job.Id,
            ["Repository"] = job.Request.Repository,
            ["PullRequest"] = job.Request.Number,
        });
        using var jobCancel = CancellationTokenSource.CreateLinkedTokenSource(stoppingToken);
        using var renewing = new CancellationTokenSource();
        var renewal = RenewAsync(job.Id, owner, jobCancel, renewing.Token);
        try
        {
            var outcome = await processor.ProcessAsync(job, jobCancel.Token).ConfigureAwait(false);
            await renewing.CancelAsync().ConfigureAwait(false);
            await renewal.ConfigureAwait(false);
            if (!await jobs.FinishAsync(job.Id, owner, outcome.State, outcome.RunId, outcome.Note, CancellationToken.None).ConfigureAwait(false))
            {
                logger.LogWarning("Job {Job} finished after its lease was lost", job.Id);
            }
            else
            {
                logger.LogInformation("Job {Job} ({Repository}#{Number} at {Sha}): {State}", job.Id, job.Request.Repository, job.Request.Number, job.Request.HeadSha, outcome.State);
            }
        }
        catch (OperationCanceledException) when (stoppingToken.IsCancellationRequested)
        {
            await renewing.CancelAsync().ConfigureAwait(false);
            await renewal.ConfigureAwait(false);
            await jobs.RequeueAsync(job.Id, owner, TimeSpan.Zero, null, CancellationToken.None).ConfigureAwait(false);
            logger.LogInformation("Job {Job} returned to the queue at shutdown", job.Id);
        }
        catch (ForgeRateLimitedException e)
        {
            await renewing.CancelAsync().ConfigureAwait(false);
            await renewal.ConfigureAwait(false);
            var wait = e.Until - time.GetUtcNow();
            await jobs.RequeueAsync(job.Id, owner, wait > TimeSpan.Zero ? wait : TimeSpan.Zero, e.Message, CancellationToken.None, countAttempt: false).ConfigureAwait(false);
            logger.LogWarning("Job {Job} waits for the forge's rate limit until {Until:u}", job.Id, e.Until);
        }
        catch (OperationCanceledException) when (jobCancel.IsCancellationRequested)
        {
            await renewal.ConfigureAwait(false);
            logger.LogWarning("Job {Job} stopped: its lease was lost to another worker", job.Id);
        }
#pragma warning disable CA1031 // any failure of one job becomes a retry or a failed job, never a dead worker
        catch (Exception e)
#pragma warning restore CA1031
        {
            await renewing.CancelAsync().ConfigureAwait(false);
            await renewal.ConfigureAwait(false);
            await FailAsync(job, owner, e).ConfigureAwait(false);
        }
    }

    private async Task FailAsync(Job job, string owner, Exception e)
    {
        var message = redactor.Redact($"{e.GetType().Name}: {e.Message}");
        if (job.Attempts < settings.MaxAttempts)
        {
            var delay = settings.JobRetryDelay * Math.Pow(2, Math.Min(job.Attempts - 1, 10));
            logger.LogWarning("Job {Job} attempt {Attempt} failed, retrying in {Delay} ms: {Error}", job.Id, job.Attempts, (long)delay.TotalMilliseconds, message);
            await jobs.RequeueAsync(job.Id, owner, delay, message, CancellationToken.None).ConfigureAwait(false);
            return;
        }

        logger.LogError("Job {Job} failed after {Attempts} attempts: {Error}", job.Id, job.Attempts, message);
        await jobs.FinishAsync(job.Id, owner, JobState.Failed, null, message, CancellationToken.None).ConfigureAwait(false);
        await ReportFailureAsync(job, message).ConfigureAwait(false);
    }

    private async Task ReportFailureAsync(Job job, string message)
    {
        try
        {
            await processor.ReportFailureAsync(job, message, CancellationToken.None).ConfigureAwait(false);
        }
#pragma warning disable CA1031 // best effort: the forge may be what failed
        catch (Exception statusError)
#pragma warning restore CA1031
        {
            logger.LogWarning("Could not set the error status for job {Job}: {Error}", job.Id, redactor.Redact(statusError.Message));
        }
    }

    private async Task RenewAsync(long jobId, string owner, CancellationTokenSource jobCancel, CancellationToken stop)
    {
        var every = settings.Lease / 3;
        try
        {
            while (true)
            {
                await Task.Delay(every, stop).ConfigureAwait(false);
                if (!await jobs.RenewAsync(jobId, owner, settings.Lease, stop).ConfigureAwait(false))
                {
                    await jobCancel.CancelAsync().ConfigureAwait(false);
                    return;
                }
            }
        }
        catch (OperationCanceledException)
        {
            // The job ended.
        }
    }
}
