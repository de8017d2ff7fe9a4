namespace Readiness.Core.Projects.MsBuild;

/// <summary>Expanded text (still escaped), why it is not certain if it is not, and the undefined properties it used.</summary>
internal sealed record Expansion(string Value, string? Unevaluated, IReadOnlyList<string> Undefined);
