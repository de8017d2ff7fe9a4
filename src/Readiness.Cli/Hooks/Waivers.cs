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
            .Select(id => $"READINESS_WAIVE names '{id}', which is not a check{(Core.Configuration.NameSuggestion.Nearest(id, knownIds) is { } near ? $"; did you mean '{near}'?" : " (readiness explain lists them)")}")
            .ToList();
    }
}
