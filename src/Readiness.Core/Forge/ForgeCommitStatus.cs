namespace Readiness.Core.Forge;

/// <summary>A commit status: a state, a short description and a link, under a context name.</summary>
/// <param name="Sha">The commit (40 hex digits).</param>
/// <param name="State">The state.</param>
/// <param name="Description">At most <see cref="MaxDescription"/> characters.</param>
/// <param name="TargetUrl">The page that explains the state.</param>
/// <param name="Context">The status's name; one status per context and commit is current.</param>
public sealed record ForgeCommitStatus(string Sha, ForgeCommitState State, string Description, string? TargetUrl, string Context)
{
    /// <summary>The longest description the forge accepts (the API answers 422 beyond it).</summary>
    public const int MaxDescription = 140;

    /// <summary>Shortens <paramref name="text"/> to fit <see cref="MaxDescription"/>, ending with an ellipsis when cut.</summary>
    public static string FitDescription(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var oneLine = text.ReplaceLineEndings(" ").Trim();
        return oneLine.Length <= MaxDescription ? oneLine : oneLine[..(MaxDescription - 1)].TrimEnd() + "…";
    }
}
