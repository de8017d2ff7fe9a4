using Readiness.Testing;

namespace Readiness.Git.Tests;

/// <summary>Two SSH signing keys made once per test class: one the allowed signer, one a stranger.</summary>
public sealed class SigningKeysFixture : IDisposable
{
    public SigningKeysFixture()
    {
        Allowed = Keys.Create();
        Stranger = Keys.Create("someone@elsewhere.example");
    }

    public SshKeys Keys { get; } = new();

    public SshKey Allowed { get; }

    public SshKey Stranger { get; }

    public void Dispose() => Keys.Dispose();
}
