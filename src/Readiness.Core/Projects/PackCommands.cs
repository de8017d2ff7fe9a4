using System.Text.RegularExpressions;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects;

/// <summary>
/// What the repository's CI and build scripts say about packing, read as text (nothing is run): which projects a
/// pack command names, whether one packs a whole solution, and where a version is passed on the command line.
/// </summary>
/// <param name="Named">Project files or folders named by a pack command (or listed in a script that packs), with where.</param>
/// <param name="PacksAll">Where a pack command packs a solution or the current folder (every packable project).</param>
/// <param name="VersionArguments">Where a build or pack command sets Version or PackageVersion (-p:Version=...).</param>
public sealed partial record PackCommands(
    IReadOnlyList<(string Target, SourceLocation Location)> Named,
    IReadOnlyList<SourceLocation> PacksAll,
    IReadOnlyList<SourceLocation> VersionArguments)
{
    private const long MaxScriptBytes = 512 * 1024;
    private const int MaxScripts = 64;
    private const int LiteralWindow = 20;

    private static readonly string[] ScriptExtensions = [".yml", ".yaml", ".ps1", ".psm1", ".sh", ".cmd", ".bat", ".cake", ".cs", ".proj", ".targets"];
    private static readonly string[] ScriptFolders = ["", "build", "eng", "scripts", "tools", ".github/workflows", ".azure-pipelines", ".pipelines"];
    private static readonly string[] ProjectSuffixes = [".csproj", ".fsproj", ".vbproj"];

    /// <summary>Reads the CI files and build scripts at the root and in the usual folders (bounded in number and size).</summary>
    public static PackCommands Read(IFileTree files)
    {
        ArgumentNullException.ThrowIfNull(files);
        var named = new List<(string, SourceLocation)>();
        var all = new List<SourceLocation>();
        var versions = new List<SourceLocation>();
        var scripts = files.Paths
            .Where(p => ScriptFolders.Contains(RepoPath.Directory(p), StringComparer.OrdinalIgnoreCase)
                && ScriptExtensions.Any(e => p.EndsWith(e, StringComparison.OrdinalIgnoreCase))
                && !StaticProjectReaderIsProject(p))
            .Take(MaxScripts);
        foreach (var path in scripts)
        {
            string? text;
            try
            {
                text = files.ReadText(path, MaxScriptBytes);
            }
            catch (FileTooLargeException)
            {
                continue;
            }

            if (text is null)
            {
                continue;
            }

            var lines = text.Split('\n');
            var literals = new List<(string Target, SourceLocation At)>();
            for (var i = 0; i < lines.Length; i++)
            {
                var line = lines[i];
                var at = new SourceLocation(path, i + 1);
                if (VersionArgument().IsMatch(line))
                {
                    versions.Add(at);
                }

                foreach (Match literal in ProjectLiteral().Matches(line))
                {
                    literals.Add((literal.Groups["p"].Value, at));
                }

                var pack = PackCall().Match(line);
                if (!pack.Success)
                {
                    continue;
                }

                var target = pack.Groups["target"].Value.Trim('"', '\'', '(', ')', ',');
                if (target.Length == 0 || target[0] == '-' || target.EndsWith(".sln", StringComparison.OrdinalIgnoreCase)
                    || target.EndsWith(".slnx", StringComparison.OrdinalIgnoreCase) || target is "." or "./")
                {
                    all.Add(at);
                }
                else if (!target.Contains('$', StringComparison.Ordinal) && !target.Contains('{', StringComparison.Ordinal)
                    && !target.Contains('%', StringComparison.Ordinal) && char.IsLetterOrDigit(target.TrimStart('.', '/', '\\')[0])
                    && target.IndexOfAny(['/', '\\', '.']) >= 0)
                {
                    named.Add((Normalise(target), at));
                }
                else
                {
                    // A pack through a variable: the project files named just above it are what it packs.
                    named.AddRange(literals.Where(l => l.At.Line >= i + 1 - LiteralWindow).Select(l => (Normalise(l.Target), l.At)));
                }
            }
        }

        return new PackCommands(named, all, versions);
    }

    /// <summary>The pack command that names <paramref name="project"/>, or null.</summary>
    public SourceLocation? Naming(ProjectInfo project)
    {
        ArgumentNullException.ThrowIfNull(project);
        foreach (var (target, location) in Named)
        {
            var isFile = ProjectSuffixes.Any(s => target.EndsWith(s, StringComparison.OrdinalIgnoreCase));
            var matches = isFile
                ? string.Equals(RepoPath.FileName(target), RepoPath.FileName(project.Path), StringComparison.OrdinalIgnoreCase)
                    && (target.Contains('/', StringComparison.Ordinal) ? project.Path.EndsWith(target, StringComparison.OrdinalIgnoreCase) : true)
                : project.Folder.Equals(target, StringComparison.OrdinalIgnoreCase)
                    || project.Folder.EndsWith("/" + target, StringComparison.OrdinalIgnoreCase);
            if (matches)
            {
                return location;
            }
        }

        return null;
    }

    private static bool StaticProjectReaderIsProject(string path) => ProjectSuffixes.Any(s => path.EndsWith(s, StringComparison.OrdinalIgnoreCase));

    private static string Normalise(string target)
    {
        var t = target.Replace('\\', '/');
        while (t.StartsWith("./", StringComparison.Ordinal))
        {
            t = t[2..];
        }

        return t.TrimEnd('/');
    }

    [GeneratedRegex(@"(?:\bdotnet\s+pack\b|\bDotNet(?:Core)?Pack\s*\(|\bnuget(?:\.exe)?\s+pack\b)\s*(?<target>[^\s;|&]*)", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant, 1000)]
    private static partial Regex PackCall();

    [GeneratedRegex(@"[""'](?<p>[^""'\s$]*\.(?:cs|fs|vb)proj)[""']", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant, 1000)]
    private static partial Regex ProjectLiteral();

    [GeneratedRegex(@"[-/](?:p|property):(?:Package)?Version=", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant, 1000)]
    private static partial Regex VersionArgument();
}
