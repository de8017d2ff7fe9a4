using System.Globalization;
using System.Text;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>MSBuild's <c>%XX</c> escapes (<c>%3B</c> is ';', <c>%24</c> is '$'): kept while evaluating, removed on output.</summary>
internal static class Escaping
{
    public static string Unescape(string value)
    {
        if (value.IndexOf('%', StringComparison.Ordinal) < 0)
        {
            return value;
        }

        var sb = new StringBuilder(value.Length);
        for (var i = 0; i < value.Length; i++)
        {
            if (value[i] == '%' && i + 2 < value.Length && IsHex(value[i + 1]) && IsHex(value[i + 2]))
            {
                sb.Append((char)int.Parse(value.AsSpan(i + 1, 2), NumberStyles.HexNumber, CultureInfo.InvariantCulture));
                i += 2;
            }
            else
            {
                sb.Append(value[i]);
            }
        }

        return sb.ToString();
    }

    /// <summary>Splits an item list on ';' (escaped semicolons stay), trimming each entry and dropping empty ones.</summary>
    public static IEnumerable<string> SplitList(string value) =>
        value.Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);

    private static bool IsHex(char c) => char.IsAsciiHexDigit(c);
}
