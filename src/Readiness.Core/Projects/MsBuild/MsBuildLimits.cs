namespace Readiness.Core.Projects.MsBuild;

/// <summary>Bounds on the static evaluation of untrusted project files.</summary>
internal static class MsBuildLimits
{
    /// <summary>Imports nested deeper than this are not read (MSBuild has no such bound; real trees stay under 10).</summary>
    public const int MaxImportDepth = 32;

    /// <summary>Nesting of property functions and their arguments.</summary>
    public const int MaxExpansionDepth = 32;

    /// <summary>Longest value kept after expansion; a self-doubling property stops here.</summary>
    public const int MaxValueLength = 64 * 1024;

    /// <summary>Characters built by expanding values in one evaluation; a chain of growing properties stops here.</summary>
    public const long MaxExpandedCharacters = 16L * 1024 * 1024;

    /// <summary>Element nesting in one XML document; real project files stay under 10 levels.</summary>
    public const int MaxXmlDepth = 64;

    /// <summary>Notes kept per evaluation; the rest are counted in one last note.</summary>
    public const int MaxNotes = 200;

    /// <summary>Characters in one XML document (the byte bound comes from <see cref="Snapshots.FileLimits"/>).</summary>
    public const long MaxCharactersInDocument = 4L * 1024 * 1024;

    /// <summary>Nesting of Choose elements.</summary>
    public const int MaxChooseDepth = 16;

    /// <summary>Target frameworks re-evaluated one by one.</summary>
    public const int MaxTargetFrameworks = 16;

    /// <summary>Items of the kinds the reader keeps, per evaluation.</summary>
    public const int MaxItems = 20_000;
}
