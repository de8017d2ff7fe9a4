namespace Readiness.Testing;

/// <summary>An SSH key pair on disk, made by <see cref="SshKeys"/>.</summary>
/// <param name="PrivateKeyPath">The private key file (mode 600, no passphrase), usable as <c>user.signingkey</c>.</param>
/// <param name="PublicKey">The public key line as ssh-keygen wrote it: <c>ssh-ed25519 AAAA… comment</c>.</param>
/// <param name="Principal">The signer identity the allowed-signers line names.</param>
public sealed record SshKey(string PrivateKeyPath, string PublicKey, string Principal)
{
    public string PublicKeyPath => PrivateKeyPath + ".pub";

    /// <summary>
    /// The key's line in an allowed-signers file (ssh-keygen(1) ALLOWED SIGNERS: <c>principals [options] keytype key</c>),
    /// limited to the <c>git</c> namespace.
    /// </summary>
    public string AllowedSignersLine
    {
        get
        {
            var parts = PublicKey.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            return $"{Principal} namespaces=\"git\" {parts[0]} {parts[1]}";
        }
    }
}
