namespace Readiness.Core.Snapshots;

/// <summary>
/// Port: verifies tag and commit signatures against an allowed-signers list (git verify-tag / verify-commit).
/// Implemented outside Core by an adapter that runs git; nothing from the inspected repository is executed.
/// </summary>
public interface ISignatureVerifier
{
    SignatureVerification VerifyTag(string tagName, string allowedSignersContent);

    SignatureVerification VerifyCommit(string commit, string allowedSignersContent);
}
