using Readiness.Core.Configuration;

namespace Readiness.Core.Checklists;

/// <summary>One checklist file as written, before <c>extends</c> is resolved.</summary>
public sealed record ChecklistDefinition(
    string Name,
    string? Description,
    string? Extends,
    ConfigMark? ExtendsMark,
    IReadOnlyList<KeyValuePair<string, CheckSettings>> Checks,
    IReadOnlyList<ManualItem> Manual,
    string Source);
