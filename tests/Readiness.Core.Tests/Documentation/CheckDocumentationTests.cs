using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Engine;
using Readiness.Testing;

namespace Readiness.Core.Tests.Documentation;

public sealed class CheckDocumentationTests
{
    private static readonly CheckCatalog Catalog = CheckCatalog.BuiltIn();

    private static IReadOnlyList<ResolvedChecklist> BuiltIns()
    {
        var resolver = new ChecklistResolver(new BuiltInChecklists(), new ChecklistParser(CheckIds.All), Catalog.DefaultSeverities);
        return new BuiltInChecklists().Names.Select(n => resolver.Resolve(resolver.Load(n))).ToList();
    }

    [Fact]
    public void EveryCheck_HasACurrentDocumentationPage()
    {
        var checklists = BuiltIns();
        var stale = new List<string>();
        foreach (var check in Catalog.Checks)
        {
            var path = Path.Combine(RepositoryRoot.Path, "checklists", "checks", check.Descriptor.Id + ".md");
            var expected = CheckDocumentation.Page(check, checklists);
            if (RepositoryRoot.Updating)
            {
                File.WriteAllText(path, expected);
            }

            if (!File.Exists(path) || File.ReadAllText(path).ReplaceLineEndings("\n") != expected)
            {
                stale.Add(check.Descriptor.Id);
            }
        }

        Assert.True(stale.Count == 0, $"missing or stale pages (regenerate: DEVELOPERS.md): {string.Join(", ", stale)}");
    }

    [Fact]
    public void CheckIndex_IsCurrent()
    {
        var path = Path.Combine(RepositoryRoot.Path, "checklists", "README.md");
        var expected = CheckDocumentation.Index(Catalog);
        if (RepositoryRoot.Updating)
        {
            File.WriteAllText(path, expected);
        }

        Assert.True(File.Exists(path) && File.ReadAllText(path).ReplaceLineEndings("\n") == expected, "checklists/README.md is stale: regenerate it (DEVELOPERS.md)");
    }

    [Fact]
    public void Core_ReferencesNoOtherProjectOfTheSolution()
    {
        // style.md habit 3: dependencies point one way; Core knows nothing of CLI, service, registry client, git or rendering.
        var references = typeof(ICheck).Assembly.GetReferencedAssemblies().Select(a => a.Name!).ToList();
        Assert.DoesNotContain(references, r => r.StartsWith("Readiness.", StringComparison.Ordinal));
        Assert.DoesNotContain(references, r => r is "LibGit2Sharp" or "NuGet.Protocol" or "Octokit" or "System.CommandLine");
        var project = File.ReadAllText(Path.Combine(RepositoryRoot.Path, "src", "Readiness.Core", "Readiness.Core.csproj"));
        Assert.DoesNotContain("ProjectReference", project, StringComparison.Ordinal);
    }
}
