using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Signing;

/// <summary>
/// The release tag is annotated and signed (PGP, SSH or X.509); with <c>allowed-signers</c>, <c>git verify-tag</c>
/// accepts the signature against that file as committed.
/// </summary>
public sealed class SigningTagCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.SigningTag,
        "The release tag is signed",
        Severity.Warn,
        Standards.GitSignature,
        "A signed tag lets anyone confirm that a maintainer, not someone with push access alone, named this commit "
        + "the release. A lightweight tag is only a pointer: it carries no tagger, date or signature.",
        "Create the tag with 'git tag -s' (annotated and signed; for SSH keys set gpg.format=ssh and user.signingkey), "
        + "list the maintainers' public keys in the allowed-signers file, then push the tag again; create, store and "
        + "rotate signing keys as your organisation's security policy says.")
    {
        Settings = ["allowed-signers"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var tag = context.Release.Tag;
        if (context.Snapshot.Inspected == InspectionKind.Worktree)
        {
            yield return Finding.Skip("A working-tree inspection does not verify tags; inspect the tagged commit instead.");
            yield break;
        }

        if (tag is null)
        {
            yield return Finding.Skip("There is no release tag yet (a report before tagging); nothing to verify.");
            yield break;
        }

        if (!tag.IsAnnotated)
        {
            yield return Finding.Fail(
                $"The tag {tag.Name} is lightweight: a plain pointer with no tagger, date or signature.",
                "Replace it with a signed annotated tag: 'git tag -d " + tag.Name + "', then 'git tag -s " + tag.Name
                + "' (gpg.format=ssh for SSH keys) with a key kept as your organisation's security policy says, and push it "
                + "with --force if it was pushed already.");
            yield break;
        }

        if (tag.Signature is not { } signature)
        {
            yield return Finding.Fail(
                $"The tag {tag.Name} is annotated{(tag.Tagger is { } t ? $" by {t}" : string.Empty)} but not signed.",
                Descriptor.Fix);
            yield break;
        }

        yield return SignatureJudge.Judge(
            context,
            $"The tag {tag.Name}",
            signature,
            (verifier, allowed) => verifier.VerifyTag(tag.Name, allowed),
            "Sign the tag with a key listed in the allowed-signers file (or add the maintainer's public key to that file "
            + "in a reviewed commit), and follow your organisation's security policy if the signer is unknown.");
    }
}
