namespace Readiness.Core.Forge;

/// <summary>A commit status's state.</summary>
public enum ForgeCommitState
{
    Pending,
    Success,
    Failure,
    Error,
}
