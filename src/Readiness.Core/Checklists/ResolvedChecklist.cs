namespace Readiness.Core.Checklists;

/// <summary>A checklist after <c>extends</c> and the repository's overrides: what the engine runs.</summary>
/// <param name="Name">The checklist's name.</param>
/// <param name="Description">Its description.</param>
/// <param name="Checks">Checks in the order they were first listed.</param>
/// <param name="Manual">Manual items.</param>
/// <param name="Sources">The files it was built from, most derived first.</param>
public sealed record ResolvedChecklist(
    string Name,
    string? Description,
    IReadOnlyList<PlannedCheck> Checks,
    IReadOnlyList<ManualItem> Manual,
    IReadOnlyList<string> Sources);
