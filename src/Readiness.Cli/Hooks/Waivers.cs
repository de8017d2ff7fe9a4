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
}
