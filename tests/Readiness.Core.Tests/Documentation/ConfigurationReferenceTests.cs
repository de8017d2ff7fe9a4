using System.Text.RegularExpressions;
using Readiness.Core.Configuration;
using Readiness.Testing;

namespace Readiness.Core.Tests.Documentation;

/// <summary>checklists/configuration.md documents every key the parser accepts and every variable the code reads.</summary>
public sealed partial class ConfigurationReferenceTests
{
    private static readonly string Root = RepositoryRoot.Path;

    private static string Reference => File.ReadAllText(System.IO.Path.Combine(Root, "checklists", "configuration.md"));

    [Fact]
    public void EveryRepositoryKey_HasARowWithTypeDefaultAndExample()
    {
        foreach (var key in RepositoryConfigParser.Keys)
        {
            var row = Reference.Split('\n').FirstOrDefault(l => l.StartsWith($"| `{key}` |", StringComparison.Ordinal));
            Assert.True(row is not null, $"checklists/configuration.md has no row for {key}");
            Assert.True(row!.Split('|', StringSplitOptions.RemoveEmptyEntries).Length >= 5, $"the row for {key} needs type, default, example and meaning");
        }
    }

    [Fact]
    public void EveryEnvironmentVariableTheProgramReads_IsDocumented()
    {
        var read = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var file in Directory.EnumerateFiles(System.IO.Path.Combine(Root, "src"), "*.cs", SearchOption.AllDirectories)
                     .Where(f => !f.Contains($"{System.IO.Path.DirectorySeparatorChar}obj{System.IO.Path.DirectorySeparatorChar}", StringComparison.Ordinal)
                         && !f.Contains($"{System.IO.Path.DirectorySeparatorChar}Readiness.Service{System.IO.Path.DirectorySeparatorChar}", StringComparison.Ordinal)))
        {
            foreach (Match m in EnvironmentRead().Matches(File.ReadAllText(file)))
            {
                read.Add(m.Groups["name"].Value);
            }
        }

        foreach (Match m in ShellVariable().Matches(File.ReadAllText(System.IO.Path.Combine(Root, "hooks", "pre-push"))))
        {
            read.Add(m.Groups["name"].Value);
        }

        read.Remove("PATH");
        Assert.NotEmpty(read);
        var missing = read.Where(name => !Reference.Contains($"| `{name}` |", StringComparison.Ordinal)).ToList();
        Assert.True(missing.Count == 0, "undocumented environment variables: " + string.Join(", ", missing));
    }

    [GeneratedRegex("""(?:Env|GetEnvironmentVariable|EnvironmentVariable)\(\s*"(?<name>[A-Z][A-Z0-9_]+)"|"(?<name>READINESS_[A-Z0-9_]+)"|environment\["(?<name>[A-Z][A-Z0-9_]+)"\](?!\s*=[^=])""")]
    private static partial Regex EnvironmentRead();

    [GeneratedRegex(@"\$\{?(?<name>READINESS_[A-Z0-9_]+)")]
    private static partial Regex ShellVariable();
}
