using Readiness.Core.Configuration;

namespace Readiness.Core.Checks;

/// <summary>A check's parameters: the checklist's <c>settings:</c> values, falling back to the repository configuration.</summary>
public sealed class CheckParameters(IReadOnlyDictionary<string, ConfigNode> with, RepositoryConfig config)
{
    public static CheckParameters None { get; } = new(new Dictionary<string, ConfigNode>(), RepositoryConfig.Empty);

    public RepositoryConfig Config => config;

    public ConfigNode? Node(string name) =>
        with.TryGetValue(name, out var node) ? node : config.Values.TryGetValue(name, out var fromConfig) ? fromConfig : null;

    public string? String(string name) => Node(name)?.AsString(name);

    public IReadOnlyList<string> Strings(string name) => Node(name)?.AsStrings(name) ?? [];

    public bool Bool(string name, bool fallback = false) => Node(name)?.AsBool(name) ?? fallback;
}
