namespace Readiness.Testing;

/// <summary>What one run of a reference program gave back.</summary>
public sealed record ProcessResult(int ExitCode, string StdOut, string StdErr)
{
    public bool Succeeded => ExitCode == 0;

    /// <summary>Both streams, for failure messages.</summary>
    public string Log => StdOut + StdErr;
}
