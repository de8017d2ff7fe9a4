namespace Readiness.Core.Projects;

/// <summary>An MSBuild property after static evaluation.</summary>
/// <param name="Name">Property name as declared.</param>
/// <param name="Value">The expanded value (what could be expanded).</param>
/// <param name="Location">The declaration that set the final value.</param>
/// <param name="Unevaluated">Why the value is not certain (a property function, an unknown condition), or null when it is.</param>
/// <param name="ComputedBy">
/// Set when no file declares this value but the .NET SDK computes it from declared ones at a point of evaluation that
/// changes the outcome (e.g. Version from VersionPrefix before Directory.Build.targets is imported): the SDK rule, in
/// words. <paramref name="Location"/> then points at the declaration the value was computed from.
/// </param>
public sealed record PropertyValue(string Name, string Value, SourceLocation Location, string? Unevaluated = null, string? ComputedBy = null)
{
    public bool IsCertain => Unevaluated is null;
}
