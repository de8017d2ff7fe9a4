namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// What one evaluation could not evaluate, each naming file:line. Uses of undefined properties are kept aside and
/// reported only if no file defines the property at all: those would come from the environment, the command line
/// or the SDK, which a static read cannot know.
/// </summary>
internal sealed class EvaluationNotes
{
    private readonly List<string> notes = [];
    private readonly HashSet<string> seen = new(StringComparer.Ordinal);
    private readonly List<(string Name, string Note)> undefined = [];
    private int dropped;

    public void Add(string note)
    {
        if (notes.Count >= MsBuildLimits.MaxNotes)
        {
            dropped++;
        }
        else if (seen.Add(note))
        {
            notes.Add(note);
        }
    }

    public void Undefined(IEnumerable<string> names, SourceLocation where, string what)
    {
        foreach (var name in names.Distinct(StringComparer.OrdinalIgnoreCase))
        {
            undefined.Add((name, UndefinedNote(name, where, what)));
        }
    }

    public static string UndefinedNote(string name, SourceLocation where, string what) =>
        $"{where}: {what} uses $({name}), which no file of the repository sets (MSBuild would take it from the environment, the command line or the SDK); taken as empty";

    /// <summary>Names whose absence does not make a value uncertain.</summary>
    public static bool IsExempt(string name) => string.Equals(name, "TargetFramework", StringComparison.OrdinalIgnoreCase);

    public IReadOnlyList<string> Final(PropertyTable properties)
    {
        var result = new List<string>(notes);
        foreach (var (name, note) in undefined)
        {
            if (result.Count >= MsBuildLimits.MaxNotes)
            {
                dropped++;
            }
            else if (properties[name] is null && !IsExempt(name) && seen.Add(note))
            {
                result.Add(note);
            }
        }

        if (dropped > 0)
        {
            result.Add($"{dropped:N0} more notes of this evaluation are not listed (at most {MsBuildLimits.MaxNotes} are kept)");
        }

        return result;
    }
}
