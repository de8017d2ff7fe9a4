namespace Readiness.Rendering;

/// <summary>SGR escape sequences (ECMA-48 "Select Graphic Rendition"), applied only when colour is on.</summary>
internal sealed class AnsiStyle(bool enabled)
{
    public const string Reset = "\u001b[0m";
    public const string Bold = "\u001b[1m";
    public const string Dim = "\u001b[2m";
    public const string Red = "\u001b[31m";
    public const string Green = "\u001b[32m";
    public const string Yellow = "\u001b[33m";
    public const string Magenta = "\u001b[35m";
    public const string Cyan = "\u001b[36m";
    public const string BoldRed = "\u001b[1;31m";
    public const string BoldGreen = "\u001b[1;32m";

    public string Paint(string text, string style) =>
        enabled && text.Length > 0 ? style + text + Reset : text;
}
