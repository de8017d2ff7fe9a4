namespace Readiness.Core.Secrets;

/// <summary>A credential found in a tracked file. Holds where and what kind, never the value.</summary>
/// <param name="Path">Repository-relative path.</param>
/// <param name="Line">1-based line, when the hit is in text.</param>
/// <param name="Kind">What was found, e.g. "GitHub token" or "clear-text password in nuget.config".</param>
/// <param name="Source">The published source (or "common practice") of the shape.</param>
public sealed record SecretHit(string Path, int? Line, string Kind, string Source);
