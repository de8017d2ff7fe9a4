using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Configuration;
using Readiness.Core.Engine;
using Readiness.Core.Reports;

namespace Readiness.Core.Tests.Checklists;

public sealed class ChecklistTests
{
    private static readonly ChecklistParser Parser = new(CheckIds.All);

    private static ChecklistResolver Resolver(Dictionary<string, string>? files = null) =>
        new(new TestChecklistSource(files ?? []), Parser, CheckCatalog.BuiltIn().DefaultSeverities);

    [Theory]
    [InlineData("library")]
    [InlineData("host-plugin")]
    [InlineData("strict")]
    public void BuiltInChecklist_ParsesAndResolves(string name)
    {
        var resolver = Resolver();
        var resolved = resolver.Resolve(resolver.Load(name));
        Assert.Equal(name, resolved.Name);
        Assert.Contains(resolved.Checks, c => c.Id == CheckIds.ChangelogHasEntry && c.Severity == Severity.Block);
        Assert.All(resolved.Checks, c => Assert.Contains(c.Id, CheckIds.All));
    }

    [Fact]
    public void HostPlugin_AddsHostChecksAndKeepsLibraryOnes()
    {
        var resolver = Resolver();
        var resolved = resolver.Resolve(resolver.Load("host-plugin"));
        Assert.Contains(resolved.Checks, c => c.Id == CheckIds.DepsHostCompileOnly && c.Severity == Severity.Block);
        Assert.Contains(resolved.Checks, c => c.Id == CheckIds.DepsHostVersionMarked && c.Severity == Severity.Warn);
        Assert.Contains(resolved.Checks, c => c.Id == CheckIds.SigningTag && c.Severity == Severity.Warn);
        Assert.Equal(["checklists/host-plugin.yml", "checklists/library.yml"], resolved.Sources);
    }

    [Fact]
    public void Strict_RaisesSigningToBlock()
    {
        var resolver = Resolver();
        var resolved = resolver.Resolve(resolver.Load("strict"));
        Assert.Equal(Severity.Block, resolved.Checks.Single(c => c.Id == CheckIds.SigningTag).Severity);
    }

    [Fact]
    public void Strict_RequiresTheRegistrysAnswer_ForItsBlockingRegistryChecks()
    {
        var resolver = Resolver();
        var resolved = resolver.Resolve(resolver.Load("strict"));
        foreach (var id in new[] { CheckIds.RegistryVersionFree, CheckIds.RegistryIdOwned, CheckIds.RegistryDependenciesPublished })
        {
            var planned = resolved.Checks.Single(c => c.Id == id);
            Assert.True(planned.With["registry-required"].AsBool("registry-required"), id);
        }

        Assert.False(resolved.Checks.Single(c => c.Id == CheckIds.RegistryAheadOfPublished).With.ContainsKey("registry-required"));
    }

