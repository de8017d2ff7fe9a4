namespace Readiness.Core.Secrets;

/// <summary>The outcome of a scan of every tracked file.</summary>
/// <param name="Hits">What was found.</param>
/// <param name="TextFiles">Files scanned as text.</param>
/// <param name="BinaryFiles">Files recognised as binary (checked by name and key-file format only).</param>
/// <param name="TooLarge">Files above the scan bound, not read.</param>
/// <param name="Notes">Files that could not be parsed (a nuget.config that is not XML, say).</param>
public sealed record SecretScanResult(
    IReadOnlyList<SecretHit> Hits,
    int TextFiles,
    int BinaryFiles,
    IReadOnlyList<string> TooLarge,
    IReadOnlyList<string> Notes);
