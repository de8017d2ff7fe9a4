namespace Readiness.Cli.Hooks;

/// <summary>Checks waived for one push: <c>READINESS_WAIVE="check.id: reason; other.id: reason"</c>. A reason is required.</summary>
public sealed record Waivers(IReadOnlyDictionary<string, string> Reasons)
{
    public static Waivers None { get; } = new(new Dictionary<string, string>());

    public static (Waivers Waivers, IReadOnlyList<string> Errors) Parse(string? text)
    {
        var reasons = new Dictionary<string, string>(StringComparer.Ordinal);
        var errors = new List<string>();
        foreach (var part in (text ?? string.Empty).Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            var colon = part.IndexOf(':', StringComparison.Ordinal);
            var id = colon < 0 ? part : part[..colon].Trim();
            var reason = colon < 0 ? string.Empty : part[(colon + 1)..].Trim();
            if (id.Length == 0 || reason.Length == 0)
            {
                errors.Add($"READINESS_WAIVE entry '{part}' needs the form 'check.id: reason'");
                continue;
            }

            reasons[id] = reason;
        }

        return (new Waivers(reasons), errors);
    }

    public bool Covers(string checkId) => Reasons.ContainsKey(checkId);

    /// <summary>One error per waived id that names no check (a typo would otherwise be ignored silently).</summary>
    public IReadOnlyList<string> Unknown(IReadOnlySet<string> knownIds)
    {
        ArgumentNullException.ThrowIfNull(knownIds);
        return Reasons.Keys
            .Where(id => !knownIds.Contains(id))
            .Select(id => $"READINESS_WAIVE names '{id}', which is not a check{(Nearest(id, knownIds) is { } near ? $"; did you mean '{near}'?" : " (readiness explain lists them)")}")
            .ToList();
    }

    /// <summary>The known id at the smallest edit distance, when it is close enough to be a typo (at most 3 edits).</summary>
    private static string? Nearest(string id, IEnumerable<string> knownIds) =>
        knownIds.Select(k => (Id: k, Distance: EditDistance(id, k))).Where(p => p.Distance <= 3).OrderBy(p => p.Distance).ThenBy(p => p.Id, StringComparer.Ordinal).Select(p => p.Id).FirstOrDefault();

    /// <summary>Levenshtein distance (insertions, deletions, substitutions).</summary>
    private static int EditDistance(string a, string b)
    {
        var previous = Enumerable.Range(0, b.Length + 1).ToArray();
        for (var i = 1; i <= a.Length; i++)
        {
            var current = new int[b.Length + 1];
            current[0] = i;
            for (var j = 1; j <= b.Length; j++)
            {
                current[j] = Math.Min(Math.Min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1));
            }

            previous = current;
        }

        return previous[b.Length];
    }
}
