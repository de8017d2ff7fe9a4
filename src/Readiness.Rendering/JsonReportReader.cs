using System.Globalization;
using System.Text;
using System.Text.Json;

using Readiness.Core.Reports;

using N = Readiness.Rendering.ReportJsonNames;

namespace Readiness.Rendering;

/// <summary>
/// Reads a JSON report (schema <c>readiness-report/1</c>, as <see cref="JsonRenderer"/> writes it) back into a
/// <see cref="Report"/>. Unknown fields are ignored (the contract lets new fields appear); missing or mistyped
/// contract fields throw <see cref="ReportFormatException"/> naming the JSON path.
/// </summary>
public static class JsonReportReader
{
    /// <summary>Reports are bounded: larger input is refused before parsing.</summary>
    public const int MaxChars = 16 * 1024 * 1024;

    private static readonly JsonDocumentOptions DocumentOptions = new() { MaxDepth = 16 };

    public static Report Read(TextReader reader)
    {
        ArgumentNullException.ThrowIfNull(reader);
        var text = new StringBuilder();
        var buffer = new char[64 * 1024];
        int read;
        while ((read = reader.Read(buffer, 0, buffer.Length)) > 0)
        {
            if (text.Length + read > MaxChars)
            {
                throw new ReportFormatException($"The report is larger than {MaxChars} characters.");
            }

            text.Append(buffer, 0, read);
        }

        return Parse(text.ToString());
    }

    public static Report Parse(string json)
    {
        ArgumentNullException.ThrowIfNull(json);
        if (json.Length > MaxChars)
        {
            throw new ReportFormatException($"The report is larger than {MaxChars} characters.");
        }

        JsonDocument document;
        try
        {
            document = JsonDocument.Parse(json, DocumentOptions);
        }
        catch (JsonException e)
        {
            throw new ReportFormatException($"The report is not valid JSON: {e.Message}", e);
        }

        using (document)
        {
            return ReadReport(document.RootElement);
        }
    }

    private static Report ReadReport(JsonElement root)
    {
        RequireKind(root, JsonValueKind.Object, "$");
        var schema = RequiredString(root, N.Schema, "$");
        if (schema != Report.Schema)
        {
            throw new ReportFormatException($"$.{N.Schema}: expected \"{Report.Schema}\", found \"{schema}\".");
        }

        var ready = RequiredBool(root, N.Ready, "$");
        var subject = ReadSubject(Required(root, N.Subject, JsonValueKind.Object, "$"));
        var summary = ReadSummary(Required(root, N.Summary, JsonValueKind.Object, "$"));
        var results = new List<CheckResult>();
        var index = 0;
        foreach (var item in Required(root, N.Results, JsonValueKind.Array, "$").EnumerateArray())
        {
            results.Add(ReadResult(item, $"$.{N.Results}[{index++}]"));
        }

        var generatedAt = DateTimeOffset.MinValue;
        if (Optional(root, N.GeneratedAt) is { } at)
        {
            if (at.ValueKind != JsonValueKind.String || !at.TryGetDateTimeOffset(out generatedAt))
            {
                throw new ReportFormatException($"$.{N.GeneratedAt}: expected an ISO 8601 date and time.");
            }
        }

        var notes = new List<string>();
        if (Optional(root, N.Notes) is { } notesElement)
        {
            RequireKind(notesElement, JsonValueKind.Array, $"$.{N.Notes}");
            index = 0;
            foreach (var note in notesElement.EnumerateArray())
            {
                RequireKind(note, JsonValueKind.String, $"$.{N.Notes}[{index++}]");
                notes.Add(note.GetString()!);
            }
        }

        return new Report(subject, ready, summary, results, generatedAt, notes);
    }

    private static ReportSubject ReadSubject(JsonElement e)
    {
        const string at = "$." + N.Subject;
        var inspected = RequiredString(e, N.Inspected, at) switch
        {
            N.InspectedCommit => InspectionKind.Commit,
            N.InspectedWorktree => InspectionKind.Worktree,
            var other => throw new ReportFormatException($"{at}.{N.Inspected}: expected \"commit\" or \"worktree\", found \"{other}\"."),
        };
        return new ReportSubject(
            RequiredString(e, N.Repository, at),
            RequiredString(e, N.Commit, at),
            RequiredString(e, N.Ref, at),
            NullableString(e, N.Tag, at),
            NullableString(e, N.Version, at),
            RequiredString(e, N.Checklist, at),
            inspected);
    }

