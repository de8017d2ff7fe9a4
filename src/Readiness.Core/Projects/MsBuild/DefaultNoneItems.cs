using System.Text.RegularExpressions;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// Whether a file is one of the SDK's default <c>None</c> items (Microsoft.NET.Sdk.DefaultItems.props/.targets):
/// every file under the project folder except bin/, obj/, hidden folders, project/solution/user files, sources of
/// the project's language and .resx files. Needed because <c>&lt;None Update="README.md" Pack="true" /&gt;</c> packs a
/// file only through that default item.
/// </summary>
internal static partial class DefaultNoneItems
{
    public static bool Includes(string file, string projectPath, PropertyTable properties)
    {
        if (!SdkModel.DefaultOn(properties.Value("EnableDefaultItems")) || !SdkModel.DefaultOn(properties.Value("EnableDefaultNoneItems")))
        {
            return false;
        }

        var folder = Snapshots.RepoPath.Directory(projectPath);
        string relative;
        if (folder.Length == 0)
        {
            relative = file;
        }
        else if (file.StartsWith(folder + "/", StringComparison.Ordinal))
        {
            relative = file[(folder.Length + 1)..];
        }
        else
        {
            return false;
        }

        var segments = relative.Split('/');
        if (segments[..^1].Any(s => s.StartsWith('.')))
        {
            return false;
        }

        if (UnderOutput(relative, properties.Value("BaseOutputPath"), "bin/") || UnderOutput(relative, properties.Value("BaseIntermediateOutputPath"), "obj/"))
        {
            return false;
        }

        var name = segments[^1];
        var language = Path.GetExtension(projectPath).ToUpperInvariant() switch
        {
            ".CSPROJ" => ".cs",
            ".VBPROJ" => ".vb",
            ".FSPROJ" => ".fs",
            _ => null,
        };
        return !(name.EndsWith(".user", StringComparison.Ordinal)
            || ProjectFile().IsMatch(name)
            || name.EndsWith(".sln", StringComparison.Ordinal)
            || name.EndsWith(".slnx", StringComparison.Ordinal)
            || name.EndsWith(".vssscc", StringComparison.Ordinal)
            || name == ".DS_Store"
            || name.EndsWith(".resx", StringComparison.Ordinal)
            || (language is not null && name.EndsWith(language, StringComparison.Ordinal)));
    }

    private static bool UnderOutput(string relative, string configured, string fallback)
    {
        var prefix = (configured.Length == 0 ? fallback : Escaping.Unescape(configured)).Replace('\\', '/');
        if (prefix.StartsWith("./", StringComparison.Ordinal))
        {
            prefix = prefix[2..];
        }

        if (prefix.Length == 0 || prefix.StartsWith('/') || prefix.StartsWith("..", StringComparison.Ordinal))
        {
            return false;
        }

        prefix = prefix.EndsWith('/') ? prefix : prefix + "/";
        return relative.StartsWith(prefix, StringComparison.Ordinal);
    }

    [GeneratedRegex(@"^.*\..*proj$", RegexOptions.CultureInvariant)]
    private static partial Regex ProjectFile();
}
