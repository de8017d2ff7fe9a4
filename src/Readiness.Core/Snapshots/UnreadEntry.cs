namespace Readiness.Core.Snapshots;

/// <summary>An entry of a tree that is not read as a file (a symbolic link, a submodule, a folder nested too deep), and why.</summary>
/// <param name="Path">Repository-relative path, '/' separators.</param>
/// <param name="Reason">Why it was not read, as a phrase ("is a symbolic link to ../x; links are not followed").</param>
public sealed record UnreadEntry(string Path, string Reason)
{
    public override string ToString() => $"{Path} {Reason}";
}
