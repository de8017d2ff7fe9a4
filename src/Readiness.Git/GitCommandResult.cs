namespace Readiness.Git;

/// <summary>What one run of git gave back; <see cref="TimedOut"/> when it was killed at its time limit.</summary>
public sealed record GitCommandResult(int ExitCode, string Output, string Error, bool TimedOut)
{
    public bool Succeeded => ExitCode == 0 && !TimedOut;
}
