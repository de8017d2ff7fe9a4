namespace Readiness.Core.Projects.MsBuild;

/// <summary>What one expansion collects while it runs.</summary>
internal sealed class ExpandState
{
    public string? Reason { get; private set; }

    public List<string> Undefined { get; } = [];

    /// <summary>Keeps the first reason: the root cause is the useful one.</summary>
    public void Fail(string reason) => Reason ??= reason;
}
