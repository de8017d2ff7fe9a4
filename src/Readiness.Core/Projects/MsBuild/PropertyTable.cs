namespace Readiness.Core.Projects.MsBuild;

/// <summary>The properties of one evaluation, keyed case-insensitively as MSBuild does.</summary>
internal sealed class PropertyTable
{
    private readonly Dictionary<string, PropertyEntry> entries = new(StringComparer.OrdinalIgnoreCase);

    public PropertyEntry? this[string name] => entries.TryGetValue(name, out var e) ? e : null;

    public IEnumerable<PropertyEntry> All => entries.Values;

    /// <summary>The escaped value, or "" when undefined.</summary>
    public string Value(string name) => this[name]?.Value ?? string.Empty;

    public bool IsTrue(string name) => string.Equals(Value(name), "true", StringComparison.OrdinalIgnoreCase);

    public bool IsReadOnly(string name) => this[name] is { Origin: PropertyOrigin.Reserved or PropertyOrigin.Global };

    public void Set(PropertyEntry entry) => entries[entry.Name] = entry;
}
