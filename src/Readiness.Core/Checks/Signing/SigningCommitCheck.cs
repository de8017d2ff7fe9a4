using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Signing;

/// <summary>The tagged (inspected) commit carries a signature; with <c>allowed-signers</c>, <c>git verify-commit</c> accepts it.</summary>
public sealed class SigningCommitCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.SigningCommit,
        "The release commit is signed",
        Severity.Info,
        Standards.GitSignature,
        "A signed commit ties the released content to its author's key, not only the tag that names it.",
        "Sign commits ('git commit -S', or commit.gpgsign=true; gpg.format=ssh for SSH keys) with a key listed in "
        + "the allowed-signers file; create, store and rotate signing keys as your organisation's security policy says.")
    {
        Settings = ["allowed-signers"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var snapshot = context.Snapshot;
        var shortSha = snapshot.Commit.Length > 12 ? snapshot.Commit[..12] : snapshot.Commit;
        if (snapshot.Inspected == InspectionKind.Worktree)
        {
            yield return Finding.Skip("A working-tree inspection has no commit of its own to verify.");
            yield break;
        }

        if (snapshot.CommitSignature is not { } signature)
        {
            yield return Finding.Fail($"The commit {shortSha} is not signed.", Descriptor.Fix);
            yield break;
        }

        yield return SignatureJudge.Judge(
            context,
            $"The commit {shortSha}",
            signature,
            (verifier, allowed) => verifier.VerifyCommit(snapshot.Commit, allowed),
            "Sign the release commit with a key listed in the allowed-signers file, and follow your organisation's "
            + "security policy if the signer is unknown.");
    }
}
