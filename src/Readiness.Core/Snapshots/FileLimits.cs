namespace Readiness.Core.Snapshots;

/// <summary>Bounds on what is read from an untrusted repository.</summary>
public static class FileLimits
{
    /// <summary>Project files, changelogs, licenses, configuration: 4 MiB is far beyond any real one.</summary>
    public const long DefaultMaxBytes = 4L * 1024 * 1024;

    /// <summary>Files scanned for secrets are read whole (one at a time) up to this size; beyond it the secrets check cannot pass.</summary>
    public const long ScanMaxBytes = 64L * 1024 * 1024;

    /// <summary>Folders nested deeper than this are not listed (a note names the first one); real trees stay under 30.</summary>
    public const int MaxFolderDepth = 256;

    /// <summary>Most files listed in one tree before the reader refuses the repository.</summary>
    public const int MaxPaths = 200_000;
}
