using System.Text.Json;
using System.Text.Json.Nodes;

using Json.Schema;

using Readiness.Core.Reports;
using Readiness.Testing;

namespace Readiness.Rendering.Tests;

/// <summary>
/// The published JSON Schema of the report (src/Readiness.Rendering/Schemas/readiness-report-1.schema.json), checked
/// with a reference JSON Schema 2020-12 implementation (JsonSchema.Net from NuGet) against every fixture's report.
/// </summary>
public sealed class JsonSchemaTests
{
    public const string SchemaPath = "src/Readiness.Rendering/Schemas/readiness-report-1.schema.json";

    private static readonly EvaluationOptions Options = new() { OutputFormat = OutputFormat.List, RequireFormatValidation = true };

    public static TheoryData<string> Fixtures => new() { "demo", "ready", "hostile" };

    /// <summary>Built once: the library registers a schema under its $id globally and refuses a second one.</summary>
    private static readonly Lazy<JsonSchema> Built = new(() =>
        JsonSchema.FromText(File.ReadAllText(Path.Combine(RepositoryRoot.Path, SchemaPath))));

    private static JsonSchema Schema() => Built.Value;

    private static Report Fixture(string name) => name switch
    {
        "demo" => SampleReports.Demo(),
        "ready" => SampleReports.Ready(),
        _ => SampleReports.Hostile(),
    };

    private static string Errors(EvaluationResults results) =>
        string.Join('\n', (results.Details ?? []).Where(d => d.Errors is { Count: > 0 })
            .SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Key} {e.Value}")));

    [Theory]
    [MemberData(nameof(Fixtures))]
    public void EveryFixturesReport_IsValidAgainstThePublishedSchema(string fixture)
    {
        using var report = JsonDocument.Parse(SampleReports.Render(new JsonRenderer(), Fixture(fixture)));

        var results = Schema().Evaluate(report.RootElement, Options);

        Assert.True(results.IsValid, Errors(results));
        Assert.Equal(JsonRenderer.SchemaVersion, report.RootElement.GetProperty("schemaVersion").GetString());
    }

    [Theory]
    [InlineData("schemaVersion", null)]
    [InlineData("ready", "\"yes\"")]
    [InlineData("schema", "\"readiness-report/2\"")]
    public void ReportsThatBreakTheContract_AreRejected(string field, string? replacement)
    {
        // Control for the test above: the schema must reject a missing or mistyped stable field.
        var node = JsonNode.Parse(SampleReports.Render(new JsonRenderer(), SampleReports.Demo()))!.AsObject();
        node.Remove(field);
        if (replacement is not null)
        {
            node[field] = JsonNode.Parse(replacement);
        }

        using var broken = JsonDocument.Parse(node.ToJsonString());
        Assert.False(Schema().Evaluate(broken.RootElement, Options).IsValid);
    }

    [Fact]
    public void UnknownStatusWord_IsRejected()
    {
        var node = JsonNode.Parse(SampleReports.Render(new JsonRenderer(), SampleReports.Demo()))!;
        node["results"]![0]!["status"] = "passed";

        using var broken = JsonDocument.Parse(node.ToJsonString());
        Assert.False(Schema().Evaluate(broken.RootElement, Options).IsValid);
    }

    [Fact]
    public void Schema_DescribesEveryFieldTheRendererWrites()
    {
        // The schema and the renderer must not drift: every property of a rendered report is named by the schema.
        using var schema = JsonDocument.Parse(File.ReadAllText(Path.Combine(RepositoryRoot.Path, SchemaPath)));
        using var report = JsonDocument.Parse(SampleReports.Render(new JsonRenderer(), SampleReports.Demo()));
        var top = schema.RootElement.GetProperty("properties");
        var result = schema.RootElement.GetProperty("$defs").GetProperty("result").GetProperty("properties");

        Assert.All(report.RootElement.EnumerateObject(), p => Assert.True(top.TryGetProperty(p.Name, out _), p.Name));
        Assert.All(report.RootElement.GetProperty("results")[0].EnumerateObject(), p => Assert.True(result.TryGetProperty(p.Name, out _), p.Name));
        Assert.All(report.RootElement.GetProperty("subject").EnumerateObject(), p =>
            Assert.True(top.GetProperty("subject").GetProperty("properties").TryGetProperty(p.Name, out _), p.Name));
    }
}
