namespace Readiness.Core.Projects.MsBuild;

/// <summary>A property as evaluation left it: the value (escaped), where it was set, and how sure it is.</summary>
/// <param name="Undefined">Properties the value used that were not defined at that moment (taken as empty).</param>
internal sealed record PropertyEntry(
    string Name,
    string Value,
    SourceLocation Location,
    PropertyOrigin Origin,
    string? Unevaluated = null,
    string? ComputedBy = null,
    IReadOnlyList<string>? Undefined = null);
