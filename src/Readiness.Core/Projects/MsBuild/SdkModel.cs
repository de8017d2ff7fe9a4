namespace Readiness.Core.Projects.MsBuild;

/// <summary>The MSBuild SDKs whose evaluation order is modelled (the .NET SDK family, which all import Microsoft.NET.Sdk).</summary>
internal static class SdkModel
{
    private static readonly HashSet<string> DotNet = new(StringComparer.OrdinalIgnoreCase)
    {
        "Microsoft.NET.Sdk",
        "Microsoft.NET.Sdk.Web",
        "Microsoft.NET.Sdk.Razor",
        "Microsoft.NET.Sdk.BlazorWebAssembly",
        "Microsoft.NET.Sdk.WindowsDesktop",
    };

    /// <summary>The SDK name without a <c>/version</c> suffix.</summary>
    public static string Name(string reference)
    {
        var slash = reference.IndexOf('/', StringComparison.Ordinal);
        return (slash < 0 ? reference : reference[..slash]).Trim();
    }

    public static bool IsDotNet(string name) => DotNet.Contains(name);

    /// <summary>MSBuild's boolean "true" strings, as a condition <c>'$(X)' == 'true'</c> compares them.</summary>
    public static bool IsTrue(string value) =>
        value.ToUpperInvariant() is "TRUE" or "ON" or "YES" or "!FALSE" or "!OFF" or "!NO";

    /// <summary>A switch the SDK turns on when it is empty (<c>'$(X)' == ''</c> → true), then tests for 'true'.</summary>
    public static bool DefaultOn(string value) => value.Length == 0 || IsTrue(value);
}
