using Readiness.Core.Configuration;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Checklists;

/// <summary>
/// A checklist kept in the inspected repository itself (<c>checklist: ci/ours.yml</c> in <c>.readiness.yml</c>),
/// read from the same commit as everything else, so the hook, the CLI and the service apply the same manual items.
/// </summary>
public static class RepositoryChecklist
{
    /// <summary>True when the configured value names a file rather than a checklist by name.</summary>
    public static bool IsPath(string value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return value.Contains('/', StringComparison.Ordinal)
            || value.EndsWith(".yml", StringComparison.OrdinalIgnoreCase)
            || value.EndsWith(".yaml", StringComparison.OrdinalIgnoreCase);
    }

    /// <summary>Parses the repository's checklist file; a missing file is an error at the configuration line.</summary>
    public static ChecklistDefinition Load(IFileTree files, string path, ConfigMark requestedAt, ChecklistParser parser)
    {
        ArgumentNullException.ThrowIfNull(files);
        ArgumentNullException.ThrowIfNull(parser);
        var normalized = path.Replace('\\', '/');
        while (normalized.StartsWith("./", StringComparison.Ordinal))
        {
            normalized = normalized[2..];
        }

        if (path.StartsWith('/') || normalized.Split('/').Contains(".."))
        {
            throw new ConfigurationException(requestedAt, $"checklist: '{ConfigQuote.Of(path)}' must be a path inside the repository");
        }

        var text = files.ReadText(normalized, YamlReader.MaxChars)
            ?? throw new ConfigurationException(requestedAt, $"checklist: '{ConfigQuote.Of(path)}' names no file at the inspected commit (a built-in name, or a path such as ci/checklist.yml)");
        return parser.Parse(normalized, text);
    }
}
