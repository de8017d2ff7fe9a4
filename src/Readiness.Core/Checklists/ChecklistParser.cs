using Readiness.Core.Configuration;
using Readiness.Core.Reports;

namespace Readiness.Core.Checklists;

/// <summary>Parses checklist files and the <c>checks:</c> overrides they share with the repository configuration.</summary>
public sealed class ChecklistParser(IReadOnlySet<string> knownCheckIds)
{
    private static readonly string[] TopKeys = ["name", "description", "extends", "checks", "manual"];
    private static readonly string[] CheckKeys = ["severity", "settings"];
    private static readonly string[] ManualKeys = ["id", "text", "severity"];

    public ChecklistDefinition Parse(string file, string text)
    {
        var root = YamlReader.Read(file, text).AsMap("a checklist");
        root.RejectUnknownKeys(TopKeys, "a checklist");
        var name = root.Find("name")?.Value.AsString("name")
            ?? throw new ConfigurationException(root.Mark, "a checklist needs a 'name'");
        var extends = root.Find("extends");
        return new ChecklistDefinition(
            name,
            root.Find("description")?.Value.AsString("description"),
            extends?.Value.AsString("extends"),
            extends?.Value.Mark,
            root.Find("checks") is { } checks ? ParseChecks(checks.Value) : [],
            root.Find("manual") is { } manual ? ParseManual(manual.Value) : [],
            file);
    }

    /// <summary>Parses a <c>checks:</c> mapping of check id to settings.</summary>
    public IReadOnlyList<KeyValuePair<string, CheckSettings>> ParseChecks(ConfigNode node)
    {
        var result = new List<KeyValuePair<string, CheckSettings>>();
        foreach (var entry in node.AsMap("checks").Entries)
        {
            if (!knownCheckIds.Contains(entry.Key))
            {
                throw new ConfigurationException(entry.KeyMark, $"unknown check id '{ConfigQuote.Of(entry.Key)}'{NameSuggestion.Hint(entry.Key, knownCheckIds)} (see 'readiness explain' or checklists/README.md)");
            }

            result.Add(new(entry.Key, ParseSettings(entry.Key, entry.Value)));
        }

        return result;
    }

    private static CheckSettings ParseSettings(string id, ConfigNode node)
    {
        if (node is ConfigScalar { Value: "" })
        {
            return new CheckSettings(null, false, new Dictionary<string, ConfigNode>(), node.Mark);
        }

        var map = node.AsMap($"the settings of {id}");
        if (map.Find("with") is { } old)
        {
            throw new ConfigurationException(old.KeyMark, $"the settings of {id} go under 'settings:' (the key 'with:' was renamed)");
        }

        map.RejectUnknownKeys(CheckKeys, $"the settings of {id}");
        Severity? severity = null;
        var off = false;
        if (map.Find("severity") is { } s)
        {
            var text = s.Value.AsString("severity");
            if (text == "off")
            {
                off = true;
            }
            else if (StatusNames.TryParseSeverity(text, out var parsed))
            {
                severity = parsed;
            }
            else
            {
                throw new ConfigurationException(s.Value.Mark, $"severity must be block, warn, info or off, not '{ConfigQuote.Of(text)}'");
            }
        }

        var with = new Dictionary<string, ConfigNode>(StringComparer.Ordinal);
        if (map.Find("settings") is { } w)
        {
            foreach (var p in w.Value.AsMap("settings").Entries)
            {
                with[p.Key] = p.Value;
            }
        }

        return new CheckSettings(severity, off, with, node.Mark);
    }

    private static IReadOnlyList<ManualItem> ParseManual(ConfigNode node)
    {
        if (node is not ConfigList list)
        {
            throw new ConfigurationException(node.Mark, "manual must be a list of items");
        }

        var items = new List<ManualItem>();
        foreach (var itemNode in list.Items)
        {
            var map = itemNode.AsMap("a manual item");
            map.RejectUnknownKeys(ManualKeys, "a manual item");
            var id = map.Find("id")?.Value.AsString("id") ?? throw new ConfigurationException(map.Mark, "a manual item needs an 'id'");
            var text = map.Find("text")?.Value.AsString("text") ?? throw new ConfigurationException(map.Mark, "a manual item needs a 'text'");
            var severity = Severity.Block;
            if (map.Find("severity") is { } s && !StatusNames.TryParseSeverity(s.Value.AsString("severity"), out severity))
            {
                throw new ConfigurationException(s.Value.Mark, "severity must be block, warn or info");
            }

            if (items.Any(i => i.Id == id))
            {
                throw new ConfigurationException(map.Mark, $"duplicate manual item id '{ConfigQuote.Of(id)}'");
            }

            items.Add(new ManualItem(id, text, severity));
        }

        return items;
    }
}
