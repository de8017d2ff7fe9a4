namespace Readiness.Core.Matrix;

/// <summary>A .NET SDK version that the CI configuration installs or pins.</summary>
/// <param name="Major">The SDK's major version (an SDK of major N builds every target up to netN.0).</param>
/// <param name="Text">The version as written, after matrix and env substitution (e.g. <c>8.0.x</c>).</param>
/// <param name="Path">The file that names it.</param>
/// <param name="Line">The 1-based line, when known.</param>
public sealed record CiSdk(int Major, string Text, string Path, int? Line);
