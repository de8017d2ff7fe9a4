using System.ComponentModel;
using System.Text.RegularExpressions;

using Readiness.Core.Snapshots;

namespace Readiness.Git;

/// <summary>
/// Verifies tag and commit signatures by running <c>git verify-tag</c> / <c>git verify-commit</c> (git is the only
/// program this tool runs) against an allowed-signers list given by the caller. Works for bare repositories.
/// </summary>
/// <remarks>
/// The inspected repository's configuration could name other programs for signature checking; every such setting is
/// pinned on the command line (<c>-c</c> wins over repository configuration), so only git's own default helpers
/// (ssh-keygen, gpg, gpgsm) ever run. No shell is involved; arguments are passed one by one.
/// </remarks>
public sealed partial class GitSignatureVerifier : ISignatureVerifier
{
    /// <summary>git's variables that could point it elsewhere or make it run programs; removed from its environment.</summary>
    internal static readonly string[] ScrubbedVariables =
    [
        "GIT_DIR", "GIT_WORK_TREE", "GIT_INDEX_FILE", "GIT_OBJECT_DIRECTORY", "GIT_ALTERNATE_OBJECT_DIRECTORIES",
        "GIT_NAMESPACE", "GIT_CONFIG", "GIT_CONFIG_PARAMETERS", "GIT_CONFIG_COUNT", "GIT_COMMON_DIR",
        "GIT_EXTERNAL_DIFF", "GIT_SSH", "GIT_SSH_COMMAND", "GIT_ASKPASS", "GIT_EDITOR", "GIT_PAGER", "GIT_TRACE",
    ];

    private readonly string gitDirectory;

    /// <param name="gitDirectory">The repository's git directory (the <c>.git</c> folder, or a bare repository).</param>
    /// <param name="timeout">How long one verification may take; 10 seconds by default.</param>
    public GitSignatureVerifier(string gitDirectory, TimeSpan? timeout = null)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(gitDirectory);
        this.gitDirectory = Path.TrimEndingDirectorySeparator(Path.GetFullPath(gitDirectory));
        Timeout = timeout ?? TimeSpan.FromSeconds(10);
    }

    public TimeSpan Timeout { get; }

    public SignatureVerification VerifyTag(string tagName, string allowedSignersContent)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(tagName);
        ArgumentNullException.ThrowIfNull(allowedSignersContent);
        var reference = tagName.StartsWith("refs/", StringComparison.Ordinal) ? tagName : "refs/tags/" + tagName;
        return Verify("verify-tag", reference, allowedSignersContent);
    }

    public SignatureVerification VerifyCommit(string commit, string allowedSignersContent)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(commit);
        ArgumentNullException.ThrowIfNull(allowedSignersContent);
        return Verify("verify-commit", commit, allowedSignersContent);
    }

    /// <summary>
    /// Reads the signer and key fingerprint from git's <c>--raw</c> output: ssh-keygen's
    /// <c>Good "git" signature for PRINCIPAL with KEYTYPE key SHA256:…</c>, or GnuPG status lines
    /// (<c>[GNUPG:] GOODSIG KEYID USERID</c>, <c>[GNUPG:] VALIDSIG FINGERPRINT …</c>).
    /// </summary>
    public static (string? Signer, string? Fingerprint) ParseSigner(string output)
    {
        ArgumentNullException.ThrowIfNull(output);
        var ssh = SshGood().Match(output);
        if (ssh.Success)
        {
            return (ssh.Groups["principal"].Success ? ssh.Groups["principal"].Value : null, ssh.Groups["fingerprint"].Value);
        }

        var goodSig = GnupgGoodSig().Match(output);
        var validSig = GnupgValidSig().Match(output);
        return (goodSig.Success ? goodSig.Groups["uid"].Value.Trim() : null, validSig.Success ? validSig.Groups["fingerprint"].Value : null);
    }

    private SignatureVerification Verify(string command, string target, string allowedSignersContent)
    {
        var allowedSigners = Path.Combine(Path.GetTempPath(), $"readiness-allowed-signers-{Guid.NewGuid():N}");
        try
        {
            File.WriteAllText(allowedSigners, allowedSignersContent);
            var (exitCode, output) = Run(command,
            [
                "-c", $"gpg.ssh.allowedSignersFile={allowedSigners}",
                "-c", "gpg.program=gpg",
                "-c", "gpg.openpgp.program=gpg",
                "-c", "gpg.x509.program=gpgsm",
                "-c", "gpg.ssh.program=ssh-keygen",
                "-c", "safe.directory=*",
                "-c", "core.fsmonitor=false",
                command, "--raw", "--", target,
            ]);
            var (signer, fingerprint) = ParseSigner(output);
            var detail = Describe(output, command, exitCode);
            return new SignatureVerification(exitCode == 0, signer, fingerprint, detail);
        }
        catch (Win32Exception e)
        {
            return new SignatureVerification(false, null, null, $"git could not be run to verify the signature: {e.Message}");
        }
        catch (TimeoutException e)
        {
            return new SignatureVerification(false, null, null, e.Message);
        }
        finally
        {
            TryDelete(allowedSigners);
        }
    }

    private (int ExitCode, string Output) Run(string command, IEnumerable<string> arguments)
    {
        var environment = ScrubbedVariables.ToDictionary(name => name, string? (_) => null, StringComparer.Ordinal);
        environment["GIT_DIR"] = gitDirectory;
        environment["GIT_TERMINAL_PROMPT"] = "0";
        environment["GIT_PAGER"] = "cat";
        environment["LC_ALL"] = "C";
        var result = GitCommand.Run(gitDirectory, arguments, environment, Timeout);
        return result.TimedOut
            ? throw new TimeoutException($"git {command} did not finish within {Timeout.TotalSeconds:0} s; the signature was not verified.")
            : (result.ExitCode, result.Output + result.Error);
    }

    private static string Describe(string output, string command, int exitCode)
    {
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
            .Where(l => !l.StartsWith("[GNUPG:]", StringComparison.Ordinal) || l.Contains("SIG ", StringComparison.Ordinal))
            .ToArray();
        var text = lines.Length == 0
            ? exitCode == 0 ? $"git {command} accepted the signature" : $"no signature: git {command} exited with {exitCode} without a word"
            : string.Join(" ", lines);
        return text.Length > 500 ? text[..500] + "…" : text;
    }

    private static void TryDelete(string path)
    {
        try
        {
            File.Delete(path);
        }
        catch (IOException)
        {
            // A temp file left behind holds public keys only.
        }
        catch (UnauthorizedAccessException)
        {
        }
    }

    [GeneratedRegex("""Good "git" signature (?:for (?<principal>\S+) )?with \S+ key (?<fingerprint>SHA256:[A-Za-z0-9+/=]+)""")]
    private static partial Regex SshGood();

    [GeneratedRegex(@"^\[GNUPG:\] GOODSIG [0-9A-Fa-f]+ (?<uid>.+)$", RegexOptions.Multiline)]
    private static partial Regex GnupgGoodSig();

    [GeneratedRegex(@"^\[GNUPG:\] VALIDSIG (?<fingerprint>[0-9A-Fa-f]+) ", RegexOptions.Multiline)]
    private static partial Regex GnupgValidSig();
}
