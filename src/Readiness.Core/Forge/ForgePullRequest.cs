namespace Readiness.Core.Forge;

/// <summary>One pull request of a repository.</summary>
public sealed record ForgePullRequest(ForgeRepository Repository, int Number)
{
    public override string ToString() => $"{Repository.FullName}#{Number}";
}
