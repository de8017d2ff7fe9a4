using System.Data.Common;

namespace Readiness.Service.Storage;

/// <summary>The job queue's reads, the same for both stores over an open connection.</summary>
internal static class JobReads
{
    public static bool HasNewer(DbConnection c, Job job)
    {
        using var q = Query(c, JobSql.HasNewer).With("@repo", job.Request.Repository).With("@pr", job.Request.Number).With("@id", job.Id);
        return Convert.ToInt64(q.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture) > 0;
    }

    public static Job? Find(DbConnection c, long jobId)
    {
        using var q = Query(c, JobSql.Find).With("@id", jobId);
        using var reader = q.ExecuteReader();
        return reader.Read() ? JobSql.Read(reader) : null;
    }

    public static IReadOnlyDictionary<string, long> CountByState(DbConnection c)
    {
        using var q = Query(c, JobSql.CountByState);
        using var reader = q.ExecuteReader();
        var counts = new Dictionary<string, long>(StringComparer.Ordinal);
        while (reader.Read())
        {
            counts[reader.GetString(0)] = reader.Long(1);
        }

        return counts;
    }

    public static DateTimeOffset? NextDue(DbConnection c)
    {
        using var q = Query(c, JobSql.NextDue);
        return q.ExecuteScalar() is long ms ? DateTimeOffset.FromUnixTimeMilliseconds(ms) : null;
    }

    public static QueueStatus Status(DbConnection c, DateTimeOffset now)
    {
        using var q = Query(c, JobSql.Status);
        using var r = q.ExecuteReader();
        r.Read();
        return new QueueStatus(r.Long(0), r.Long(1), r.NullableLong(2) is { } oldest ? now - DateTimeOffset.FromUnixTimeMilliseconds(oldest) : null);
    }

    private static DbCommand Query(DbConnection c, string sql)
    {
        var command = c.CreateCommand();
        command.CommandText = sql;
        return command;
    }
}
