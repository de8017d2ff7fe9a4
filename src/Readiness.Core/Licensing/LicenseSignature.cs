namespace Readiness.Core.Licensing;

/// <summary>How a license text is recognised: passages it always contains, and passages that would make it another license.</summary>
/// <param name="Name">The license, as an SPDX id (for a family, the id without <c>-only</c>/<c>-or-later</c>).</param>
/// <param name="Ids">The SPDX ids whose text this is (e.g. GPL-3.0-only and GPL-3.0-or-later share one text).</param>
/// <param name="Required">Short distinctive passages, each present in every copy of the text.</param>
/// <param name="Absent">Passages of neighbouring licenses that this one never contains.</param>
/// <param name="Source">Where the passages come from.</param>
public sealed record LicenseSignature(
    string Name,
    IReadOnlyList<string> Ids,
    IReadOnlyList<string> Required,
    IReadOnlyList<string> Absent,
    string Source);
