using System.Text;

namespace Readiness.Rendering;

/// <summary>Greedy word wrapping for terminal text: words never split, so a long path or URL keeps its own line.</summary>
internal static class TextWrap
{
    /// <summary>Wraps <paramref name="text"/> (already one logical line) to <paramref name="width"/> columns.</summary>
    public static IEnumerable<string> Wrap(string text, int width, string firstPrefix, string indent)
    {
        var words = text.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var line = new StringBuilder(firstPrefix);
        var lineHasWord = false;
        foreach (var word in words)
        {
            if (lineHasWord && line.Length + 1 + word.Length > width)
            {
                yield return line.ToString();
                line.Clear().Append(indent);
                lineHasWord = false;
            }

            if (lineHasWord)
            {
                line.Append(' ');
            }

            line.Append(word);
            lineHasWord = true;
        }

        var last = line.ToString().TrimEnd();
        if (last.Length > 0)
        {
            yield return last;
        }
    }
}
