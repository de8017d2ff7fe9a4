namespace Readiness.Core.Matrix;

/// <summary>What the CI configuration of a commit says about the .NET SDKs it builds with.</summary>
/// <param name="Workflows">The workflow files found (<c>.github/workflows/*.yml</c> and <c>*.yaml</c>).</param>
/// <param name="Sdks">Every SDK version named, with where.</param>
/// <param name="Unevaluated">What could not be evaluated (file:line and why), never guessed.</param>
public sealed record CiSdkReport(IReadOnlyList<string> Workflows, IReadOnlyList<CiSdk> Sdks, IReadOnlyList<string> Unevaluated)
{
    public bool HasCi => Workflows.Count > 0;
}
