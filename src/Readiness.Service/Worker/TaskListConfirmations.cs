using System.Text.RegularExpressions;

namespace Readiness.Service.Worker;

/// <summary>
/// Manual items a person ticked in the pull request's description: task list items (GitHub Flavored Markdown spec,
/// "Task list items (extension)": <c>[x]</c> or <c>[X]</c> after the list marker) that name <c>(manual.ID)</c>,
/// as the Markdown report writes them (parentheses and dots may be backslash-escaped).
/// </summary>
public static partial class TaskListConfirmations
{
    public const int MaxBodyChars = 256 * 1024;

    /// <summary>The ids (without the <c>manual.</c> prefix) of ticked items, in order, without repeats.</summary>
    public static IReadOnlyList<string> Parse(string? body)
    {
        if (string.IsNullOrEmpty(body))
        {
            return [];
        }

        var text = body.Length > MaxBodyChars ? body[..MaxBodyChars] : body;
        var ids = new List<string>();
        foreach (var line in text.ReplaceLineEndings("\n").Split('\n'))
        {
            var item = TickedItem().Match(line);
            if (!item.Success)
            {
                continue;
            }

            foreach (Match m in ManualId().Matches(item.Groups["rest"].Value))
            {
                var id = m.Groups["id"].Value.Replace("\\", string.Empty, StringComparison.Ordinal);
                if (id.Length > 0 && !ids.Contains(id, StringComparer.Ordinal))
                {
                    ids.Add(id);
                }
            }
        }

        return ids;
    }

    // Up to three spaces of indentation per level are allowed; nested items are indented further.
    [GeneratedRegex(@"^\s{0,12}(?:[-+*]|[0-9]{1,9}[.)])[ \t]+\[[xX]\][ \t]+(?<rest>.*)$", RegexOptions.CultureInvariant)]
    private static partial Regex TickedItem();

    [GeneratedRegex(@"\\?\(manual\\?\.(?<id>(?:\\?[A-Za-z0-9_.-]){1,100})\\?\)", RegexOptions.CultureInvariant)]
    private static partial Regex ManualId();
}
