using Readiness.Core.Snapshots;

namespace Readiness.Core.Tests.Checks.Signing;

/// <summary>Answers verifications with a fixed verdict and records what it was asked.</summary>
internal sealed class FakeSignatureVerifier(SignatureVerification verdict) : ISignatureVerifier
{
    public List<(string What, string Target, string Allowed)> Calls { get; } = [];

    public SignatureVerification VerifyTag(string tagName, string allowedSignersContent)
    {
        Calls.Add(("tag", tagName, allowedSignersContent));
        return verdict;
    }

    public SignatureVerification VerifyCommit(string commit, string allowedSignersContent)
    {
        Calls.Add(("commit", commit, allowedSignersContent));
        return verdict;
    }
}
