namespace Readiness.Core.Licensing;

/// <summary>What a license text was recognised as.</summary>
/// <param name="Recognised">The licenses whose every key passage is present (and no excluding passage).</param>
/// <param name="Closest">When nothing is recognised: the license with the most key passages present, if any.</param>
/// <param name="ClosestFound">How many of <paramref name="Closest"/>'s passages were found.</param>
/// <param name="ClosestTotal">How many it has.</param>
public sealed record LicenseRecognition(
    IReadOnlyList<LicenseSignature> Recognised,
    LicenseSignature? Closest,
    int ClosestFound,
    int ClosestTotal)
{
    public bool Is(LicenseSignature signature) => Recognised.Contains(signature);

    public string Names => string.Join(" + ", Recognised.Select(s => s.Name));
}
