using System.Text.RegularExpressions;
using Readiness.Cli.Demo;
using Readiness.Core.Checks;
using Readiness.Testing;

namespace Readiness.Cli.Tests;

/// <summary>
/// End-to-end cases that hold the program as shipped to the code as written: each case runs the <c>readiness</c>
/// executable (the published, ahead-of-time compiled one when <c>READINESS_TEST_PROGRAM</c> names it, else this build's
/// apphost) and the same command in-process (JIT, the tested code), on the same real repository, and asks for the same
/// exit code, output and error text. A defect only the trimmed native build has (a check dropped, a signature lost,
/// JSON or YAML that needs reflection) shows as a difference.
/// </summary>
public sealed class PublishedProgramTests : IClassFixture<PublishedProgramTests.Repositories>
{
    private readonly Repositories repositories;

    public PublishedProgramTests(Repositories repositories) => this.repositories = repositories;

    public static TheoryData<string, string[]> Cases()
    {
        var data = new TheoryData<string, string[]>();
        foreach (var format in new[] { "text", "markdown", "json", "html", "sarif", "junit" })
        {
            data.Add("ready", ["check", "--offline", "--format", format]);
            data.Add("demo", ["check", "--offline", "--format", format]);
            data.Add("signed", ["check", "--offline", "--checklist", "strict", "--format", format]);
        }

        foreach (var fixture in new[] { "ready", "demo", "signed", "bare" })
        {
            data.Add(fixture, ["check", "--offline", "--format", "json", "--fail-on", "warn"]);
        }

        data.Add("ready", ["check", "--format", "json", "--registry", "FEED", "--no-cache"]);
        data.Add("demo", ["check", "--format", "markdown", "--registry", "FEED", "--no-cache"]);
        data.Add("ready", ["check", "--offline", "--ref", "v1.2.0", "--format", "json"]);
        data.Add("ready", ["check", "--offline", "--worktree", "--format", "json"]);
        data.Add("ready", ["check", "--offline", "--version", "1.3.0", "--format", "json"]);
        data.Add("ready", ["check", "--offline", "--tag", "v9.9.9"]);
        data.Add("ready", ["check", "--offline", "--ref", "no-such-ref"]);
        data.Add("ready", ["check", "--offline", "--checklist", "no-such-checklist"]);
        data.Add("ready", ["check", "--offline", "--bogus"]);
        data.Add("empty", ["check", "--offline"]);
        data.Add("ready", ["checklist", "list"]);
        data.Add("demo", ["checklist", "list"]);
        data.Add("ready", ["checklist", "show", "library"]);
        data.Add("ready", ["checklist", "show", "strict"]);
        data.Add("ready", ["checklist", "show", "host-plugin"]);
        data.Add("ready", ["checklist", "validate", ".readiness.yml"]);
        data.Add("ready", ["hook", "status"]);
        data.Add("ready", ["--help"]);
        data.Add("ready", ["check", "--help"]);
        data.Add("ready", ["explain", "no.such-check"]);
        foreach (var id in CheckIds.All.Order(StringComparer.Ordinal))
        {
            data.Add("ready", ["explain", id]);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public async Task Program_AnswersAsTheCodeDoes(string fixture, string[] args)
    {
        var directory = repositories.PathOf(fixture);
        var arguments = args.Select(a => a == "FEED" ? repositories.Feed.ServiceIndexUrl : a).ToArray();
        var environment = new Dictionary<string, string>();

        var expected = await CliHarness.RunInProcessAsync(directory, string.Empty, environment, arguments);
        var actual = await CliHarness.RunProcessAsync(CliHarness.Program, directory, string.Empty, environment, arguments);

        Assert.Equal(Normalize(expected.Out), Normalize(actual.Out));
        Assert.Equal(Normalize(expected.Error), Normalize(actual.Error));
        Assert.Equal(expected.Exit, actual.Exit);
    }

    /// <summary>
    /// What differs between two runs: the time a report was made (JSON generatedAt, Markdown and HTML footers, SARIF
    /// invocation times, JUnit timestamps — all today's date, unlike every date of the fixtures), and the program name
    /// in help (in-process it is the test host's).
    /// </summary>
    private static string Normalize(string text) =>
        Regex.Replace(text, Regex.Escape(DateTime.UtcNow.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture)) + "[T ][0-9]{2}:[0-9]{2}:[0-9]{2}(\\.[0-9]+)?", "(now)", RegexOptions.None, TimeSpan.FromSeconds(5))
            .Replace("\n  testhost ", "\n  readiness ", StringComparison.Ordinal);

    /// <summary>The repositories the cases read, made once: nothing in a case writes to them.</summary>
    public sealed class Repositories : IDisposable
    {
        private readonly SshKeys keys = new();
        private readonly TestRepository ready = SampleLibrary.ReadyRelease("1.2.0");
        private readonly TestRepository signed = TestRepository.Create();
        private readonly TestRepository bare;
        private readonly TempDirectory folder = new();

        public Repositories()
        {
            var maintainer = keys.Create();
            signed.WriteLibrary("2.0.0", "2026-11-20")
                .Write(".readiness.yml", "allowed-signers: .github/allowed_signers\n")
                .Write(".github/allowed_signers", "# Bramblecote maintainers\n" + SshKeys.AllowedSigners(maintainer));
            signed.SignedCommit("Release 2.0.0", maintainer.PrivateKeyPath);
            signed.SignedTag("v2.0.0", "Bramble.Sketches 2.0.0", maintainer.PrivateKeyPath);
            bare = signed.CloneBare();
            ready.Write("NOTES.md", "uncommitted\n");
            DemoRepository.Create(folder.Combine("demo"));
            Directory.CreateDirectory(folder.Combine("empty"));
            Feed = LocalHttpFeed.Start();
            foreach (var version in new[] { "1.0.0", "1.1.0" })
            {
                Feed.Add("Bramble.Sketches", version);
            }
        }

        public LocalHttpFeed Feed { get; }

        public string PathOf(string fixture) => fixture switch
        {
            "ready" => ready.Path,
            "signed" => signed.Path,
            "bare" => bare.Path,
            "demo" => folder.Combine("demo"),
            "empty" => folder.Combine("empty"),
            _ => throw new ArgumentOutOfRangeException(nameof(fixture), fixture, "no such fixture"),
        };

        public void Dispose()
        {
            Feed.Dispose();
            ready.Dispose();
            signed.Dispose();
            bare.Dispose();
            folder.Dispose();
            keys.Dispose();
        }
    }
}
