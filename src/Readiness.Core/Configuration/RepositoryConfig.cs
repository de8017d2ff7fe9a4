using Readiness.Core.Checklists;

namespace Readiness.Core.Configuration;

/// <summary>
/// The inspected repository's <c>.readiness.yml</c> (all optional). Top-level values double as check parameters:
/// a check asks <see cref="Checks.CheckParameters"/> and gets its checklist's <c>settings:</c> value, else this file's.
/// </summary>
public sealed record RepositoryConfig(
    string? Checklist,
    string TagPattern,
    IReadOnlyDictionary<string, ConfigNode> Values,
    IReadOnlyList<KeyValuePair<string, CheckSettings>> Checks,
    string? Source)
{
    public const string FileName = ".readiness.yml";
    public const string DefaultTagPattern = "v{version}";

    public static RepositoryConfig Empty { get; } =
        new(null, DefaultTagPattern, new Dictionary<string, ConfigNode>(), [], null);

    public string? Get(string key) => Values.TryGetValue(key, out var node) ? node.AsString(key) : null;

    public IReadOnlyList<string> GetList(string key) => Values.TryGetValue(key, out var node) ? node.AsStrings(key) : [];
}
