using System.Diagnostics;
using Readiness.Core.Checks.Signing;
using Readiness.Testing;

namespace Readiness.Core.Tests.Checks.Signing;

public sealed class AllowedSignersTests
{
    // Reference tool: ssh-keygen -l -E sha256 -f KEY.pub prints "256 SHA256:… comment (ED25519)".
    [Fact]
    public void Fingerprint_EqualsSshKeygens()
    {
        using var keys = new SshKeys();
        var key = keys.Create();

        var expected = SshKeygen("-l", "-E", "sha256", "-f", key.PublicKeyPath).Split(' ')[1];

        Assert.Equal(expected, AllowedSigners.Fingerprint(key.PublicKey.Split(' ')[1]));
        var file = new AllowedSigners("signers", "# team\n" + SshKeys.AllowedSigners(keys.Create("ops@bramblecote.example"), key));
        Assert.Equal(3, file.LineOf(expected));
    }

    [Fact]
    public void NotBase64_HasNoFingerprint() => Assert.Null(AllowedSigners.Fingerprint("namespaces=\"git\""));

    private static string SshKeygen(params string[] args)
    {
        var start = new ProcessStartInfo("ssh-keygen") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args)
        {
            start.ArgumentList.Add(a);
        }

        using var p = Process.Start(start)!;
        var output = p.StandardOutput.ReadToEnd();
        p.WaitForExit();
        Assert.Equal(0, p.ExitCode);
        return output.Trim();
    }
}
