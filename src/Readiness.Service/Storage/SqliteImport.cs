using Microsoft.Data.Sqlite;
using Npgsql;

namespace Readiness.Service.Storage;

/// <summary>
/// The upgrade from the embedded store: copies every delivery, job and run of a SQLite file into an empty
/// PostgreSQL database in one transaction, keeping ids (run pages keep their addresses), then moves the id
/// sequences past them. Run with the service stopped.
/// </summary>
public static class SqliteImport
{
    private static readonly string[] Tables = ["deliveries", "jobs", "runs"];

    /// <summary>Copies the rows; returns the count per table. Refuses a target that already holds rows.</summary>
    public static IReadOnlyDictionary<string, long> Run(string sqliteFile, PostgresDatabase target)
    {
        ArgumentNullException.ThrowIfNull(target);
        if (!File.Exists(sqliteFile))
        {
            throw new FileNotFoundException($"no SQLite database at {sqliteFile}", sqliteFile);
        }

        using var source = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = sqliteFile, Mode = SqliteOpenMode.ReadOnly }.ToString());
        source.Open();
        using var c = target.Open();
        using var t = c.BeginTransaction();
        foreach (var table in Tables)
        {
            using var any = new NpgsqlCommand($"SELECT EXISTS(SELECT 1 FROM {table})", c, t);
            if ((bool)any.ExecuteScalar()!)
            {
                throw new InvalidOperationException($"the PostgreSQL database already holds {table}; import into an empty one");
            }
        }

        var counts = new Dictionary<string, long>(StringComparer.Ordinal);
        foreach (var table in Tables)
        {
            counts[table] = Copy(source, c, t, table);
        }

        foreach (var table in new[] { "jobs", "runs" })
        {
            using var sequence = new NpgsqlCommand($"SELECT setval(pg_get_serial_sequence('{table}', 'id'), COALESCE((SELECT MAX(id) FROM {table}), 0) + 1, false)", c, t);
            sequence.ExecuteNonQuery();
        }

        t.Commit();
        return counts;
    }

    private static long Copy(SqliteConnection source, NpgsqlConnection c, NpgsqlTransaction t, string table)
    {
        using var read = source.CreateCommand();
        read.CommandText = $"SELECT * FROM {table} ORDER BY rowid";
        using var rows = read.ExecuteReader();
        var columns = Enumerable.Range(0, rows.FieldCount).Select(rows.GetName).ToArray();
        var sql = $"INSERT INTO {table}({string.Join(", ", columns)}) VALUES ({string.Join(", ", columns.Select((_, i) => "@p" + i))})";
        long count = 0;
        while (rows.Read())
        {
            using var insert = new NpgsqlCommand(sql, c, t);
            for (var i = 0; i < columns.Length; i++)
            {
                insert.With("@p" + i, rows.IsDBNull(i) ? null : rows.GetValue(i));
            }

            insert.ExecuteNonQuery();
            count++;
        }

        return count;
    }
}
