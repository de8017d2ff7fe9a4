using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using System.Text.Json.Serialization;

using Readiness.Core.Registry;

namespace Readiness.Registries;

/// <summary>
/// Keeps a registry's answers on disk for a short time, one small JSON file per source and id (file name: SHA-256 of
/// both), so a second run within the time to live asks no feed. Only complete answers are kept; a problem is always
/// asked again. A cache that cannot be read or written is ignored: the feed is asked instead.
/// </summary>
public sealed partial class DiskCachedRegistry : IPackageRegistry, IDisposable
{
    private const long MaxEntryBytes = 4L * 1024 * 1024;

    private readonly IPackageRegistry inner;
    private readonly string folder;
    private readonly TimeSpan timeToLive;
    private readonly TimeProvider time;

    public DiskCachedRegistry(IPackageRegistry inner, string folder, TimeSpan timeToLive, TimeProvider time)
    {
        ArgumentNullException.ThrowIfNull(inner);
        ArgumentNullException.ThrowIfNull(folder);
        ArgumentNullException.ThrowIfNull(time);
        this.inner = inner;
        this.folder = Path.GetFullPath(folder);
        this.timeToLive = timeToLive;
        this.time = time;
    }

    public string Source => inner.Source;

    public async Task<PackageLookup> LookupAsync(string packageId, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(packageId);
        var path = Path.Combine(folder, Key(inner.Source, packageId) + ".json");
        if (await ReadAsync(path, packageId, cancellationToken).ConfigureAwait(false) is { } cached)
        {
            return cached;
        }

        var lookup = await inner.LookupAsync(packageId, cancellationToken).ConfigureAwait(false);
        if (lookup.Available)
        {
            await WriteAsync(path, lookup, cancellationToken).ConfigureAwait(false);
        }

        return lookup;
    }

    public void Dispose() => (inner as IDisposable)?.Dispose();

    /// <summary>The cache file name for a source and id: lowercase hex SHA-256 of both (ids are case-insensitive).</summary>
    public static string Key(string source, string packageId)
    {
        ArgumentNullException.ThrowIfNull(source);
        ArgumentNullException.ThrowIfNull(packageId);
        var bytes = SHA256.HashData(Encoding.UTF8.GetBytes(source + "\n" + packageId.ToLowerInvariant()));
        return Convert.ToHexStringLower(bytes);
    }

    private async Task<PackageLookup?> ReadAsync(string path, string packageId, CancellationToken cancellationToken)
    {
        try
        {
            var info = new FileInfo(path);
            if (!info.Exists || info.Length > MaxEntryBytes)
            {
                return null;
            }

            await using var stream = File.OpenRead(path);
            var entry = await JsonSerializer.DeserializeAsync(stream, CacheJson.Default.Entry, cancellationToken).ConfigureAwait(false);
            var age = time.GetUtcNow() - entry?.StoredAt;
            if (entry is null || age is null || age < TimeSpan.Zero || age >= timeToLive
                || entry.Source != inner.Source || !string.Equals(entry.Id, packageId, StringComparison.OrdinalIgnoreCase)
                || entry.Versions is null)
            {
                return null;
            }

            return new PackageLookup(
                packageId,
                entry.Exists,
                entry.RegistryId,
                entry.Versions.Select(v => new PublishedVersion(v.Version, v.Listed, v.Deprecated)).ToArray(),
                Owners: entry.Owners);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or JsonException or NotSupportedException)
        {
            return null;
        }
    }

    private async Task WriteAsync(string path, PackageLookup lookup, CancellationToken cancellationToken)
    {
        var entry = new Entry(
            inner.Source,
            lookup.Id,
            time.GetUtcNow(),
            lookup.Exists,
            lookup.RegistryId,
            lookup.Versions.Select(v => new EntryVersion(v.Version, v.Listed, v.Deprecated)).ToArray(),
            lookup.Owners);
        var temporary = $"{path}.{Guid.NewGuid():N}.tmp";
        try
        {
            CreateFolder();
            await using (var stream = new FileStream(temporary, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                await JsonSerializer.SerializeAsync(stream, entry, CacheJson.Default.Entry, cancellationToken).ConfigureAwait(false);
            }

            File.Move(temporary, path, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or OperationCanceledException)
        {
            TryDelete(temporary);
        }
    }

    private void CreateFolder()
    {
        if (OperatingSystem.IsWindows())
        {
            Directory.CreateDirectory(folder);
        }
        else
        {
            // Answers from private feeds stay readable by the user only.
            Directory.CreateDirectory(folder, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        }
    }

    private static void TryDelete(string path)
    {
        try
        {
            File.Delete(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Left behind: a later write of the same entry does not depend on it.
        }
    }

    private sealed record Entry(
        string Source,
        string Id,
        DateTimeOffset StoredAt,
        bool Exists,
        string? RegistryId,
        IReadOnlyList<EntryVersion>? Versions,
        IReadOnlyList<string>? Owners);

    private sealed record EntryVersion(string Version, bool? Listed, bool? Deprecated);

    /// <summary>Source-generated serialization of the cache entries (no reflection: the program is trimmed).</summary>
    [JsonSerializable(typeof(Entry))]
    private sealed partial class CacheJson : JsonSerializerContext;
}
