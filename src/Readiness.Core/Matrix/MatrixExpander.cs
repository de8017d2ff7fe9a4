using Readiness.Core.Configuration;

namespace Readiness.Core.Matrix;

/// <summary>
/// Expands a workflow job's <c>strategy.matrix</c> into its combinations, as GitHub Actions documents it
/// (https://docs.github.com/actions/writing-workflows/choosing-what-your-workflow-does/running-variations-of-jobs-in-a-workflow):
/// the product of the named lists, minus combinations matching an <c>exclude</c> entry, then each <c>include</c>
/// entry added to every combination whose original values it does not overwrite, or appended as a new one.
/// </summary>
public static class MatrixExpander
{
    /// <summary>GitHub runs at most 256 jobs per workflow run; more combinations than that are refused.</summary>
    public const int MaxCombinations = 256;

    /// <summary>The combinations, or null with a reason when the matrix cannot be evaluated statically.</summary>
    public static (IReadOnlyList<IReadOnlyDictionary<string, ConfigNode>>? Combinations, string? Problem) Expand(ConfigNode? matrix)
    {
        if (matrix is null)
        {
            return ([new Dictionary<string, ConfigNode>(StringComparer.Ordinal)], null);
        }

        if (matrix is not ConfigMap map)
        {
            return (null, "the matrix is an expression, evaluated only when the workflow runs");
        }

        var axes = new List<(string Key, IReadOnlyList<ConfigNode> Values)>();
        foreach (var entry in map.Entries.Where(e => e.Key is not ("include" or "exclude")))
        {
            if (entry.Value is ConfigList list)
            {
                axes.Add((entry.Key, list.Items));
            }
            else
            {
                return (null, $"matrix.{entry.Key} is not a list (an expression, evaluated only when the workflow runs)");
            }
        }

        var combos = new List<Dictionary<string, ConfigNode>>();
        if (axes.Count > 0)
        {
            combos.Add(new Dictionary<string, ConfigNode>(StringComparer.Ordinal));
            foreach (var (key, values) in axes)
            {
                var next = new List<Dictionary<string, ConfigNode>>();
                foreach (var combo in combos)
                {
                    foreach (var value in values)
                    {
                        next.Add(new Dictionary<string, ConfigNode>(combo, StringComparer.Ordinal) { [key] = value });
                        if (next.Count > MaxCombinations)
                        {
                            return (null, $"the matrix has more than {MaxCombinations} combinations");
                        }
                    }
                }

                combos = next;
            }
        }

        if (map.Find("exclude")?.Value is { } exclude)
        {
            if (Entries(exclude) is not { } excludes)
            {
                return (null, "matrix.exclude is not a list of mappings");
            }

            combos.RemoveAll(c => excludes.Any(e => e.Entries.All(x => c.TryGetValue(x.Key, out var v) && Same(v, x.Value))));
        }

        if (map.Find("include")?.Value is { } include)
        {
            if (Entries(include) is not { } includes)
            {
                return (null, "matrix.include is not a list of mappings");
            }

            var original = axes.Select(a => a.Key).ToHashSet(StringComparer.Ordinal);
            var originalCount = combos.Count;
            foreach (var item in includes)
            {
                var matched = false;
                for (var i = 0; i < originalCount; i++)
                {
                    var combo = combos[i];
                    if (item.Entries.Where(x => original.Contains(x.Key)).All(x => Same(combo[x.Key], x.Value)))
                    {
                        matched = true;
                        foreach (var x in item.Entries.Where(x => !original.Contains(x.Key)))
                        {
                            combo[x.Key] = x.Value;
                        }
                    }
                }

                if (!matched)
                {
                    combos.Add(item.Entries.ToDictionary(x => x.Key, x => x.Value, StringComparer.Ordinal));
                    if (combos.Count > MaxCombinations)
                    {
                        return (null, $"the matrix has more than {MaxCombinations} combinations");
                    }
                }
            }
        }

        return (combos, null);
    }

    /// <summary>Scalars compare by text; anything else compares structurally.</summary>
    public static bool Same(ConfigNode a, ConfigNode b) => (a, b) switch
    {
        (ConfigScalar x, ConfigScalar y) => x.Value == y.Value,
        (ConfigList x, ConfigList y) => x.Items.Count == y.Items.Count && x.Items.Zip(y.Items).All(p => Same(p.First, p.Second)),
        (ConfigMap x, ConfigMap y) => x.Entries.Count == y.Entries.Count
            && x.Entries.All(e => y.Find(e.Key) is { } o && Same(e.Value, o.Value)),
        _ => false,
    };

    private static IReadOnlyList<ConfigMap>? Entries(ConfigNode node) =>
        node is ConfigList list && list.Items.All(i => i is ConfigMap) ? list.Items.Cast<ConfigMap>().ToArray() : null;
}
