namespace Readiness.Core.Snapshots;

/// <summary>Bounds on what is read from an untrusted repository.</summary>
public static class FileLimits
{
    /// <summary>Project files, changelogs, licenses, configuration: 4 MiB is far beyond any real one.</summary>
    public const long DefaultMaxBytes = 4L * 1024 * 1024;

    /// <summary>Files scanned for secrets larger than this are skipped with a note.</summary>
    public const long ScanMaxBytes = 2L * 1024 * 1024;

    /// <summary>Most files listed in one tree before the reader refuses the repository.</summary>
    public const int MaxPaths = 200_000;
}
