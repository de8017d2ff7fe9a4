using System.Buffers;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Unicode;

using Readiness.Core.Checks;
using Readiness.Core.Engine;
using Readiness.Core.Reports;

namespace Readiness.Rendering;

/// <summary>
/// The report as a SARIF 2.1.0 log (OASIS, https://docs.oasis-open.org/sarif/sarif/v2.1.0/sarif-v2.1.0.html), for
/// code-scanning views: one <c>run</c>; one rule (<c>reportingDescriptor</c>) per check in the report, with the
/// check's title, why it matters, how to fix it, its page as <c>helpUri</c> and the checklist's severity as its
/// default level; one result per failure, error and unconfirmed manual item, located at its evidence (relative
/// to <c>%SRCROOT%</c>, the repository root). Run properties carry the tool version, the commit and the checklist.
/// </summary>
public sealed class SarifRenderer : IReportRenderer
{
    public const string SarifVersion = "2.1.0";

    /// <summary>The OASIS schema of SARIF 2.1.0 (errata 01), as the standard publishes it.</summary>
    public const string SchemaUri = "https://docs.oasis-open.org/sarif/sarif/v2.1.0/errata01/os/schemas/sarif-schema-2.1.0.json";

    /// <summary>The uriBaseId evidence paths are relative to: the root of the inspected repository.</summary>
    public const string SourceRoot = "SRCROOT";

    private static readonly JsonWriterOptions Options = new()
    {
        Indented = true,
        Encoder = JavaScriptEncoder.Create(UnicodeRanges.All),
        NewLine = "\n",
    };

    private readonly CheckCatalog? checks;
    private readonly CheckPages pages;
    private readonly ToolInfo tool;

    /// <param name="checks">Descriptors for the rules' descriptions; without it the rules carry the result titles only.</param>
    /// <param name="pages">Where the check pages are published.</param>
    /// <param name="tool">Name and version to record (default: this build's).</param>
    public SarifRenderer(CheckCatalog? checks = null, CheckPages? pages = null, ToolInfo? tool = null)
    {
        this.checks = checks;
        this.pages = pages ?? new CheckPages();
        this.tool = tool ?? ToolInfo.Current();
    }

    public string Format => "sarif";

    public void Render(Report report, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(output);
        var buffer = new ArrayBufferWriter<byte>();
        using (var json = new Utf8JsonWriter(buffer, Options))
        {
            Write(json, report);
        }

        output.Write(Encoding.UTF8.GetString(buffer.WrittenSpan));
        output.Write('\n');
    }

    /// <summary>The results a SARIF log lists: failures and errors (kind fail) and unconfirmed manual items (kind review).</summary>
    public static IEnumerable<CheckResult> Findings(Report report)
    {
        ArgumentNullException.ThrowIfNull(report);
        return report.ByImportance().Where(r => r.Status is CheckStatus.Fail or CheckStatus.Error or CheckStatus.Manual);
    }

    /// <summary>SARIF §3.27.10 levels for a checklist severity: block → error, warn → warning, info → note.</summary>
    public static string Level(Severity severity) => severity switch
    {
        Severity.Block => "error",
        Severity.Warn => "warning",
        _ => "note",
    };

    private void Write(Utf8JsonWriter json, Report report)
    {
        // One rule per check id, in first-appearance order; results refer to them by index (§3.27.6).
        var rules = report.Results.GroupBy(r => r.Check, StringComparer.Ordinal).Select(g => g.First()).ToList();
        var ruleIndex = rules.Select((r, i) => (r.Check, i)).ToDictionary(p => p.Check, p => p.i, StringComparer.Ordinal);

        json.WriteStartObject();
        json.WriteString("$schema", SchemaUri);
        json.WriteString("version", SarifVersion);
        json.WriteStartArray("runs");
        json.WriteStartObject();

        WriteTool(json, rules);
        WriteProvenance(json, report.Subject);
        json.WriteStartObject("originalUriBaseIds");
        json.WriteStartObject(SourceRoot);
        json.WriteStartObject("description");
        json.WriteString("text", "The root of the inspected repository.");
        json.WriteEndObject();
        json.WriteEndObject();
        json.WriteEndObject();

        json.WriteStartArray("results");
        foreach (var result in Findings(report))
        {
            WriteResult(json, result, ruleIndex[result.Check]);
        }

        json.WriteEndArray();

        json.WriteStartArray("invocations");
        json.WriteStartObject();
        json.WriteBoolean("executionSuccessful", true);
        json.WriteString("endTimeUtc", report.GeneratedAt.ToUniversalTime().ToString("yyyy-MM-ddTHH:mm:ss.fffZ", System.Globalization.CultureInfo.InvariantCulture));
        json.WriteEndObject();
        json.WriteEndArray();

        WriteRunProperties(json, report);
        json.WriteEndObject();
        json.WriteEndArray();
        json.WriteEndObject();
    }

