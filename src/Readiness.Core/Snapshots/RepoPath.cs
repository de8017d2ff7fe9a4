namespace Readiness.Core.Snapshots;

/// <summary>Helpers for repository-relative paths ('/' separated, no leading slash).</summary>
public static class RepoPath
{
    public static string Directory(string path)
    {
        var slash = path.LastIndexOf('/');
        return slash < 0 ? string.Empty : path[..slash];
    }

    public static string FileName(string path) => path[(path.LastIndexOf('/') + 1)..];

    public static string Combine(string folder, string relative)
    {
        var joined = folder.Length == 0 ? relative : folder + "/" + relative;
        return Normalize(joined);
    }

    /// <summary>Turns '\' into '/', resolves '.' and '..'; returns null when the path climbs above the root.</summary>
    public static string? TryNormalize(string path)
    {
        var parts = new List<string>();
        foreach (var part in path.Replace('\\', '/').Split('/'))
        {
            if (part.Length == 0 || part == ".")
            {
                continue;
            }

            if (part == "..")
            {
                if (parts.Count == 0)
                {
                    return null;
                }

                parts.RemoveAt(parts.Count - 1);
                continue;
            }

            parts.Add(part);
        }

        return string.Join('/', parts);
    }

    public static string Normalize(string path) => TryNormalize(path) ?? path.Replace('\\', '/');

    /// <summary>Folders from <paramref name="path"/>'s own folder up to the root (root last, as "").</summary>
    public static IEnumerable<string> FoldersUpward(string path)
    {
        var folder = Directory(path);
        while (true)
        {
            yield return folder;
            if (folder.Length == 0)
            {
                yield break;
            }

            folder = Directory(folder);
        }
    }
}
