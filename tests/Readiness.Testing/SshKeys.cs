namespace Readiness.Testing;

/// <summary>Makes ed25519 signing keys with <c>ssh-keygen</c> in a temporary folder, deleted on dispose.</summary>
public sealed class SshKeys : IDisposable
{
    public const string DefaultPrincipal = "dev@bramblecote.example";

    private readonly TempDirectory folder = new("readiness-keys-");
    private int count;

    /// <summary>A new key pair: <c>ssh-keygen -t ed25519 -N "" -f FILE -C PRINCIPAL</c>.</summary>
    public SshKey Create(string principal = DefaultPrincipal)
    {
        ArgumentNullException.ThrowIfNull(principal);
        count++;
        var path = folder.Combine($"key{count}");
        var start = new System.Diagnostics.ProcessStartInfo("ssh-keygen")
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var arg in (string[])["-q", "-t", "ed25519", "-N", string.Empty, "-f", path, "-C", principal])
        {
            start.ArgumentList.Add(arg);
        }

        using var process = System.Diagnostics.Process.Start(start) ?? throw new InvalidOperationException("ssh-keygen could not be started.");
        var stderr = process.StandardError.ReadToEndAsync();
        process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        if (process.ExitCode != 0)
        {
            throw new InvalidOperationException($"ssh-keygen exited with {process.ExitCode}: {stderr.GetAwaiter().GetResult().Trim()}");
        }

        return new SshKey(path, File.ReadAllText(path + ".pub").Trim(), principal);
    }

    /// <summary>The content of an allowed-signers file listing <paramref name="keys"/>, one line each.</summary>
    public static string AllowedSigners(params SshKey[] keys) =>
        string.Concat(keys.Select(k => k.AllowedSignersLine + "\n"));

    /// <summary>Writes an allowed-signers file into the keys folder and returns its path.</summary>
    public string WriteAllowedSigners(params SshKey[] keys)
    {
        var path = folder.Combine($"allowed_signers{++count}");
        File.WriteAllText(path, AllowedSigners(keys));
        return path;
    }

    public void Dispose() => folder.Dispose();
}
