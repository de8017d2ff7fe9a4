using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Core.Reports;
using Readiness.Core.Secrets;
using Readiness.Testing;

namespace Readiness.Core.Tests.Secrets;

public sealed class ReportRedactorTests
{
    [Fact]
    public void AFlaggedSecret_IsRedactedWhereverAnotherCheckQuotesIt()
    {
        var (_, token, _) = SecretFixtures.Tokens().First();
        var files = new InMemoryFileTree().Add("Directory.Build.props", $"<Project><PropertyGroup><PackageLicenseExpression>{token}</PackageLicenseExpression></PropertyGroup></Project>");
        var standard = new StandardReference("s", "https://standard.example/");
        var report = new Report(
            new ReportSubject("repo", new string('a', 40), "HEAD", "v1.0.0", token, "library", InspectionKind.Commit),
            false,
            new ReportSummary(0, 2, 0, 0, 0, 2),
            [
                new CheckResult(CheckIds.SecretsNoneCommitted, "t", CheckStatus.Fail, Severity.Block, null, "Directory.Build.props (line 1) holds a token", null, [new Evidence("Directory.Build.props", 1)], standard),
                new CheckResult(CheckIds.LicenseDeclared, "t", CheckStatus.Fail, Severity.Block, token, $"'{token}' is not an SPDX expression", $"replace {token}", [], standard),
            ],
            DateTimeOffset.UnixEpoch,
            [$"note about {token}"]);

        var redacted = ReportRedactor.Redact(report, files);

        var all = string.Join("\n", redacted.Results.SelectMany(r => (string?[])[r.Message, r.Hint, r.Package]).Concat(redacted.Notes).Append(redacted.Subject.Version));
        Assert.DoesNotContain(token, all, StringComparison.Ordinal);
        Assert.Contains(ReportRedactor.Replacement, redacted.Results[1].Message, StringComparison.Ordinal);
        Assert.Equal(report.Results[0].Message, redacted.Results[0].Message);
    }

    [Fact]
    public void NothingFlagged_LeavesTheReportAsItIs()
    {
        var report = new Report(
            new ReportSubject("repo", new string('a', 40), "HEAD", null, "1.0.0", "library", InspectionKind.Commit),
            true,
            new ReportSummary(0, 0, 0, 0, 0, 0),
            [],
            DateTimeOffset.UnixEpoch,
            []);

        Assert.Same(report, ReportRedactor.Redact(report, new InMemoryFileTree()));
    }

    [Theory]
    [InlineData("tag-patern", "tag-patern")]
    [InlineData("a-key-that-is-rather-long-indeed", "a-ke… (32 characters, not shown)")]
    public void ConfigurationErrors_QuoteShortTextInFull_AndOnlyAPrefixOfLongText(string text, string quoted)
    {
        Assert.Equal(quoted, ConfigQuote.Of(text));
    }

    [Fact]
    public void AnUnknownKeyThatIsASecret_IsNeverEchoed()
    {
        var (_, token, _) = SecretFixtures.Tokens().First();
        var parser = new RepositoryConfigParser(new Core.Checklists.ChecklistParser(CheckIds.All));

        var error = Assert.Throws<ConfigurationException>(() => parser.Parse(RepositoryConfig.FileName, $"{token}: 1\n"));

        Assert.DoesNotContain(token, error.Message, StringComparison.Ordinal);
        Assert.Contains("not shown", error.Message, StringComparison.Ordinal);
    }
}
