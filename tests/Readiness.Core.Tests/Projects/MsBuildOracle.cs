using System.Diagnostics;
using System.Text.Json;

namespace Readiness.Core.Tests.Projects;

/// <summary>
/// Reference: MSBuild's own evaluation, <c>dotnet msbuild PROJ -getProperty:… -getItem:…</c> (no build, no restore,
/// no target runs). It prints JSON when several properties are asked. Runs with a minimal environment so that no
/// variable of the test machine turns into an MSBuild property.
/// </summary>
internal static class MsBuildOracle
{
    public static readonly string[] StandardProperties =
    [
        "Version", "PackageVersion", "TargetFrameworks", "TargetFramework", "PackageLicenseExpression", "IsPackable",
        "ManagePackageVersionsCentrally",
    ];

    public static readonly string[] ItemTypes = ["PackageReference", "PackageVersion", "ProjectReference", "None", "Content"];

    public static MsBuildResult Evaluate(
        string projectFullPath,
        string? targetFramework,
        IEnumerable<string> extraProperties,
        IReadOnlyDictionary<string, string>? environment = null)
    {
        var start = new ProcessStartInfo(DotnetHost())
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
            WorkingDirectory = Path.GetDirectoryName(projectFullPath)!,
        };
        start.ArgumentList.Add("msbuild");
        start.ArgumentList.Add(projectFullPath);
        start.ArgumentList.Add("-nologo");
        start.ArgumentList.Add("-nodeReuse:false");
        foreach (var property in StandardProperties.Concat(extraProperties).Distinct(StringComparer.OrdinalIgnoreCase))
        {
            start.ArgumentList.Add("-getProperty:" + property);
        }

        foreach (var type in ItemTypes)
        {
            start.ArgumentList.Add("-getItem:" + type);
        }

        if (targetFramework is not null)
        {
            start.ArgumentList.Add("-p:TargetFramework=" + targetFramework);
        }

        start.Environment.Clear();
        foreach (var name in new[] { "PATH", "HOME", "DOTNET_ROOT", "TMPDIR", "LANG", "SystemRoot", "USERPROFILE", "TEMP", "TMP" })
        {
            if (Environment.GetEnvironmentVariable(name) is { } value)
            {
                start.Environment[name] = value;
            }
        }

        start.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        start.Environment["DOTNET_NOLOGO"] = "1";
        start.Environment["DOTNET_SKIP_FIRST_TIME_EXPERIENCE"] = "1";
        start.Environment["MSBUILDDISABLENODEREUSE"] = "1";
        start.Environment["DOTNET_CLI_USE_MSBUILD_SERVER"] = "0";
        foreach (var (name, value) in environment ?? new Dictionary<string, string>())
        {
            start.Environment[name] = value;
        }

        using var process = Process.Start(start) ?? throw new InvalidOperationException("dotnet could not be started");
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(TimeSpan.FromMinutes(2)))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException("dotnet msbuild did not finish in 2 minutes");
        }

        var output = stdout.Result;
        if (process.ExitCode != 0)
        {
            throw new InvalidOperationException($"dotnet msbuild failed ({process.ExitCode}):\n{output}\n{stderr.Result}");
        }

        return Parse(output);
    }

    private static MsBuildResult Parse(string json)
    {
        using var document = JsonDocument.Parse(json);
        var properties = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        if (document.RootElement.TryGetProperty("Properties", out var props))
        {
            foreach (var p in props.EnumerateObject())
            {
                properties[p.Name] = p.Value.GetString() ?? string.Empty;
            }
        }

        var items = new Dictionary<string, IReadOnlyList<IReadOnlyDictionary<string, string>>>(StringComparer.OrdinalIgnoreCase);
        if (document.RootElement.TryGetProperty("Items", out var itemGroups))
        {
            foreach (var group in itemGroups.EnumerateObject())
            {
                items[group.Name] = group.Value.EnumerateArray()
                    .Select(i => (IReadOnlyDictionary<string, string>)i.EnumerateObject()
                        .ToDictionary(m => m.Name, m => m.Value.GetString() ?? string.Empty, StringComparer.OrdinalIgnoreCase))
                    .ToList();
            }
        }

        return new MsBuildResult(properties, items, json);
    }

    private static string DotnetHost() =>
        Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } host && File.Exists(host) ? host : "dotnet";
}