    private static ReportSummary ReadSummary(JsonElement e)
    {
        const string at = "$." + N.Summary;
        return new ReportSummary(
            RequiredInt(e, CheckStatus.Pass.Name(), at),
            RequiredInt(e, CheckStatus.Fail.Name(), at),
            RequiredInt(e, CheckStatus.Skip.Name(), at),
            RequiredInt(e, CheckStatus.Manual.Name(), at),
            RequiredInt(e, CheckStatus.Error.Name(), at),
            RequiredInt(e, N.Blocking, at));
    }

    private static CheckResult ReadResult(JsonElement e, string at)
    {
        RequireKind(e, JsonValueKind.Object, at);
        var statusText = RequiredString(e, N.Status, at);
        var status = Enum.GetValues<CheckStatus>().Where(s => s.Name() == statusText).Select(s => (CheckStatus?)s).FirstOrDefault()
            ?? throw new ReportFormatException($"{at}.{N.Status}: unknown status \"{statusText}\".");
        var severityText = RequiredString(e, N.Severity, at);
        if (!StatusNames.TryParseSeverity(severityText, out var severity))
        {
            throw new ReportFormatException($"{at}.{N.Severity}: unknown severity \"{severityText}\".");
        }

        var evidence = new List<Evidence>();
        var index = 0;
        foreach (var item in Required(e, N.Evidence, JsonValueKind.Array, at).EnumerateArray())
        {
            var itemAt = $"{at}.{N.Evidence}[{index++}]";
            RequireKind(item, JsonValueKind.Object, itemAt);
            int? line = null;
            if (Optional(item, N.Line) is { ValueKind: not JsonValueKind.Null } lineElement)
            {
                line = lineElement.ValueKind == JsonValueKind.Number && lineElement.TryGetInt32(out var value)
                    ? value
                    : throw new ReportFormatException($"{itemAt}.{N.Line}: expected a whole number or null.");
            }

            evidence.Add(new Evidence(RequiredString(item, N.Path, itemAt), line));
        }

        var standardAt = $"{at}.{N.Standard}";
        var standard = Required(e, N.Standard, JsonValueKind.Object, at);
        return new CheckResult(
            RequiredString(e, N.Check, at),
            RequiredString(e, N.Title, at),
            status,
            severity,
            NullableString(e, N.Package, at),
            RequiredString(e, N.Message, at),
            NullableString(e, N.Hint, at),
            evidence,
            new StandardReference(RequiredString(standard, N.Name, standardAt), RequiredString(standard, N.Url, standardAt)));
    }

    private static JsonElement? Optional(JsonElement parent, string name) =>
        parent.TryGetProperty(name, out var value) ? value : null;

    private static JsonElement Required(JsonElement parent, string name, JsonValueKind kind, string at)
    {
        if (!parent.TryGetProperty(name, out var value))
        {
            throw new ReportFormatException($"{at}.{name}: missing.");
        }

        RequireKind(value, kind, $"{at}.{name}");
        return value;
    }

    private static string RequiredString(JsonElement parent, string name, string at) =>
        Required(parent, name, JsonValueKind.String, at).GetString()!;

    private static string? NullableString(JsonElement parent, string name, string at)
    {
        var value = Optional(parent, name);
        if (value is null || value.Value.ValueKind == JsonValueKind.Null)
        {
            return null;
        }

        RequireKind(value.Value, JsonValueKind.String, $"{at}.{name}");
        return value.Value.GetString();
    }

    private static bool RequiredBool(JsonElement parent, string name, string at)
    {
        if (!parent.TryGetProperty(name, out var value) || value.ValueKind is not (JsonValueKind.True or JsonValueKind.False))
        {
            throw new ReportFormatException($"{at}.{name}: expected true or false.");
        }

        return value.GetBoolean();
    }

    private static int RequiredInt(JsonElement parent, string name, string at)
    {
        var value = Required(parent, name, JsonValueKind.Number, at);
        return value.TryGetInt32(out var number) && number >= 0
            ? number
            : throw new ReportFormatException($"{at}.{name}: expected a count, found {value.GetRawText()}.");
    }

    private static void RequireKind(JsonElement element, JsonValueKind kind, string at)
    {
        if (element.ValueKind != kind)
        {
            throw new ReportFormatException(string.Create(
                CultureInfo.InvariantCulture,
                $"{at}: expected {kind.ToString().ToLowerInvariant()}, found {element.ValueKind.ToString().ToLowerInvariant()}."));
        }
    }
}
