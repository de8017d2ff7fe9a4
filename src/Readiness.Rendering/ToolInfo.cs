using System.Reflection;

namespace Readiness.Rendering;

/// <summary>The program's name and version as machine formats record them (SARIF <c>tool.driver</c>, JUnit).</summary>
/// <param name="Name">The tool's name.</param>
/// <param name="Version">Its version, SemVer 2.0.0 (build metadata allowed).</param>
public sealed record ToolInfo(string Name, string Version)
{
    public const string ToolName = "Readiness";

    /// <summary>The version this build carries (the informational version, e.g. <c>0.1.0+commit</c>).</summary>
    public static ToolInfo Current()
    {
        var assembly = typeof(ToolInfo).Assembly;
        var version = assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion
            ?? assembly.GetName().Version?.ToString(3)
            ?? "0.0.0";
        return new ToolInfo(ToolName, version);
    }

    /// <summary>The version without build metadata: <c>major.minor.patch[-pre]</c>.</summary>
    public string ShortVersion => Version.Split('+')[0];
}
