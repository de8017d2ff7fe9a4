namespace Readiness.Testing.Hostile;

/// <summary>What a hostile case may end in (cli.md's exit codes).</summary>
public enum HostileExpectation
{
    /// <summary>A healthy release with something odd beside it: READY (exit 0), the oddity at most a note.</summary>
    Ready,

    /// <summary>Part of the release could not be read or is unsafe: NOT READY (1) or could not inspect (3), never READY.</summary>
    NotReady,

    /// <summary>The configuration is wrong: exit 2.</summary>
    ConfigurationError,

    /// <summary>Any clear answer (0 to 3); the case is about crashes, leaks, time and memory.</summary>
    AnyAnswer,
}
