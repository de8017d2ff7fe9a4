namespace Readiness.Core.Forge;

/// <summary>A comment the forge holds.</summary>
/// <param name="Id">The forge's id for it.</param>
/// <param name="Url">Where a person reads it, when the forge says.</param>
/// <param name="Created">True when this call created it, false when it updated an existing one.</param>
public sealed record ForgeComment(long Id, string? Url, bool Created);
