namespace Readiness.Core.Snapshots;

/// <summary>The verdict of a signature verification.</summary>
/// <param name="Valid">Git accepted the signature as good and trusted.</param>
/// <param name="Signer">The principal or user id that signed, when git names it.</param>
/// <param name="Fingerprint">The key fingerprint, when git names it.</param>
/// <param name="Detail">Git's own words, for the report (never secret material).</param>
public sealed record SignatureVerification(bool Valid, string? Signer, string? Fingerprint, string Detail);
