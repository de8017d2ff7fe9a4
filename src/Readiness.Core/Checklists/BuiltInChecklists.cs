using System.Reflection;

namespace Readiness.Core.Checklists;

/// <summary>The checklists shipped with the tool (<c>checklists/*.yml</c>, embedded in this assembly).</summary>
public sealed class BuiltInChecklists : IChecklistSource
{
    private const string Prefix = "Readiness.Checklists.";
    private readonly Assembly assembly = typeof(BuiltInChecklists).Assembly;

    public IEnumerable<string> Names =>
        assembly.GetManifestResourceNames()
            .Where(n => n.StartsWith(Prefix, StringComparison.Ordinal) && n.EndsWith(".yml", StringComparison.Ordinal))
            .Select(n => n[Prefix.Length..^4])
            .Order(StringComparer.Ordinal);

    public (string File, string Text)? Find(string name)
    {
        using var stream = assembly.GetManifestResourceStream(Prefix + name + ".yml");
        if (stream is null)
        {
            return null;
        }

        using var reader = new StreamReader(stream);
        return ($"checklists/{name}.yml", reader.ReadToEnd());
    }
}