    private void WriteTool(Utf8JsonWriter json, List<CheckResult> rules)
    {
        json.WriteStartObject("tool");
        json.WriteStartObject("driver");
        json.WriteString("name", tool.Name);
        json.WriteString("version", tool.Version);
        json.WriteString("semanticVersion", tool.ShortVersion);
        json.WriteString("informationUri", pages.BaseUrl);
        json.WriteStartArray("rules");
        foreach (var first in rules)
        {
            WriteRule(json, first);
        }

        json.WriteEndArray();
        json.WriteEndObject();
        json.WriteEndObject();
    }

    private void WriteRule(Utf8JsonWriter json, CheckResult first)
    {
        var descriptor = checks?.Find(first.Check)?.Descriptor;
        json.WriteStartObject();
        json.WriteString("id", first.Check);
        json.WriteString("name", RuleName(first.Check));
        WriteMessage(json, "shortDescription", Sentence(descriptor?.Title ?? first.Title, first.Check));
        WriteMessage(json, "fullDescription", Sentence(descriptor?.Why ?? descriptor?.Title ?? first.Title, first.Check));
        if (descriptor is not null)
        {
            WriteMessage(json, "help", Sentence(descriptor.Fix, descriptor.Title));
            json.WriteString("helpUri", pages.For(descriptor.Id));
        }

        json.WriteStartObject("defaultConfiguration");
        json.WriteString("level", Level(first.Severity));
        json.WriteEndObject();

        json.WriteStartObject("properties");
        json.WriteStartArray("tags");
        json.WriteStringValue(Group(first.Check));
        json.WriteEndArray();
        json.WriteString("severity", first.Severity.Name());
        WriteStandard(json, descriptor?.Standard ?? first.Standard);
        json.WriteEndObject();
        json.WriteEndObject();
    }

    private static void WriteResult(Utf8JsonWriter json, CheckResult result, int ruleIndex)
    {
        json.WriteStartObject();
        json.WriteString("ruleId", result.Check);
        json.WriteNumber("ruleIndex", ruleIndex);
        if (result.Status == CheckStatus.Manual)
        {
            // §3.27.9: a result that needs a person's review; its level must then be "none".
            json.WriteString("kind", "review");
            json.WriteString("level", "none");
        }
        else
        {
            json.WriteString("kind", "fail");
            json.WriteString("level", Level(result.Severity));
        }

        WriteMessage(json, "message", ResultText(result));

        var evidence = result.Evidence.Where(e => !string.IsNullOrWhiteSpace(e.Path)).ToList();
        if (evidence.Count > 0)
        {
            json.WriteStartArray("locations");
            WriteLocation(json, evidence[0], null);
            json.WriteEndArray();
        }

        if (evidence.Count > 1)
        {
            json.WriteStartArray("relatedLocations");
            for (var i = 1; i < evidence.Count; i++)
            {
                WriteLocation(json, evidence[i], i);
            }

            json.WriteEndArray();
        }

        json.WriteStartObject("properties");
        json.WriteString("status", result.Status.Name());
        json.WriteString("severity", result.Severity.Name());
        if (!string.IsNullOrEmpty(result.Package))
        {
            json.WriteString("package", result.Package);
        }

        json.WriteEndObject();
        json.WriteEndObject();
    }

    private static void WriteLocation(Utf8JsonWriter json, Evidence evidence, int? id)
    {
        json.WriteStartObject();
        if (id is { } n)
        {
            json.WriteNumber("id", n);
        }

        json.WriteStartObject("physicalLocation");
        json.WriteStartObject("artifactLocation");
        json.WriteString("uri", RelativeUri(evidence.Path));
        json.WriteString("uriBaseId", SourceRoot);
        json.WriteEndObject();
        if (evidence.Line is > 0 and var line)
        {
            json.WriteStartObject("region");
            json.WriteNumber("startLine", line);
            json.WriteEndObject();
        }

        json.WriteEndObject();
        json.WriteEndObject();
    }