    [Fact]
    public void UnknownKey_NamesFileLineAndColumn()
    {
        var e = Assert.Throws<ConfigurationException>(() => Parser.Parse("mine.yml", "name: mine\ncheks:\n  version.well-formed: {}\n"));
        Assert.Equal(new ConfigMark("mine.yml", 2, 1), e.Mark);
        Assert.Contains("unknown key 'cheks'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UnknownCheckId_IsAnError()
    {
        var e = Assert.Throws<ConfigurationException>(() => Parser.Parse("mine.yml", "name: mine\nchecks:\n  version.wellformed: { severity: block }\n"));
        Assert.Equal(3, e.Mark.Line);
        Assert.Equal(3, e.Mark.Column);
        Assert.Contains("version.wellformed", e.Message, StringComparison.Ordinal);
        Assert.Contains("did you mean 'version.well-formed'?", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void OldSettingsKey_IsAnErrorThatNamesTheNewOne()
    {
        var e = Assert.Throws<ConfigurationException>(() => Parser.Parse("mine.yml", "name: mine\nchecks:\n  changelog.present:\n    with: { changelog: NEWS.md }\n"));
        Assert.Equal(4, e.Mark.Line);
        Assert.Contains("'settings:'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void BadSeverity_IsAnErrorAtTheValue()
    {
        var e = Assert.Throws<ConfigurationException>(() => Parser.Parse("mine.yml", "name: mine\nchecks:\n  signing.tag: { severity: fatal }\n"));
        Assert.Equal(3, e.Mark.Line);
        Assert.Contains("fatal", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("name: a\nx: &anchor 1\ny: *anchor\n", "anchors")]
    [InlineData("name: a\ndescription: *nowhere\n", "aliases")]
    [InlineData("name: a\nchecks:\n  <<: {}\n", "merge keys")]
    [InlineData("name: a\nname: b\n", "duplicate key")]
    public void UnsafeOrAmbiguousYaml_IsRefused(string text, string expected)
    {
        var e = Assert.Throws<ConfigurationException>(() => Parser.Parse("bad.yml", text));
        Assert.Contains(expected, e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void DeepNesting_IsBounded()
    {
        var text = "name: a\ndescription: " + new string('[', 100) + new string(']', 100) + "\n";
        var e = Assert.Throws<ConfigurationException>(() => Parser.Parse("deep.yml", text));
        Assert.Contains("nesting", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ExtendsCycle_IsAnErrorNamingTheChain()
    {
        var files = new Dictionary<string, string>
        {
            ["a"] = "name: a\nextends: b\n",
            ["b"] = "name: b\nextends: a\n",
        };
        var resolver = Resolver(files);
        var e = Assert.Throws<ConfigurationException>(() => resolver.Resolve(resolver.Load("a")));
        Assert.Contains("a -> b -> a", e.Message, StringComparison.Ordinal);
        Assert.Equal("b.yml", e.Mark.File);
        Assert.Equal(2, e.Mark.Line);
    }

    [Fact]
    public void RepositoryOverrides_ChangeSeverityAndCanDropACheck()
    {
        var resolver = Resolver();
        var config = new RepositoryConfigParser(Parser).Parse(
            ".readiness.yml",
            "checks:\n  metadata.reproducible: { severity: warn }\n  changelog.links: { severity: off }\n");
        var resolved = resolver.Resolve(resolver.Load("library"), config);
        Assert.Equal(Severity.Warn, resolved.Checks.Single(c => c.Id == CheckIds.MetadataReproducible).Severity);
        Assert.DoesNotContain(resolved.Checks, c => c.Id == CheckIds.ChangelogLinks);
        Assert.Equal(".readiness.yml", resolved.Sources[0]);
    }

    [Fact]
    public void ManualItemsAndParameters_AreInherited()
    {
        var files = new Dictionary<string, string>
        {
            ["plugin"] = """
                name: plugin
                extends: host-plugin
                checks:
                  deps.host-compile-only:
                    severity: block
                    settings:
                      host-packages: ["Lanternfly.Host.*"]
                manual:
                  - id: soak
                    text: Called 1,000 times in one process without its memory growing.
                    severity: warn
                """,
        };
        var resolver = Resolver(files);
        var resolved = resolver.Resolve(resolver.Load("plugin"));
        var hostCheck = resolved.Checks.Single(c => c.Id == CheckIds.DepsHostCompileOnly);
        Assert.Equal(["Lanternfly.Host.*"], hostCheck.With["host-packages"].AsStrings("host-packages"));
        var soak = Assert.Single(resolved.Manual);
        Assert.Equal(("soak", Severity.Warn), (soak.Id, soak.Severity));
    }

    [Fact]
    public void RepositoryConfig_UnknownKeyAndBadTagPattern_AreErrors()
    {
        var parser = new RepositoryConfigParser(Parser);
        var unknown = Assert.Throws<ConfigurationException>(() => parser.Parse(".readiness.yml", "checklist: library\npublish_to: x\n"));
        Assert.Equal(2, unknown.Mark.Line);
        var pattern = Assert.Throws<ConfigurationException>(() => parser.Parse(".readiness.yml", "tag-pattern: release-1\n"));
        Assert.Contains("{version}", pattern.Message, StringComparison.Ordinal);
    }
}
