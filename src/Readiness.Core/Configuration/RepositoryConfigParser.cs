using Readiness.Core.Checklists;

namespace Readiness.Core.Configuration;

/// <summary>Parses <c>.readiness.yml</c>. Unknown keys are errors naming file, line and column.</summary>
public sealed class RepositoryConfigParser(ChecklistParser checklists)
{
    /// <summary>Every top-level key the file may hold (checklists.md, checks.md). Keep sorted.</summary>
    public static readonly IReadOnlyList<string> Keys =
    [
        "allowed-signers",
        "changelog",
        "checklist",
        "checks",
        "host-marker",
        "host-packages",
        "known-ids",
        "maintenance-lines",
        "owners",
        "packages",
        "projects-required",
        "publish-to",
        "registry-required",
        "registry-timeout",
        "release-branches",
        "require-targets",
        "strong-name-key-private",
        "tag-pattern",
    ];

    public RepositoryConfig Parse(string file, string text)
    {
        var root = YamlReader.Read(file, text).AsMap("the repository configuration");
        root.RejectUnknownKeys(Keys, file);
        var values = new Dictionary<string, ConfigNode>(StringComparer.Ordinal);
        foreach (var entry in root.Entries.Where(e => e.Key != "checks"))
        {
            values[entry.Key] = entry.Value;
        }

        var tagPattern = root.Find("tag-pattern")?.Value.AsString("tag-pattern") ?? RepositoryConfig.DefaultTagPattern;
        if (!tagPattern.Contains("{version}", StringComparison.Ordinal))
        {
            throw new ConfigurationException(root.Find("tag-pattern")!.Value.Mark, "tag-pattern must contain {version}");
        }

        return new RepositoryConfig(
            root.Find("checklist")?.Value.AsString("checklist"),
            tagPattern,
            values,
            root.Find("checks") is { } checks ? checklists.ParseChecks(checks.Value) : [],
            file);
    }
}
