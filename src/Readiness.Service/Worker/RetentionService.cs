using Readiness.Service.Configuration;
using Readiness.Service.Storage;

namespace Readiness.Service.Worker;

/// <summary>Deletes deliveries and finished jobs older than <c>Readiness:RetentionDays</c>, at start and every hour; runs are kept.</summary>
public sealed class RetentionService(ServiceSettings settings, IJobStore jobs, TimeProvider time, ILogger<RetentionService> logger) : BackgroundService
{
    private static readonly TimeSpan Every = TimeSpan.FromHours(1);

    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        while (!stoppingToken.IsCancellationRequested)
        {
            try
            {
                var removed = await jobs.PruneAsync(settings.Retention, stoppingToken).ConfigureAwait(false);
                if (removed > 0)
                {
                    logger.LogInformation("Pruned {Rows} deliveries and finished jobs older than {Days} days", removed, (int)settings.Retention.TotalDays);
                }

                await Task.Delay(Every, time, stoppingToken).ConfigureAwait(false);
            }
            catch (OperationCanceledException) when (stoppingToken.IsCancellationRequested)
            {
                return;
            }
#pragma warning disable CA1031 // a failed pruning (the database was away) is tried again at the next hour
            catch (Exception e)
#pragma warning restore CA1031
            {
                logger.LogWarning("Pruning failed: {Error}", e.Message.Split('\n')[0]);
                await Task.Delay(Every, time, stoppingToken).ConfigureAwait(false);
            }
        }
    }
}
