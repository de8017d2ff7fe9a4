using System.Text.RegularExpressions;
using Readiness.Core.Configuration;
using Readiness.Core.Engine;
using Readiness.Testing;

namespace Readiness.Core.Tests.Documentation;

/// <summary>
/// The settings a descriptor names (shown by <c>readiness explain</c> and on the check's page) are the ones its code
/// reads: read from each check's own source, and from the helpers it calls that read settings for it.
/// </summary>
public sealed partial class CheckSettingsTests
{
    /// <summary>Helpers that read a setting on a check's behalf, by the call that gives them away in the check's source.</summary>
    private static readonly (string Call, string Setting)[] Helpers =
    [
        ("RegistrySubjects.Unavailable", "registry-required"),
        ("ChangelogInput.Open", "changelog"),
        ("ChangelogFiles.Resolve", "changelog"),
        ("SignatureJudge.", "allowed-signers"),
    ];

    /// <summary>Settings only a checklist's <c>settings:</c> carries (not top-level keys of <c>.readiness.yml</c>).</summary>
    private static readonly string[] WithOnly = ["allow-four-parts"];

    [Fact]
    public void EveryCheck_NamesTheSettingsItsCodeReads_AndOnlyKnownOnes()
    {
        var sources = Directory.GetFiles(Path.Combine(RepositoryRoot.Path, "src", "Readiness.Core", "Checks"), "*.cs", SearchOption.AllDirectories)
            .ToDictionary(f => Path.GetFileNameWithoutExtension(f)!, File.ReadAllText, StringComparer.Ordinal);
        var problems = new List<string>();
        foreach (var check in CheckCatalog.BuiltIn().Checks)
        {
            var d = check.Descriptor;
            var source = sources[check.GetType().Name];
            var read = ParameterRead().Matches(source).Select(m => m.Groups["key"].Value)
                .Concat(Helpers.Where(h => source.Contains(h.Call, StringComparison.Ordinal)).Select(h => h.Setting))
                .ToHashSet(StringComparer.Ordinal);
            problems.AddRange(read.Except(d.Settings).Select(k => $"{d.Id} reads '{k}' but its descriptor does not name it"));
            problems.AddRange(d.Settings.Where(k => !RepositoryConfigParser.Keys.Contains(k) && !WithOnly.Contains(k))
                .Select(k => $"{d.Id} names '{k}', which is no setting"));
        }

        Assert.Empty(problems);
        Assert.Contains("registry-required", CheckCatalog.BuiltIn().Find("registry.version-free")!.Descriptor.Settings);
    }

    [GeneratedRegex("""Parameters\.[A-Za-z]+\("(?<key>[a-z-]+)"\)""")]
    private static partial Regex ParameterRead();
}
