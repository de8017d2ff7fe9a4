namespace Readiness.Core.Projects.MsBuild;

/// <summary>True, false, or not evaluated (null, with the reason); and the undefined properties the answer rests on.</summary>
internal sealed record ConditionResult(bool? Value, string? Reason, IReadOnlyList<string> Undefined);
