using System.Text;

using Readiness.Core.Snapshots;

namespace Readiness.Testing;

/// <summary>A file tree held in memory, for check tests that need no git repository.</summary>
public sealed class InMemoryFileTree : IFileTree
{
    private readonly SortedDictionary<string, byte[]> files = new(StringComparer.Ordinal);

    public InMemoryFileTree(IEnumerable<KeyValuePair<string, string>>? files = null)
    {
        foreach (var (path, text) in files ?? [])
        {
            Add(path, text);
        }
    }

    public IReadOnlyList<string> Paths => files.Keys.ToArray();

    public InMemoryFileTree Add(string path, string text) => Add(path, Encoding.UTF8.GetBytes(text));

    public InMemoryFileTree Add(string path, byte[] bytes)
    {
        files[path] = bytes;
        return this;
    }

    public bool Exists(string path) => files.ContainsKey(path);

    public long? SizeOf(string path) => files.TryGetValue(path, out var b) ? b.LongLength : null;

    public byte[]? ReadBytes(string path, long maxBytes = FileLimits.DefaultMaxBytes)
    {
        if (!files.TryGetValue(path, out var bytes))
        {
            return null;
        }

        return bytes.LongLength > maxBytes ? throw new FileTooLargeException(path, bytes.LongLength, maxBytes) : bytes;
    }
}
