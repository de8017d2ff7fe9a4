using System.Text.RegularExpressions;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>What <c>Exists()</c>, wildcard imports and default items see: the files of the tree and their folders.</summary>
internal sealed class FileSet
{
    private readonly IFileTree tree;
    private readonly HashSet<string> folders = new(StringComparer.Ordinal) { string.Empty };

    public FileSet(IFileTree tree)
    {
        this.tree = tree;
        foreach (var path in tree.Paths)
        {
            var folder = RepoPath.Directory(path);
            while (folder.Length > 0 && folders.Add(folder))
            {
                folder = RepoPath.Directory(folder);
            }
        }
    }

    public IReadOnlyList<string> Paths => tree.Paths;

    public bool FileExists(string path) => tree.Exists(path);

    /// <summary>A file or a folder, as MSBuild's <c>Exists()</c> answers.</summary>
    public bool Exists(string path) => folders.Contains(path) || tree.Exists(path);

    /// <summary>Files matching an MSBuild wildcard (<c>*</c>, <c>?</c>, <c>**</c>) given repository-relative.</summary>
    public IEnumerable<string> Match(string pattern)
    {
        var regex = WildcardRegex(pattern);
        var fixedPrefix = pattern[..FirstWildcardFolderEnd(pattern)];
        return tree.Paths.Where(p => p.StartsWith(fixedPrefix, StringComparison.Ordinal) && regex.IsMatch(p));
    }

    public static Regex WildcardRegex(string pattern)
    {
        var sb = new System.Text.StringBuilder("^");
        for (var i = 0; i < pattern.Length; i++)
        {
            var c = pattern[i];
            if (c == '*' && i + 1 < pattern.Length && pattern[i + 1] == '*')
            {
                // "**/" matches any number of folders, including none.
                if (i + 2 < pattern.Length && pattern[i + 2] == '/')
                {
                    sb.Append("(?:.*/)?");
                    i += 2;
                }
                else
                {
                    sb.Append(".*");
                    i++;
                }
            }
            else if (c == '*')
            {
                sb.Append("[^/]*");
            }
            else if (c == '?')
            {
                sb.Append("[^/]");
            }
            else
            {
                sb.Append(Regex.Escape(c.ToString()));
            }
        }

        return new Regex(sb.Append('$').ToString(), RegexOptions.CultureInvariant, TimeSpan.FromSeconds(1));
    }

    private static int FirstWildcardFolderEnd(string pattern)
    {
        var star = pattern.IndexOfAny(['*', '?']);
        if (star < 0)
        {
            return pattern.Length;
        }

        var slash = pattern.LastIndexOf('/', star);
        return slash < 0 ? 0 : slash + 1;
    }
}
