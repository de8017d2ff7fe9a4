using System.Data.Common;
using System.Text.Json;

namespace Readiness.Service.Storage;

/// <summary>The history's statements, written once for both stores.</summary>
internal static class RunSql
{
    public const string ListColumns = "id, repository, pr_number, commit_sha, ref, checklist, verdict, summary, source, job_id, NULL, NULL, error, waivers_json, created";
    public const string AllColumns = "id, repository, pr_number, commit_sha, ref, checklist, verdict, summary, source, job_id, report_json, report_md, error, waivers_json, created";

    /// <summary>A second run for the same job (two instances finishing one job) keeps the first: <c>job_id</c> is unique.</summary>
    public const string Insert = """
        INSERT INTO runs(repository, pr_number, commit_sha, ref, checklist, verdict, summary, source, job_id, report_json, report_md, error, waivers_json, created)
        VALUES (@repo, @pr, @sha, @ref, @checklist, @verdict, @summary, @source, @job, @json, @md, @error, @waivers, @now)
        ON CONFLICT(job_id) DO NOTHING
        RETURNING id
        """;

    public const string ByJob = "SELECT id FROM runs WHERE job_id = @job";

    public const string Find = $"SELECT {AllColumns} FROM runs WHERE id = @id";

    public const string Recent = $"""
        SELECT {ListColumns} FROM (
            SELECT *, ROW_NUMBER() OVER (PARTITION BY repository ORDER BY id DESC) AS rn FROM runs) ranked
        WHERE rn <= @n ORDER BY repository, id DESC
        """;

    public const string Count = "SELECT COUNT(*) FROM runs";

    /// <summary>Adds the run's values; <paramref name="now"/> is the stored time.</summary>
    public static void AddRun(DbCommand insert, RunRecord run, long now) => insert
        .With("@repo", run.Repository)
        .With("@pr", run.PullRequest)
        .With("@sha", run.Commit)
        .With("@ref", run.Ref)
        .With("@checklist", run.Checklist)
        .With("@verdict", run.Verdict)
        .With("@summary", run.Summary)
        .With("@source", run.Source)
        .With("@job", run.JobId)
        .With("@json", run.ReportJson)
        .With("@md", run.ReportMarkdown)
        .With("@error", run.Error)
        .With("@waivers", run.Waivers.Count == 0 ? null : JsonSerializer.Serialize(run.Waivers, ServiceJson.Options))
        .With("@now", now);

    /// <summary>Stores a run with the caller's commands (inside its transaction); returns its id or the earlier run's for the same job.</summary>
    public static long Add(Func<string, DbCommand> command, RunRecord run, long now)
    {
        using (var insert = command(Insert))
        {
            AddRun(insert, run, now);
            if (insert.ExecuteScalar() is { } id and not DBNull)
            {
                return Convert.ToInt64(id, System.Globalization.CultureInfo.InvariantCulture);
            }
        }

        using var existing = command(ByJob).With("@job", run.JobId);
        return Convert.ToInt64(existing.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture);
    }

    public static RunRecord Read(DbDataReader r) => new(
        r.Long(0),
        r.GetString(1),
        r.NullableLong(2) is { } pr ? (int)pr : null,
        r.GetString(3),
        r.NullableString(4),
        r.NullableString(5),
        r.GetString(6),
        r.NullableString(7),
        r.GetString(8),
        r.NullableLong(9),
        r.NullableString(10),
        r.NullableString(11),
        r.NullableString(12),
        r.NullableString(13) is { } waivers ? JsonSerializer.Deserialize<List<Waiver>>(waivers, ServiceJson.Options) ?? [] : [],
        DateTimeOffset.FromUnixTimeMilliseconds(r.Long(14)));

    public static IReadOnlyList<RunRecord> ReadAll(DbDataReader r)
    {
        var runs = new List<RunRecord>();
        while (r.Read())
        {
            runs.Add(Read(r));
        }

        return runs;
    }
}
