namespace Readiness.Core.Projects.MsBuild;

/// <summary>One item during pass 2: its type, its spec (unescaped Include entry), metadata and declaration.</summary>
internal sealed class ItemRecord(string type, string spec, SourceLocation location, Dictionary<string, MetadataValue> metadata)
{
    public string Type { get; } = type;

    public string Spec { get; } = spec;

    public SourceLocation Location { get; } = location;

    public Dictionary<string, MetadataValue> Metadata { get; } = metadata;

    public string? Meta(string name) => Metadata.TryGetValue(name, out var m) ? m.Value : null;
}
