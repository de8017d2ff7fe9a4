namespace Readiness.Core.Snapshots;

/// <summary>The armour of a git signature block (git's gpg-interface.c).</summary>
public enum SignatureKind
{
    Pgp,
    Ssh,
    X509,
}
