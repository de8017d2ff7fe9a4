using System.Text.Json;

namespace Readiness.Service;

/// <summary>The JSON settings of the service's own documents (camelCase, no indentation).</summary>
public static class ServiceJson
{
    public static JsonSerializerOptions Options { get; } = new(JsonSerializerDefaults.Web);
}
