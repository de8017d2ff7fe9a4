namespace Readiness.Core.Configuration;

/// <summary>"Did you mean …?": the known name closest to a mistyped one, when it is close enough to be a typo.</summary>
public static class NameSuggestion
{
    /// <summary>Most edits a typo is allowed (common practice, no published source).</summary>
    public const int MaxEdits = 3;

    /// <summary>The known name at the smallest edit distance (at most <see cref="MaxEdits"/>), ordinal on ties.</summary>
    public static string? Nearest(string name, IEnumerable<string> known)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(known);
        return known
            .Where(k => Math.Abs(k.Length - name.Length) <= MaxEdits)
            .Select(k => (Name: k, Distance: EditDistance(name, k)))
            .Where(p => p.Distance <= MaxEdits)
            .OrderBy(p => p.Distance).ThenBy(p => p.Name, StringComparer.Ordinal)
            .Select(p => p.Name)
            .FirstOrDefault();
    }

    /// <summary>"; did you mean 'x'?" or the empty string.</summary>
    public static string Hint(string name, IEnumerable<string> known) =>
        Nearest(name, known) is { } near ? $"; did you mean '{near}'?" : string.Empty;

    /// <summary>Levenshtein distance (insertions, deletions, substitutions), case-sensitive.</summary>
    public static int EditDistance(string a, string b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        var previous = Enumerable.Range(0, b.Length + 1).ToArray();
        var current = new int[b.Length + 1];
        for (var i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (var j = 1; j <= b.Length; j++)
            {
                current[j] = Math.Min(Math.Min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1));
            }

            (previous, current) = (current, previous);
        }

        return previous[b.Length];
    }
}
