namespace Readiness.Testing;

/// <summary>What one run of the <c>git</c> command line gave back.</summary>
public sealed record GitResult(int ExitCode, string StdOut, string StdErr)
{
    public bool Succeeded => ExitCode == 0;
}
