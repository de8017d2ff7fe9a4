using Readiness.Testing;

namespace Readiness.Cli.Tests;

public sealed class OtherCommandsTests
{
    [Fact]
    public async Task Demo_BuildsTheInventedRepository_ReportsFailuresAndWritesHtml()
    {
        using var folder = new TempDirectory();
        var (exit, output, error) = await CliHarness.RunAsync(folder.Path, "demo", "--keep", "demo");
        Assert.True(exit == 0, error);
        Assert.Contains("NOT READY", output, StringComparison.Ordinal);
        Assert.Contains("changelog.has-entry", output, StringComparison.Ordinal);
        Assert.Contains("version.matches-tag", output, StringComparison.Ordinal);
        var html = Path.Combine(folder.Path, "demo", "readiness-report.html");
        Assert.True(File.Exists(html));
        Assert.Contains("Bramble.Sketches", File.ReadAllText(html), StringComparison.Ordinal);

        // The demo repository is a real git repository: git itself lists the release tags (reference: git tag).
        var tags = GitCli.Run(Path.Combine(folder.Path, "demo", "bramble-sketches"), ["tag", "--list"]);
        Assert.Equal(["v2.3.0", "v2.3.1", "v2.4.0"], tags.Split('\n', StringSplitOptions.RemoveEmptyEntries));
    }

    [Fact]
    public async Task Explain_KnownCheck_PrintsWhyFixAndStandard()
    {
        var (exit, output, _) = await CliHarness.RunAsync(Path.GetTempPath(), "explain", "changelog.has-entry");
        Assert.Equal(0, exit);
        Assert.Contains("https://keepachangelog.com/en/1.1.0/", output, StringComparison.Ordinal);
        Assert.Contains("How to fix", output, StringComparison.Ordinal);
        Assert.Contains("Settings (in .readiness.yml, or under the check's settings: in a checklist):\n  changelog\n", output.ReplaceLineEndings("\n"), StringComparison.Ordinal);

        var (_, registry, _) = await CliHarness.RunAsync(Path.GetTempPath(), "explain", "registry.id-owned");
        Assert.Contains("known-ids, owners, registry-required", registry, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Explain_UnknownCheck_ExitsTwo()
    {
        var (exit, _, error) = await CliHarness.RunAsync(Path.GetTempPath(), "explain", "changelog.nope");
        Assert.Equal(2, exit);
        Assert.Contains("version.well-formed", error, StringComparison.Ordinal);

        var (_, _, typo) = await CliHarness.RunAsync(Path.GetTempPath(), "explain", "changelog.has-entyr");
        Assert.Contains("did you mean 'changelog.has-entry'?", typo, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Explain_Page_PrintsTheCheckPageCarriedInsideTheProgram()
    {
        // The page comes from the program's resources, not from a source checkout: compare with the file it was built from.
        var (exit, output, _) = await CliHarness.RunAsync(Path.GetTempPath(), "explain", "license.declared", "--page");
        Assert.Equal(0, exit);
        var source = File.ReadAllText(Path.Combine(Readiness.Testing.RepositoryRoot.Path, "checklists", "checks", "license.declared.md"));
        Assert.Equal(source.ReplaceLineEndings("\n"), output.ReplaceLineEndings("\n"));
        Assert.All(Core.Engine.CheckCatalog.BuiltIn().Checks.Select(c => c.Descriptor.Id), id => Assert.NotNull(Commands.ExplainCommand.CheckPage(id)));
    }

    [Fact]
    public async Task ChecklistValidate_ReportsLineAndColumn()
    {
        using var folder = new TempDirectory();
        File.WriteAllText(folder.Combine("mine.yml"), "name: mine\nextends: library\nchecks:\n  signing.tag: { severity: loud }\n");
        var (exit, _, error) = await CliHarness.RunAsync(folder.Path, "checklist", "validate", "mine.yml");
        Assert.Equal(2, exit);
        Assert.Contains("mine.yml:4:", error, StringComparison.Ordinal);
        File.WriteAllText(folder.Combine("ok.yml"), "name: ok\nextends: host-plugin\nmanual:\n  - id: soak\n    text: Soak test\n");
        var (okExit, okOut, _) = await CliHarness.RunAsync(folder.Path, "checklist", "validate", "ok.yml");
        Assert.Equal(0, okExit);
        Assert.Contains("1 manual", okOut, StringComparison.Ordinal);
    }

    [Fact]
    public async Task ChecklistShowAndList_ResolveExtends()
    {
        var (exit, output, _) = await CliHarness.RunAsync(Path.GetTempPath(), "checklist", "show", "host-plugin");
        Assert.Equal(0, exit);
        Assert.Contains("deps.host-compile-only: { severity: block", output, StringComparison.Ordinal);
        Assert.Contains("changelog.has-entry", output, StringComparison.Ordinal);
        var (listExit, list, _) = await CliHarness.RunAsync(Path.GetTempPath(), "checklist", "list");
        Assert.Equal(0, listExit);
        Assert.Contains("strict", list, StringComparison.Ordinal);
    }
}
