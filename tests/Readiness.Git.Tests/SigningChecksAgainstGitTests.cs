using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Checks.Signing;
using Readiness.Core.Configuration;
using Readiness.Core.Engine;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Git.Tests;

/// <summary>
/// The signing checks over real repositories, with tags signed by keys made by ssh-keygen. The reference verdict for
/// each tag is <c>git verify-tag</c> run directly with <c>gpg.ssh.allowedSignersFile</c> pointing at the same file.
/// </summary>
public sealed class SigningChecksAgainstGitTests : IDisposable
{
    private readonly SshKeys keys = new();
    private readonly SshKey maintainer;
    private readonly SshKey stranger;
    private readonly TestRepository repo = TestRepository.Create();

    public SigningChecksAgainstGitTests()
    {
        maintainer = keys.Create();
        stranger = keys.Create("someone@elsewhere.example");
        repo.Write(".readiness.yml", "allowed-signers: .github/allowed_signers\n")
            .Write(".github/allowed_signers", "# Bramblecote maintainers\n" + SshKeys.AllowedSigners(maintainer))
            .Write("README.md", "# Bramble.Sketches\n");
    }

    [Fact]
    public void TagSignedByAllowedKey_PassesLikeGit()
    {
        repo.SignedCommit("Release 2.4.0", maintainer.PrivateKeyPath);
        repo.SignedTag("v2.4.0", "Release 2.4.0", maintainer.PrivateKeyPath);

        var (tag, commit) = RunBoth("v2.4.0");

        Assert.True(GitAccepts("verify-tag", "v2.4.0"));
        Assert.Equal(CheckStatus.Pass, tag.Status);
        Assert.Contains("signed by dev@bramblecote.example with key SHA256:", tag.Message, StringComparison.Ordinal);
        Assert.Equal([".github/allowed_signers:2"], tag.Evidence!.Select(e => e.ToString()));
        Assert.True(GitAccepts("verify-commit", "HEAD"));
        Assert.Equal(CheckStatus.Pass, commit.Status);
    }

    [Fact]
    public void TagSignedByUnlistedKey_FailsLikeGit()
    {
        repo.SignedCommit("Release 2.4.0", stranger.PrivateKeyPath);
        repo.SignedTag("v2.4.0", "Release 2.4.0", stranger.PrivateKeyPath);

        var (tag, commit) = RunBoth("v2.4.0");

        Assert.False(GitAccepts("verify-tag", "v2.4.0"));
        Assert.Equal(CheckStatus.Fail, tag.Status);
        Assert.Contains("does not accept", tag.Message, StringComparison.Ordinal);
        Assert.False(GitAccepts("verify-commit", "HEAD"));
        Assert.Equal(CheckStatus.Fail, commit.Status);
    }

    [Fact]
    public void LightweightTag_FailsLikeGit()
    {
        repo.Commit("Release 2.4.0");
        repo.Tag("v2.4.0");

        var (tag, commit) = RunBoth("v2.4.0");

        Assert.False(GitAccepts("verify-tag", "v2.4.0"));
        Assert.Equal(CheckStatus.Fail, tag.Status);
        Assert.Contains("lightweight", tag.Message, StringComparison.Ordinal);
        Assert.False(GitAccepts("verify-commit", "HEAD"));
        Assert.Equal(CheckStatus.Fail, commit.Status);
    }

    [Fact]
    public void AnnotatedUnsignedTag_FailsLikeGit()
    {
        repo.Commit("Release 2.4.0");
        repo.AnnotatedTag("v2.4.0", "Release 2.4.0");

        var (tag, _) = RunBoth("v2.4.0");

        Assert.False(GitAccepts("verify-tag", "v2.4.0"));
        Assert.Equal(CheckStatus.Fail, tag.Status);
        Assert.Contains("not signed", tag.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void TagAlteredAfterSigning_FailsLikeGit()
    {
        repo.Commit("Release 2.4.0");
        repo.SignedTag("v2.4.0", "Release 2.4.0", maintainer.PrivateKeyPath);
        var altered = repo.Git("cat-file", "tag", "v2.4.0").Replace("Release 2.4.0", "Release 2.4.0 (edited)", StringComparison.Ordinal);
        var alteredId = repo.GitWithInput(altered, "mktag").Trim();
        repo.Git("update-ref", "refs/tags/v2.4.0", alteredId);

        var (tag, _) = RunBoth("v2.4.0");

        Assert.False(GitAccepts("verify-tag", "v2.4.0"));
        Assert.Equal(CheckStatus.Fail, tag.Status);
        Assert.Contains("carries an SSH signature that git does not accept", tag.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void AllowedSignersIsReadFromTheInspectedCommit()
    {
        // The tag's commit lists only the stranger; a later commit on main adds the maintainer. The inspected commit's
        // file is the one that counts.
        repo.Write(".github/allowed_signers", SshKeys.AllowedSigners(stranger)).Commit("Release 2.4.0");
        repo.SignedTag("v2.4.0", "Release 2.4.0", maintainer.PrivateKeyPath);
        repo.Write(".github/allowed_signers", SshKeys.AllowedSigners(maintainer, stranger)).Commit("Add maintainer key");

        var (tag, _) = RunBoth("v2.4.0");

        Assert.Equal(CheckStatus.Fail, tag.Status);
    }

    public void Dispose()
    {
        repo.Dispose();
        keys.Dispose();
    }

    private (Finding Tag, Finding Commit) RunBoth(string tagName)
    {
        using var snapshot = new GitSnapshotSource().Open(new SnapshotRequest(repo.Path, tagName, tagName));
        var parser = new ChecklistParser(CheckIds.All);
        var config = new RepositoryConfigParser(parser).Parse(RepositoryConfig.FileName, snapshot.Files.ReadText(RepositoryConfig.FileName)!);
        var model = new ProjectModel([], []);
        var now = new DateTimeOffset(2026, 12, 1, 0, 0, 0, TimeSpan.Zero);
        var release = ReleaseFactsBuilder.Build(snapshot, model, config, null, now);
        CheckContext Context() => new(snapshot, model, release, new CheckParameters(new Dictionary<string, ConfigNode>(), config), null, now);
        return (Assert.Single(new SigningTagCheck().Run(Context())), Assert.Single(new SigningCommitCheck().Run(Context())));
    }

    /// <summary>The reference: git itself, with the allowed-signers file of the inspected commit.</summary>
    private bool GitAccepts(string command, string target)
    {
        var file = Path.Combine(repo.GitDirectory, "reference_allowed_signers");
        File.WriteAllText(file, repo.Git("show", (command == "verify-tag" ? target + "^{}" : target) + ":.github/allowed_signers"));
        return repo.TryGit("-c", $"gpg.ssh.allowedSignersFile={file}", command, target).Succeeded;
    }
}
