namespace Readiness.Core.Configuration;

/// <summary>Typed reads of configuration nodes, with errors that name file, line and column.</summary>
public static class ConfigNodeExtensions
{
    public static ConfigMap AsMap(this ConfigNode node, string what) =>
        node as ConfigMap ?? throw new ConfigurationException(node.Mark, $"{what} must be a mapping");

    public static string AsString(this ConfigNode node, string what) =>
        node is ConfigScalar s ? s.Value : throw new ConfigurationException(node.Mark, $"{what} must be a single value");

    /// <summary>A list of values; a single value counts as a list of one.</summary>
    public static IReadOnlyList<string> AsStrings(this ConfigNode node, string what) => node switch
    {
        ConfigScalar s => s.Value.Length == 0 ? [] : [s.Value],
        ConfigList l => l.Items.Select(i => i.AsString($"each item of {what}")).ToArray(),
        _ => throw new ConfigurationException(node.Mark, $"{what} must be a value or a list of values"),
    };

    public static bool AsBool(this ConfigNode node, string what) => node.AsString(what).ToLowerInvariant() switch
    {
        "true" or "yes" or "on" => true,
        "false" or "no" or "off" => false,
        _ => throw new ConfigurationException(node.Mark, $"{what} must be true or false"),
    };

    /// <summary>Throws for the first key not in <paramref name="allowed"/>.</summary>
    public static void RejectUnknownKeys(this ConfigMap map, IReadOnlyCollection<string> allowed, string where)
    {
        foreach (var entry in map.Entries)
        {
            if (!allowed.Contains(entry.Key))
            {
                throw new ConfigurationException(
                    entry.KeyMark,
                    $"unknown key '{ConfigQuote.Of(entry.Key)}' in {where} (known: {string.Join(", ", allowed)})");
            }
        }
    }
}
