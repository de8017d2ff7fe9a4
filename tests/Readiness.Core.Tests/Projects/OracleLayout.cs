namespace Readiness.Core.Tests.Projects;

/// <summary>A repository of project files evaluated both by MSBuild and by the static reader.</summary>
/// <param name="Project">The project to compare, repository-relative.</param>
/// <param name="Files">Every file of the repository (path → text).</param>
/// <param name="TargetFramework">Evaluate one inner build (MSBuild's global TargetFramework) instead of the outer one.</param>
/// <param name="Extra">More properties to compare, beyond the standard set.</param>
internal sealed record OracleLayout(
    string Project,
    IReadOnlyDictionary<string, string> Files,
    string? TargetFramework = null,
    IReadOnlyList<string>? Extra = null);
