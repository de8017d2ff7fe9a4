namespace Readiness.Core.Checklists;

/// <summary>Checklists in a folder on disk (an organisation's own), one <c>NAME.yml</c> each.</summary>
public sealed class FolderChecklists(string folder) : IChecklistSource
{
    public IEnumerable<string> Names =>
        Directory.Exists(folder)
            ? Directory.EnumerateFiles(folder, "*.yml").Select(Path.GetFileNameWithoutExtension).OfType<string>().Order(StringComparer.Ordinal)
            : [];

    public (string File, string Text)? Find(string name)
    {
        if (name.Length == 0 || name.Any(c => !(char.IsAsciiLetterOrDigit(c) || c is '-' or '_' or '.')) || name.Contains(".."))
        {
            return null;
        }

        var path = Path.Combine(folder, name + ".yml");
        if (!File.Exists(path))
        {
            return null;
        }

        var info = new FileInfo(path);
        if (info.Length > Configuration.YamlReader.MaxChars)
        {
            throw new Configuration.ConfigurationException(new Configuration.ConfigMark(path, 1, 1), "checklist file too large");
        }

        return (path, File.ReadAllText(path));
    }
}
