namespace Readiness.Core.Checks.License;

/// <summary>The line every license result carries.</summary>
internal static class LicenseNote
{
    public const string Text = "(These checks verify declarations and texts; they are not legal advice.)";

    public static string With(string message) => $"{message} {Text}";
}
