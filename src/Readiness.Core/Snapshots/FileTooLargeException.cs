namespace Readiness.Core.Snapshots;

/// <summary>A file is larger than the bound the caller set; its content was not read.</summary>
public sealed class FileTooLargeException(string path, long size, long limit)
    : Exception($"{path} is {size:N0} bytes, above the {limit:N0}-byte limit for this kind of file; it was not read.")
{
    public string Path { get; } = path;

    public long Size { get; } = size;

    public long Limit { get; } = limit;
}
