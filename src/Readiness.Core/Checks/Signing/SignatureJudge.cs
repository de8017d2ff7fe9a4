using Readiness.Core.Reports;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Checks.Signing;

/// <summary>Shared verdict of the signing checks: signature present, then (with allowed-signers) verified by git.</summary>
internal static class SignatureJudge
{
    public static Finding Judge(
        CheckContext context,
        string what,
        SignatureBlock signature,
        Func<ISignatureVerifier, string, SignatureVerification> verify,
        string fix)
    {
        var (allowed, problem) = AllowedSigners.Load(context, null);
        if (problem is not null)
        {
            return problem;
        }

        var kind = Kind(signature.Kind);
        if (allowed is null)
        {
            return Finding.Pass($"{what} carries {kind} signature (not verified: no allowed-signers is configured).");
        }

        if (context.Snapshot.Signatures is not { } verifier)
        {
            return Finding.Skip($"{what} carries {kind} signature, but it could not be verified here: "
                + (context.Snapshot.Inspected == InspectionKind.Worktree
                    ? "a working-tree inspection has no tag objects to verify."
                    : "no signature verifier is available for this repository."));
        }

        var result = verify(verifier, allowed.Content);
        var line = allowed.LineOf(result.Fingerprint);
        var evidence = new Evidence(allowed.Path, line);
        var who = Who(result);
        return result.Valid
            ? Finding.Pass($"{what} carries {kind} signature that git verifies against {allowed.Path}{who}.", null, evidence)
            : Finding.Fail(
                $"{what} carries {kind} signature that git does not accept against {allowed.Path}{who}: {Trim(result.Detail)}",
                fix,
                null,
                evidence);
    }

    public static string Kind(SignatureKind kind) => kind switch
    {
        SignatureKind.Ssh => "an SSH",
        SignatureKind.X509 => "an X.509",
        _ => "a PGP",
    };

    private static string Who(SignatureVerification result) =>
        (result.Signer, result.Fingerprint) switch
        {
            (null, null) => string.Empty,
            (null, { } f) => $" (key {f})",
            ({ } s, null) => $" (signed by {s})",
            ({ } s, { } f) => $" (signed by {s} with key {f})",
        };

    private static string Trim(string detail)
    {
        var text = detail.Trim().ReplaceLineEndings(" ");
        return text.Length > 300 ? text[..300] + "…" : text;
    }
}
