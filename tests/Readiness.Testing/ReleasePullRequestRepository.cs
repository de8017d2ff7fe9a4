namespace Readiness.Testing;

/// <summary>
/// The demo library's repository (scenario.md) with a release branch and a pull request preparing 2.4.0, pushed to
/// a bare origin that the service fetches by its file:// clone URL. Pull request heads are published under
/// <c>refs/pull/N/head</c> as the forge does.
/// </summary>
public sealed class ReleasePullRequestRepository : IDisposable
{
    public const string FullName = "bramblecote/sketches";
    public const string ReleaseBranch = "release/2.4";
    public const string PullRequestBranch = "prepare-2.4.0";

    private ReleasePullRequestRepository(TestRepository work, TestRepository origin)
    {
        Work = work;
        Origin = origin;
    }

    public TestRepository Work { get; }

    public TestRepository Origin { get; }

    public string CloneUrl => new Uri(Origin.Path).AbsoluteUri;

    public static string Project(string version) => $"""
        <Project Sdk="Microsoft.NET.Sdk">
          <PropertyGroup>
            <TargetFrameworks>netstandard2.0;net8.0;net10.0</TargetFrameworks>
            <PackageId>Bramble.Sketches</PackageId>
            <Version>{version}</Version>
            <Authors>Bramblecote Software</Authors>
            <Description>Streaming quantile and distinct-count sketches.</Description>
            <PackageLicenseExpression>MIT</PackageLicenseExpression>
            <RepositoryUrl>https://git.example/bramblecote/sketches</RepositoryUrl>
          </PropertyGroup>
        </Project>
        """;

    public static string Changelog(params string[] versions) =>
        "# Changelog\n\nAll notable changes to this project are documented in this file.\n\n## [Unreleased]\n\n"
        + string.Concat(versions.Select(v => $"## [{v}] - 2026-11-{(v == "2.4.0" ? "20" : "02")}\n\n### Added\n\n- Sketches {v}.\n\n"));

    /// <summary>main and release/2.4 at 2.3.1 with <paramref name="baseConfig"/>; the pull request branch bumps to 2.4.0.</summary>
    public static ReleasePullRequestRepository Create(string baseConfig = "checklist: library\n")
    {
        var work = TestRepository.Create();
        work.Write(".readiness.yml", baseConfig)
            .Write("src/Bramble.Sketches/Bramble.Sketches.csproj", Project("2.3.1"))
            .Write("src/Bramble.Sketches/Sketch.cs", "namespace Bramble.Sketches;\n\npublic sealed class Sketch\n{\n}\n")
            .Write("CHANGELOG.md", Changelog("2.3.1"))
            .Write("LICENSE", "MIT License\n\nCopyright (c) 2026 Bramblecote Software\n")
            .Write("README.md", "# Bramble.Sketches\n")
            .Commit("Bramble.Sketches 2.3.1");
        work.AnnotatedTag("v2.3.1", "Release 2.3.1");
        work.Branch(ReleaseBranch);
        work.Branch(PullRequestBranch, ReleaseBranch).Checkout(PullRequestBranch);
        work.Write("src/Bramble.Sketches/Bramble.Sketches.csproj", Project("2.4.0"))
            .Write("CHANGELOG.md", Changelog("2.4.0", "2.3.1"))
            .Commit("Prepare 2.4.0");
        var origin = work.CloneBare();
        var repository = new ReleasePullRequestRepository(work, origin);
        repository.Publish(1, PullRequestBranch);
        return repository;
    }

    /// <summary>Pushes <paramref name="branch"/> to the origin and points pull request <paramref name="number"/> at it.</summary>
    public string Publish(int number, string branch)
    {
        var sha = Work.Sha(branch);
        Work.Git("push", "-q", "--force", Origin.Path, $"refs/heads/{branch}:refs/heads/{branch}");
        Origin.Git("update-ref", $"refs/pull/{number}/head", sha);
        return sha;
    }

    /// <summary>Commits on the pull request branch and publishes it.</summary>
    public string Push(int number, string path, string text, string message)
    {
        Work.Checkout(PullRequestBranch);
        Work.Write(path, text).Commit(message);
        return Publish(number, PullRequestBranch);
    }

    public string Payload(string action, int number, string headSha, string baseRef = ReleaseBranch, string? body = null, IEnumerable<string>? labels = null) =>
        WebhookPayloads.PullRequest(action, number, FullName, CloneUrl, headSha, baseRef, labels, body);

    public void Dispose()
    {
        Origin.Dispose();
        Work.Dispose();
    }
}
