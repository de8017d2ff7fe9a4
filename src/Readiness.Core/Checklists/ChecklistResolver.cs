using Readiness.Core.Configuration;
using Readiness.Core.Reports;

namespace Readiness.Core.Checklists;

/// <summary>Resolves a checklist's <c>extends</c> chain and applies the repository's overrides.</summary>
public sealed class ChecklistResolver(IChecklistSource source, ChecklistParser parser, IReadOnlyDictionary<string, Severity> defaultSeverities)
{
    public const int MaxExtendsDepth = 16;

    public ChecklistDefinition Load(string name, ConfigMark? requestedAt = null)
    {
        var found = source.Find(name)
            ?? throw new ConfigurationException(
                requestedAt ?? new ConfigMark("(command line)", 1, 1),
                $"no checklist named '{ConfigQuote.Of(name)}' (available: {string.Join(", ", source.Names)})");
        return parser.Parse(found.File, found.Text);
    }

    public ResolvedChecklist Resolve(ChecklistDefinition definition, RepositoryConfig? config = null)
    {
        ArgumentNullException.ThrowIfNull(definition);
        var chain = new List<ChecklistDefinition> { definition };
        var current = definition;
        while (current.Extends is { } parentName)
        {
            if (chain.Any(c => c.Name == parentName))
            {
                throw new ConfigurationException(
                    current.ExtendsMark!,
                    $"'extends' makes a cycle: {string.Join(" -> ", chain.Select(c => c.Name))} -> {parentName}");
            }

            if (chain.Count >= MaxExtendsDepth)
            {
                throw new ConfigurationException(current.ExtendsMark!, $"'extends' chain deeper than {MaxExtendsDepth}");
            }

            current = Load(parentName, current.ExtendsMark);
            chain.Add(current);
        }

        var order = new List<string>();
        var severities = new Dictionary<string, Severity>(StringComparer.Ordinal);
        var off = new HashSet<string>(StringComparer.Ordinal);
        var with = new Dictionary<string, Dictionary<string, ConfigNode>>(StringComparer.Ordinal);
        var manual = new List<ManualItem>();

        void Apply(IEnumerable<KeyValuePair<string, CheckSettings>> checks)
        {
            foreach (var (id, settings) in checks)
            {
                if (!order.Contains(id))
                {
                    order.Add(id);
                }

                if (settings.Off)
                {
                    off.Add(id);
                }
                else if (settings.Severity is { } s)
                {
                    off.Remove(id);
                    severities[id] = s;
                }
                else
                {
                    off.Remove(id);
                }

                if (!with.TryGetValue(id, out var parameters))
                {
                    with[id] = parameters = new Dictionary<string, ConfigNode>(StringComparer.Ordinal);
                }

                foreach (var (key, value) in settings.With)
                {
                    parameters[key] = value;
                }
            }
        }

        for (var i = chain.Count - 1; i >= 0; i--)
        {
            Apply(chain[i].Checks);
            foreach (var item in chain[i].Manual)
            {
                manual.RemoveAll(m => m.Id == item.Id);
                manual.Add(item);
            }
        }

        if (config is not null)
        {
            Apply(config.Checks);
        }

        var planned = order.Where(id => !off.Contains(id))
            .Select(id => new PlannedCheck(
                id,
                severities.TryGetValue(id, out var s) ? s : defaultSeverities.GetValueOrDefault(id, Severity.Warn),
                with[id]))
            .ToArray();
        var sources = chain.Select(c => c.Source).ToList();
        if (config?.Source is { } configSource && config.Checks.Count > 0)
        {
            sources.Insert(0, configSource);
        }

        return new ResolvedChecklist(definition.Name, definition.Description, planned, manual, sources);
    }
}
