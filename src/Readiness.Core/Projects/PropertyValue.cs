namespace Readiness.Core.Projects;

/// <summary>An MSBuild property after static evaluation.</summary>
/// <param name="Name">Property name as declared.</param>
/// <param name="Value">The expanded value (what could be expanded).</param>
/// <param name="Location">The declaration that set the final value.</param>
/// <param name="Unevaluated">Why the value is not certain (a property function, an unknown condition), or null when it is.</param>
public sealed record PropertyValue(string Name, string Value, SourceLocation Location, string? Unevaluated = null)
{
    public bool IsCertain => Unevaluated is null;
}
