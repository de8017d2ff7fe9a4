namespace Readiness.Core.Licensing;

/// <summary>
/// Recognises license texts by key passages (<see cref="LicenseSignatures"/>) after SPDX-guideline normalisation
/// (<see cref="LicenseTextNormalizer"/>). A file holding several texts (e.g. MIT and Apache-2.0) is recognised as each.
/// </summary>
public static class LicenseTextRecognizer
{
    private static readonly IReadOnlyList<(LicenseSignature Signature, string[] Required, string[] Absent)> Prepared =
        LicenseSignatures.All.Select(s => (s, s.Required.Select(Pad).ToArray(), s.Absent.Select(Pad).ToArray())).ToArray();

    public static LicenseRecognition Recognize(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var normalized = " " + LicenseTextNormalizer.Normalize(text) + " ";
        var recognised = new List<LicenseSignature>();
        LicenseSignature? closest = null;
        var closestFound = 0;
        var closestTotal = 0;
        foreach (var (signature, required, absent) in Prepared)
        {
            var found = required.Count(p => normalized.Contains(p, StringComparison.Ordinal));
            if (found == required.Length && !absent.Any(p => normalized.Contains(p, StringComparison.Ordinal)))
            {
                recognised.Add(signature);
            }
            else if (found > closestFound)
            {
                (closest, closestFound, closestTotal) = (signature, found, required.Length);
            }
        }

        return recognised.Count > 0 ? new LicenseRecognition(recognised, null, 0, 0) : new LicenseRecognition([], closest, closestFound, closestTotal);
    }

    private static string Pad(string passage) => " " + LicenseTextNormalizer.Normalize(passage) + " ";
}
