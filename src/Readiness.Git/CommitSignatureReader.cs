using System.ComponentModel;

using Readiness.Core.Snapshots;

namespace Readiness.Git;

/// <summary>
/// Reads a commit's signature from the raw commit object (<c>git cat-file commit</c>): the value of its
/// <c>gpgsig</c> header (<c>gpgsig-sha256</c> in a SHA-256 repository), whose continuation lines start with one space
/// (git's documented object format, gitformat-signature(5)). libgit2's binding hands this back in a native buffer
/// that the ahead-of-time compiled program never sees, so the object is read as git writes it.
/// </summary>
public static class CommitSignatureReader
{
    private static readonly TimeSpan Timeout = TimeSpan.FromSeconds(10);

    /// <summary>The signature of commit <paramref name="sha"/> in <paramref name="gitDirectory"/>, or null when it has none.</summary>
    /// <exception cref="RepositoryInspectionException">git could not read the commit.</exception>
    public static SignatureBlock? Read(string gitDirectory, string sha)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(gitDirectory);
        ArgumentException.ThrowIfNullOrWhiteSpace(sha);
        var environment = GitSignatureVerifier.ScrubbedVariables.ToDictionary(name => name, string? (_) => null, StringComparer.Ordinal);
        environment["GIT_DIR"] = gitDirectory;
        environment["LC_ALL"] = "C";
        GitCommandResult result;
        try
        {
            result = GitCommand.Run(gitDirectory, ["-c", "safe.directory=*", "cat-file", "commit", sha], environment, Timeout);
        }
        catch (Win32Exception e)
        {
            throw new RepositoryInspectionException($"git could not be run to read the signature of commit {sha}: {e.Message}", e);
        }

        if (result.TimedOut || result.ExitCode != 0)
        {
            var why = result.TimedOut ? $"it did not finish within {Timeout.TotalSeconds:0} s" : result.Error.Trim();
            throw new RepositoryInspectionException($"git could not read commit {sha} to find its signature: {why}");
        }

        return SignatureBlock.FromArmored(HeaderSignature(result.Output));
    }

    /// <summary>
    /// The signature in a raw commit object's header (the lines before the first empty one): the <c>gpgsig</c> or
    /// <c>gpgsig-sha256</c> value with each continuation line's leading space removed and the lines joined by line feeds (as libgit2 gives it).
    /// </summary>
    public static string? HeaderSignature(string rawCommit)
    {
        ArgumentNullException.ThrowIfNull(rawCommit);
        var value = new System.Text.StringBuilder();
        var inSignature = false;
        foreach (var line in rawCommit.Split('\n'))
        {
            if (line.Length == 0)
            {
                break;
            }

            if (inSignature && line[0] == ' ')
            {
                value.Append('\n').Append(line, 1, line.Length - 1);
                continue;
            }

            if (value.Length > 0)
            {
                break;
            }

            inSignature = line.StartsWith("gpgsig ", StringComparison.Ordinal) || line.StartsWith("gpgsig-sha256 ", StringComparison.Ordinal);
            if (inSignature)
            {
                value.Append(line[(line.IndexOf(' ', StringComparison.Ordinal) + 1)..]);
            }
        }

        return value.Length == 0 ? null : value.ToString();
    }
}
