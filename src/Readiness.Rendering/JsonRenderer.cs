using System.Buffers;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Unicode;

using Readiness.Core.Reports;

using N = Readiness.Rendering.ReportJsonNames;

namespace Readiness.Rendering;

/// <summary>
/// The machine-readable report, schema <c>readiness-report/1</c> as cli.md defines it, plus <c>generatedAt</c>
/// (ISO 8601) and <c>notes</c>. Absent values are written as <c>null</c>, so every result has the same fields.
/// <see cref="JsonReportReader"/> reads it back without loss.
/// </summary>
public sealed class JsonRenderer : IReportRenderer
{
    /// <summary>Non-ASCII letters stay readable; HTML-sensitive characters are still escaped (\u003C etc.).</summary>
    private static readonly JsonWriterOptions Options = new()
    {
        Indented = true,
        Encoder = JavaScriptEncoder.Create(UnicodeRanges.All),
        NewLine = "\n",
    };

    /// <summary>
    /// MAJOR.MINOR of the published schema (<c>Schemas/readiness-report-1.schema.json</c>): the major part is the
    /// <c>/1</c> of <c>schema</c>; the minor part grows when fields are added (1.1 added <c>schemaVersion</c>).
    /// </summary>
    public const string SchemaVersion = "1.1";

    public string Format => "json";

    public void Render(Report report, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(output);
        output.Write(ToJson(report));
        output.Write('\n');
    }

    /// <summary>The report as one JSON document (no trailing line break).</summary>
    public static string ToJson(Report report)
    {
        ArgumentNullException.ThrowIfNull(report);
        var buffer = new ArrayBufferWriter<byte>();
        using (var json = new Utf8JsonWriter(buffer, Options))
        {
            Write(json, report);
        }

        return Encoding.UTF8.GetString(buffer.WrittenSpan);
    }

    private static void Write(Utf8JsonWriter json, Report report)
    {
        json.WriteStartObject();
        json.WriteString(N.Schema, Report.Schema);
        json.WriteString(N.SchemaVersion, SchemaVersion);
        json.WriteBoolean(N.Ready, report.Ready);

        var s = report.Subject;
        json.WriteStartObject(N.Subject);
        json.WriteString(N.Repository, s.Repository);
        json.WriteString(N.Commit, s.Commit);
        json.WriteString(N.Ref, s.Ref);
        json.WriteString(N.Tag, s.Tag);
        json.WriteString(N.Version, s.Version);
        json.WriteString(N.Checklist, s.Checklist);
        json.WriteString(N.Inspected, s.Inspected == InspectionKind.Worktree ? N.InspectedWorktree : N.InspectedCommit);
        json.WriteEndObject();

        var c = report.Summary;
        json.WriteStartObject(N.Summary);
        json.WriteNumber(CheckStatus.Pass.Name(), c.Pass);
        json.WriteNumber(CheckStatus.Fail.Name(), c.Fail);
        json.WriteNumber(CheckStatus.Skip.Name(), c.Skip);
        json.WriteNumber(CheckStatus.Manual.Name(), c.Manual);
        json.WriteNumber(CheckStatus.Error.Name(), c.Error);
        json.WriteNumber(N.Blocking, c.Blocking);
        json.WriteEndObject();

        json.WriteStartArray(N.Results);
        foreach (var r in report.Results)
        {
            WriteResult(json, r);
        }

        json.WriteEndArray();

        json.WriteString(N.GeneratedAt, report.GeneratedAt);
        json.WriteStartArray(N.Notes);
        foreach (var note in report.Notes)
        {
            json.WriteStringValue(note);
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void WriteResult(Utf8JsonWriter json, CheckResult r)
    {
        json.WriteStartObject();
        json.WriteString(N.Check, r.Check);
        json.WriteString(N.Title, r.Title);
        json.WriteString(N.Status, r.Status.Name());
        json.WriteString(N.Severity, r.Severity.Name());
        json.WriteString(N.Package, r.Package);
        json.WriteString(N.Message, r.Message);
        json.WriteString(N.Hint, r.Hint);
        json.WriteStartArray(N.Evidence);
        foreach (var e in r.Evidence)
        {
            json.WriteStartObject();
            json.WriteString(N.Path, e.Path);
            if (e.Line is { } line)
            {
                json.WriteNumber(N.Line, line);
            }
            else
            {
                json.WriteNull(N.Line);
            }

            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartObject(N.Standard);
        json.WriteString(N.Name, r.Standard.Name);
        json.WriteString(N.Url, r.Standard.Url);
        json.WriteEndObject();
        json.WriteEndObject();
    }
}
