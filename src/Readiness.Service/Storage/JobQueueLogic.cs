using System.Data.Common;

namespace Readiness.Service.Storage;

/// <summary>The steps of recording a delivery, the same in both stores; runs inside the caller's transaction.</summary>
internal static class JobQueueLogic
{
    public static (EnqueueOutcome Outcome, long? JobId) RecordDelivery(
        Func<string, DbCommand> command, string deliveryId, string eventName, JobRequest? request, long now, JobStoreOptions options)
    {
        using (var insert = command(JobSql.InsertDelivery).With("@id", deliveryId).With("@event", eventName).With("@now", now))
        {
            if (insert.ExecuteNonQuery() == 0)
            {
                return (EnqueueOutcome.Duplicate, null);
            }
        }

        if (request is null)
        {
            return (EnqueueOutcome.Ignored, null);
        }

        EnqueueOutcome outcome;
        long jobId;
        using (var collapse = command(JobSql.Collapse))
        {
            JobSql.AddRequest(collapse, request, deliveryId, now, options);
            var existing = collapse.ExecuteScalar();
            if (existing is not null and not DBNull)
            {
                outcome = EnqueueOutcome.Collapsed;
                jobId = Convert.ToInt64(existing, System.Globalization.CultureInfo.InvariantCulture);
            }
            else
            {
                using (var queued = command(JobSql.QueuedInRepository).With("@repo", request.Repository))
                {
                    if (Convert.ToInt64(queued.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture) >= options.MaxQueuedPerRepository)
                    {
                        // Not recorded, so the forge's redelivery of this id is taken once there is room.
                        using var forget = command(JobSql.ForgetDelivery).With("@id", deliveryId);
                        forget.ExecuteNonQuery();
                        return (EnqueueOutcome.QueueFull, null);
                    }
                }

                using var insert = command(JobSql.Insert);
                JobSql.AddRequest(insert, request, deliveryId, now, options);
                jobId = Convert.ToInt64(insert.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture);
                outcome = EnqueueOutcome.Queued;
            }
        }

        using var link = command(JobSql.LinkDelivery).With("@job", jobId).With("@id", deliveryId);
        link.ExecuteNonQuery();
        return (outcome, jobId);
    }
}
