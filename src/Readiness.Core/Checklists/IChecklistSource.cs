namespace Readiness.Core.Checklists;

/// <summary>Finds checklist files by name (built-in, an organisation's folder, a service).</summary>
public interface IChecklistSource
{
    /// <summary>The names this source offers.</summary>
    IEnumerable<string> Names { get; }

    /// <summary>The checklist's file name (for messages) and YAML text, or null when this source has no such name.</summary>
    (string File, string Text)? Find(string name);
}
