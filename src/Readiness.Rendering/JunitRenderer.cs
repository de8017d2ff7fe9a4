using System.Globalization;
using System.Text;
using System.Xml;

using Readiness.Core.Reports;

namespace Readiness.Rendering;

/// <summary>
/// The report as JUnit XML for test dashboards: one <c>testsuite</c> (the checklist run), one <c>testcase</c> per
/// result; a <c>fail</c> is a <c>failure</c>, an <c>error</c> an <c>error</c>, <c>skip</c> and unconfirmed
/// <c>manual</c> items are <c>skipped</c>, each with the message, the location and the fix. JUnit XML has no
/// published standard; the element and attribute names follow the schema test tools commonly share (common
/// practice, no published source). Written with <see cref="XmlWriter"/>; characters XML 1.0 cannot carry are
/// written as visible <c>\uXXXX</c>.
/// </summary>
public sealed class JunitRenderer(ToolInfo? tool = null) : IReportRenderer
{
    private readonly ToolInfo tool = tool ?? ToolInfo.Current();

    public string Format => "junit";

    public void Render(Report report, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(output);
        using var buffer = new MemoryStream();
        var settings = new XmlWriterSettings
        {
            Encoding = new UTF8Encoding(false),
            Indent = true,
            IndentChars = "  ",
            NewLineChars = "\n",
            NewLineHandling = NewLineHandling.Entitize,
            CheckCharacters = true,
        };
        using (var xml = XmlWriter.Create(buffer, settings))
        {
            Write(xml, report);
        }

        output.Write(Encoding.UTF8.GetString(buffer.ToArray()));
        output.Write('\n');
    }

    private void Write(XmlWriter xml, Report report)
    {
        var s = report.Summary;
        var tests = report.Results.Count.ToString(CultureInfo.InvariantCulture);
        var failures = s.Fail.ToString(CultureInfo.InvariantCulture);
        var errors = s.Error.ToString(CultureInfo.InvariantCulture);
        var skipped = (s.Skip + s.Manual).ToString(CultureInfo.InvariantCulture);
        var timestamp = report.GeneratedAt.ToUniversalTime().ToString("yyyy-MM-ddTHH:mm:ss", CultureInfo.InvariantCulture);
        var name = $"readiness {Clean(report.Subject.Checklist)} {Clean(report.Subject.Version ?? report.Subject.Ref)}";

        xml.WriteStartDocument();
        xml.WriteStartElement("testsuites");
        xml.WriteAttributeString("name", name);
        Counts(xml, tests, failures, errors, skipped);
        xml.WriteStartElement("testsuite");
        xml.WriteAttributeString("name", name);
        Counts(xml, tests, failures, errors, skipped);
        xml.WriteAttributeString("timestamp", timestamp);
        xml.WriteAttributeString("time", "0");

        xml.WriteStartElement("properties");
        var subject = report.Subject;
        Property(xml, "repository", subject.Repository);
        Property(xml, "commit", subject.Commit);
        Property(xml, "ref", subject.Ref);
        Property(xml, "tag", subject.Tag);
        Property(xml, "version", subject.Version);
        Property(xml, "checklist", subject.Checklist);
        Property(xml, "ready", report.Ready ? "true" : "false");
        Property(xml, "blocking", s.Blocking.ToString(CultureInfo.InvariantCulture));
        Property(xml, "tool", tool.Name + " " + tool.Version);
        xml.WriteEndElement();

        foreach (var result in report.Results)
        {
            WriteCase(xml, result);
        }

        xml.WriteEndElement();
        xml.WriteEndElement();
        xml.WriteEndDocument();
    }

    private static void WriteCase(XmlWriter xml, CheckResult result)
    {
        xml.WriteStartElement("testcase");
        var package = string.IsNullOrEmpty(result.Package) ? string.Empty : $" ({result.Package})";
        xml.WriteAttributeString("name", Clean(result.Check + package));
        xml.WriteAttributeString("classname", Clean(result.Check));
        var where = result.Evidence.FirstOrDefault(e => !string.IsNullOrWhiteSpace(e.Path));
        if (where is not null)
        {
            xml.WriteAttributeString("file", Clean(where.Path));
            if (where.Line is { } line)
            {
                xml.WriteAttributeString("line", line.ToString(CultureInfo.InvariantCulture));
            }
        }

        xml.WriteAttributeString("time", "0");
        var element = result.Status switch
        {
            CheckStatus.Fail => "failure",
            CheckStatus.Error => "error",
            CheckStatus.Skip or CheckStatus.Manual => "skipped",
            _ => null,
        };
        if (element is not null)
        {
            xml.WriteStartElement(element);
            var message = result.Status == CheckStatus.Manual ? "manual: " + result.Message : result.Message;
            xml.WriteAttributeString("message", Clean(message));
            if (element != "skipped")
            {
                xml.WriteAttributeString("type", result.Severity.Name());
                xml.WriteString(Clean(Details(result)));
            }

            xml.WriteEndElement();
        }

        xml.WriteEndElement();
    }

    /// <summary>The failure's body: message, each place, the fix and the standard, one per line.</summary>
    private static string Details(CheckResult result)
    {
        var lines = new List<string> { $"{result.Check} ({result.Severity.Name()}): {result.Message}" };
        lines.AddRange(result.Evidence.Select(e => "at " + e));
        if (!string.IsNullOrWhiteSpace(result.Hint))
        {
            lines.Add("Fix: " + result.Hint);
        }

        lines.Add($"Standard: {result.Standard.Name} {result.Standard.Url}".TrimEnd());
        return string.Join('\n', lines);
    }

    private static void Counts(XmlWriter xml, string tests, string failures, string errors, string skipped)
    {
        xml.WriteAttributeString("tests", tests);
        xml.WriteAttributeString("failures", failures);
        xml.WriteAttributeString("errors", errors);
        xml.WriteAttributeString("skipped", skipped);
    }

    private static void Property(XmlWriter xml, string name, string? value)
    {
        xml.WriteStartElement("property");
        xml.WriteAttributeString("name", name);
        xml.WriteAttributeString("value", Clean(value));
        xml.WriteEndElement();
    }

    private static string Clean(string? text) => VisibleControls.ForXml(text);
}
