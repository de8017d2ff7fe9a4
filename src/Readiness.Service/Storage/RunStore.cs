using System.Text.Json;
using Microsoft.Data.Sqlite;

namespace Readiness.Service.Storage;

/// <summary>The history of runs.</summary>
public sealed class RunStore(Database database, TimeProvider time)
{
    private const string ListColumns = "id, repository, pr_number, commit_sha, ref, checklist, verdict, summary, source, job_id, NULL, NULL, error, waivers_json, created";
    private const string AllColumns = "id, repository, pr_number, commit_sha, ref, checklist, verdict, summary, source, job_id, report_json, report_md, error, waivers_json, created";

    /// <summary>Stores a run; a second run for the same job returns the first one's id instead.</summary>
    public Task<long> AddAsync(RunRecord run, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(run);
        var now = time.GetUtcNow().ToUnixTimeMilliseconds();
        return database.WriteAsync((c, t) =>
        {
            if (run.JobId is { } jobId)
            {
                using var existing = c.CreateCommand();
                existing.Transaction = t;
                existing.CommandText = "SELECT id FROM runs WHERE job_id = $job";
                existing.Parameters.AddWithValue("$job", jobId);
                if (existing.ExecuteScalar() is long id)
                {
                    return id;
                }
            }

            using var insert = c.CreateCommand();
            insert.Transaction = t;
            insert.CommandText = """
                INSERT INTO runs(repository, pr_number, commit_sha, ref, checklist, verdict, summary, source, job_id, report_json, report_md, error, waivers_json, created)
                VALUES ($repo, $pr, $sha, $ref, $checklist, $verdict, $summary, $source, $job, $json, $md, $error, $waivers, $now)
                RETURNING id
                """;
            insert.Parameters.AddWithValue("$repo", run.Repository);
            insert.Parameters.AddWithValue("$pr", (object?)run.PullRequest ?? DBNull.Value);
            insert.Parameters.AddWithValue("$sha", run.Commit);
            insert.Parameters.AddWithValue("$ref", (object?)run.Ref ?? DBNull.Value);
            insert.Parameters.AddWithValue("$checklist", (object?)run.Checklist ?? DBNull.Value);
            insert.Parameters.AddWithValue("$verdict", run.Verdict);
            insert.Parameters.AddWithValue("$summary", (object?)run.Summary ?? DBNull.Value);
            insert.Parameters.AddWithValue("$source", run.Source);
            insert.Parameters.AddWithValue("$job", (object?)run.JobId ?? DBNull.Value);
            insert.Parameters.AddWithValue("$json", (object?)run.ReportJson ?? DBNull.Value);
            insert.Parameters.AddWithValue("$md", (object?)run.ReportMarkdown ?? DBNull.Value);
            insert.Parameters.AddWithValue("$error", (object?)run.Error ?? DBNull.Value);
            insert.Parameters.AddWithValue("$waivers", run.Waivers.Count == 0 ? DBNull.Value : JsonSerializer.Serialize(run.Waivers, ServiceJson.Options));
            insert.Parameters.AddWithValue("$now", now);
            return (long)insert.ExecuteScalar()!;
        }, cancellationToken);
    }

    public RunRecord? Find(long id)
    {
        using var c = database.Open();
        using var q = c.CreateCommand();
        q.CommandText = $"SELECT {AllColumns} FROM runs WHERE id = $id";
        q.Parameters.AddWithValue("$id", id);
        using var r = q.ExecuteReader();
        return r.Read() ? Read(r) : null;
    }

    /// <summary>The newest runs of each repository (without report bodies), repositories by name.</summary>
    public IReadOnlyList<RunRecord> RecentByRepository(int perRepository)
    {
        using var c = database.Open();
        using var q = c.CreateCommand();
        q.CommandText = $"""
            SELECT {ListColumns} FROM (
                SELECT *, ROW_NUMBER() OVER (PARTITION BY repository ORDER BY id DESC) AS rn FROM runs)
            WHERE rn <= $n ORDER BY repository, id DESC
            """;
        q.Parameters.AddWithValue("$n", perRepository);
        using var r = q.ExecuteReader();
        var runs = new List<RunRecord>();
        while (r.Read())
        {
            runs.Add(Read(r));
        }

        return runs;
    }

    public long Count()
    {
        using var c = database.Open();
        using var q = c.CreateCommand();
        q.CommandText = "SELECT COUNT(*) FROM runs";
        return (long)q.ExecuteScalar()!;
    }

    private static RunRecord Read(SqliteDataReader r) => new(
        r.GetInt64(0),
        r.GetString(1),
        r.IsDBNull(2) ? null : r.GetInt32(2),
        r.GetString(3),
        r.IsDBNull(4) ? null : r.GetString(4),
        r.IsDBNull(5) ? null : r.GetString(5),
        r.GetString(6),
        r.IsDBNull(7) ? null : r.GetString(7),
        r.GetString(8),
        r.IsDBNull(9) ? null : r.GetInt64(9),
        r.IsDBNull(10) ? null : r.GetString(10),
        r.IsDBNull(11) ? null : r.GetString(11),
        r.IsDBNull(12) ? null : r.GetString(12),
        r.IsDBNull(13) ? [] : JsonSerializer.Deserialize<List<Waiver>>(r.GetString(13), ServiceJson.Options) ?? [],
        DateTimeOffset.FromUnixTimeMilliseconds(r.GetInt64(14)));
}
