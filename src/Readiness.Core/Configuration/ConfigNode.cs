namespace Readiness.Core.Configuration;

/// <summary>A position in a configuration file: 1-based line and column.</summary>
public sealed record ConfigMark(string File, int Line, int Column)
{
    public override string ToString() => $"{File}:{Line}:{Column}";
}

/// <summary>A YAML value with its position; aliases and anchors never reach this model (they are refused).</summary>
public abstract record ConfigNode(ConfigMark Mark);

public sealed record ConfigScalar(string Value, ConfigMark Mark) : ConfigNode(Mark);

public sealed record ConfigList(IReadOnlyList<ConfigNode> Items, ConfigMark Mark) : ConfigNode(Mark);

public sealed record ConfigMap(IReadOnlyList<ConfigEntry> Entries, ConfigMark Mark) : ConfigNode(Mark)
{
    public ConfigEntry? Find(string key) => Entries.FirstOrDefault(e => e.Key == key);
}

/// <summary>One key of a mapping, with the key's own position.</summary>
public sealed record ConfigEntry(string Key, ConfigMark KeyMark, ConfigNode Value);
