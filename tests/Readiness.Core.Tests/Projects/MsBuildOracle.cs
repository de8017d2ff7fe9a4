using System.Text.Json;
using Readiness.Testing;

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
        var args = new List<string> { "msbuild", projectFullPath, "-nologo", "-nodeReuse:false" };
        args.AddRange(StandardProperties.Concat(extraProperties).Distinct(StringComparer.OrdinalIgnoreCase).Select(p => "-getProperty:" + p));
        args.AddRange(ItemTypes.Select(t => "-getItem:" + t));
        if (targetFramework is not null)
        {
            args.Add("-p:TargetFramework=" + targetFramework);
        }

        var result = DotnetCli.Run(Path.GetDirectoryName(projectFullPath)!, args, environment, cleanEnvironment: true, TimeSpan.FromMinutes(2));
        var output = result.StdOut;
        if (!result.Succeeded)
        {
            throw new InvalidOperationException($"dotnet msbuild failed ({result.ExitCode}):\n{output}\n{result.StdErr}");
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
}
