using System.Text.RegularExpressions;

namespace Readiness.Core.Secrets;

/// <summary>
/// One recognisable shape of credential. Every match contains one of <paramref name="Prefixes"/> (a cheap
/// pre-filter, so the pattern runs only on files that could match); <paramref name="Pattern"/> finds it; the group named <c>body</c>, when present, is the random part
/// that must look random (so documentation placeholders such as <c>xxxx…</c> do not match).
/// </summary>
/// <param name="Id">Stable id, e.g. <c>github-token</c>.</param>
/// <param name="Name">What it is, for the report.</param>
/// <param name="Source">Where the shape is published, or "common practice, no published source".</param>
public sealed record SecretShape(string Id, string Name, IReadOnlyList<string> Prefixes, Regex Pattern, string Source)
{
    /// <summary>True when the random part of a match is not a placeholder: varied characters, no EXAMPLE/xxxx filler.</summary>
    public static bool LooksRandom(string body)
    {
        ArgumentNullException.ThrowIfNull(body);
        if (body.Contains("EXAMPLE", StringComparison.OrdinalIgnoreCase)
            || body.Contains("xxxx", StringComparison.OrdinalIgnoreCase)
            || body.Contains("0000000", StringComparison.Ordinal))
        {
            return false;
        }

        var distinct = body.Distinct().Count();
        return distinct >= Math.Min(10, (body.Length + 1) / 2);
    }
}
