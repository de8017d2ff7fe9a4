namespace Readiness.Core.Checklists;

/// <summary>Several sources searched in order; the first that has a name wins.</summary>
public sealed class ChecklistSources(IReadOnlyList<IChecklistSource> sources) : IChecklistSource
{
    public IEnumerable<string> Names => sources.SelectMany(s => s.Names).Distinct(StringComparer.Ordinal);

    public (string File, string Text)? Find(string name)
    {
        foreach (var source in sources)
        {
            if (source.Find(name) is { } found)
            {
                return found;
            }
        }

        return null;
    }
}