    private static void WriteProvenance(Utf8JsonWriter json, ReportSubject subject)
    {
        // §3.23: repositoryUri must be an absolute URI; a local path is not recorded here (run properties have it).
        if (!Uri.TryCreate(subject.Repository, UriKind.Absolute, out var repository) || repository.IsFile)
        {
            return;
        }

        json.WriteStartArray("versionControlProvenance");
        json.WriteStartObject();
        json.WriteString("repositoryUri", repository.AbsoluteUri);
        json.WriteString("revisionId", subject.Commit);
        if (!string.IsNullOrEmpty(subject.Tag))
        {
            json.WriteString("revisionTag", subject.Tag);
        }

        json.WriteStartObject("mappedTo");
        json.WriteString("uriBaseId", SourceRoot);
        json.WriteEndObject();
        json.WriteEndObject();
        json.WriteEndArray();
    }

    private void WriteRunProperties(Utf8JsonWriter json, Report report)
    {
        var s = report.Subject;
        json.WriteStartObject("properties");
        json.WriteString("toolVersion", tool.Version);
        json.WriteString("commit", s.Commit);
        json.WriteString("checklist", s.Checklist);
        json.WriteString("ref", s.Ref);
        json.WriteString("tag", s.Tag);
        json.WriteString("version", s.Version);
        json.WriteString("inspected", s.Inspected == InspectionKind.Worktree ? "worktree" : "commit");
        json.WriteString("repository", s.Repository);
        json.WriteBoolean("ready", report.Ready);
        json.WriteNumber("blocking", report.Summary.Blocking);
        json.WriteString("reportSchema", Report.Schema);
        json.WriteEndObject();
    }

    private static void WriteStandard(Utf8JsonWriter json, StandardReference standard)
    {
        json.WriteStartObject("standard");
        json.WriteString("name", standard.Name);
        json.WriteString("url", standard.Url);
        json.WriteEndObject();
    }

    private static void WriteMessage(Utf8JsonWriter json, string name, string text)
    {
        json.WriteStartObject(name);
        json.WriteString("text", text);
        json.WriteEndObject();
    }

    /// <summary>What was found, then how to fix it: the message code-scanning views show on the line.</summary>
    private static string ResultText(CheckResult result)
    {
        var message = Sentence(result.Message, result.Title);
        var package = string.IsNullOrEmpty(result.Package) ? string.Empty : $"{result.Package}: ";
        var fix = string.IsNullOrWhiteSpace(result.Hint) ? string.Empty : " Fix: " + Sentence(result.Hint, string.Empty);
        return (package + message + fix).Trim();
    }

    /// <summary>Non-empty text ending in a full stop (§3.11.7 asks messages to be complete sentences).</summary>
    private static string Sentence(string? text, string fallback)
    {
        var chosen = string.IsNullOrWhiteSpace(text) ? fallback : text;
        var trimmed = (chosen ?? string.Empty).Trim();
        if (trimmed.Length == 0)
        {
            return "No description.";
        }

        return trimmed[^1] is '.' or '!' or '?' ? trimmed : trimmed + ".";
    }

    /// <summary>A repository-relative path as a relative URI reference: each segment percent-encoded (RFC 3986).</summary>
    public static string RelativeUri(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        var segments = path.Replace('\\', '/').Split('/', StringSplitOptions.RemoveEmptyEntries);
        return string.Join('/', segments.Select(Uri.EscapeDataString));
    }

    /// <summary>A rule name in the Pascal case SARIF's examples use: <c>changelog.has-entry</c> → <c>ChangelogHasEntry</c>.</summary>
    private static string RuleName(string id)
    {
        var builder = new StringBuilder(id.Length);
        var upper = true;
        foreach (var c in id)
        {
            if (!char.IsAsciiLetterOrDigit(c))
            {
                upper = true;
                continue;
            }

            builder.Append(upper ? char.ToUpperInvariant(c) : c);
            upper = false;
        }

        return builder.Length > 0 ? builder.ToString() : "Check";
    }

    private static string Group(string id)
    {
        var dot = id.IndexOf('.', StringComparison.Ordinal);
        return dot > 0 ? id[..dot] : id;
    }
}
