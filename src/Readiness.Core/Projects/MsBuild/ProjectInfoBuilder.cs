using Readiness.Core.Versioning;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// Turns evaluations into a <see cref="ProjectInfo"/>: the properties files declare (unescaped), per-target
/// properties, and items merged across target frameworks (an item present for only some targets carries the target).
/// </summary>
internal static class ProjectInfoBuilder
{
    private const string SdkDefaultVersion = "1.0.0";

    public static ProjectInfo Build(string path, Evaluation main, IReadOnlyList<(string Tfm, Evaluation Evaluation)> targets, IEnumerable<string> extraNotes)
    {
        var properties = Report(path, main);
        var perTarget = new Dictionary<string, IReadOnlyDictionary<string, PropertyValue>>(StringComparer.OrdinalIgnoreCase);
        foreach (var (tfm, evaluation) in targets)
        {
            perTarget[tfm] = ReferenceEquals(evaluation, main) ? properties : Report(path, evaluation);
        }

        var multi = targets.Count > 0 && !ReferenceEquals(targets[0].Evaluation, main);
        var items = multi ? Merge(targets) : main.Items;
        var notes = new List<string>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var note in main.Unevaluated.Concat(targets.SelectMany(t => t.Evaluation.Unevaluated)).Concat(extraNotes))
        {
            if (seen.Add(note))
            {
                notes.Add(note);
            }
        }

        return new ProjectInfo(
            path,
            properties,
            perTarget,
            items.PackageReferences,
            items.ProjectReferences,
            items.PackItems,
            items.CentralVersions,
            main.Imports,
            notes);
    }

    /// <summary>
    /// The properties files set. When the SDK's own order makes the package version differ from what those
    /// declarations give under the usual precedence (a VersionPrefix in Directory.Build.targets, read after the SDK
    /// computed Version; a VersionSuffix without VersionPrefix), the SDK-computed Version/PackageVersion are added.
    /// </summary>
    private static Dictionary<string, PropertyValue> Report(string path, Evaluation evaluation)
    {
        var table = evaluation.Properties;
        var result = new Dictionary<string, PropertyValue>(StringComparer.OrdinalIgnoreCase);
        foreach (var entry in table.All.Where(e => e.Origin == PropertyOrigin.File))
        {
            result[entry.Name] = Value(entry, table);
        }

        if (!evaluation.DotNetSdk)
        {
            return result;
        }

        var truth = Escaping.Unescape(table.Value("PackageVersion"));
        foreach (var name in new[] { "Version", "PackageVersion" })
        {
            if (Declared(path, result) == truth)
            {
                break;
            }

            if (table[name] is { Origin: PropertyOrigin.Sdk } computed)
            {
                result[name] = Value(computed, table);
            }
        }

        return result;
    }

    private static string Declared(string path, Dictionary<string, PropertyValue> properties) =>
        DeclaredVersion.Of(new ProjectInfo(path, properties, new Dictionary<string, IReadOnlyDictionary<string, PropertyValue>>(), [], [], [], [], [], [])).Value
        ?? SdkDefaultVersion;

    private static PropertyValue Value(PropertyEntry entry, PropertyTable table)
    {
        var unevaluated = entry.Unevaluated;
        if (unevaluated is null && entry.Undefined is { } names
            && names.FirstOrDefault(n => table[n] is null && !EvaluationNotes.IsExempt(n)) is { } missing)
        {
            unevaluated = EvaluationNotes.UndefinedNote(missing, entry.Location, $"property {entry.Name}");
        }

        return new PropertyValue(entry.Name, Escaping.Unescape(entry.Value), entry.Location, unevaluated, entry.ComputedBy);
    }

    private static ItemSet Merge(IReadOnlyList<(string Tfm, Evaluation Evaluation)> targets)
    {
        var order = new List<(string, int, string)>();
        var byKey = new Dictionary<(string, int, string), List<PackageReferenceItem>>();
        foreach (var (tfm, evaluation) in targets)
        {
            var seen = new HashSet<(string, int, string)>();
            foreach (var reference in evaluation.Items.PackageReferences)
            {
                var key = (reference.Location.Path, reference.Location.Line, reference.Id.ToUpperInvariant());
                if (!seen.Add(key))
                {
                    continue;
                }

                if (!byKey.TryGetValue(key, out var list))
                {
                    list = [];
                    byKey[key] = list;
                    order.Add(key);
                }

                list.Add(reference with { TargetFramework = tfm });
            }
        }

        var references = new List<PackageReferenceItem>();
        foreach (var key in order)
        {
            var list = byKey[key];
            if (list.Count == targets.Count && list.All(r => Same(r, list[0])))
            {
                references.Add(list[0] with { TargetFramework = null });
            }
            else
            {
                references.AddRange(list);
            }
        }

        var all = targets.Select(t => t.Evaluation.Items).ToArray();
        return new ItemSet(
            references,
            all.SelectMany(i => i.ProjectReferences).DistinctBy(r => (r.Location, r.Path)).ToList(),
            all.SelectMany(i => i.PackItems).DistinctBy(p => (p.Location, p.Include)).ToList(),
            all.SelectMany(i => i.CentralVersions).DistinctBy(v => (v.Location, v.Id, v.Version)).ToList());
    }

    private static bool Same(PackageReferenceItem a, PackageReferenceItem b) =>
        a.Version == b.Version
        && a.VersionLocation == b.VersionLocation
        && a.Metadata.Count == b.Metadata.Count
        && a.Metadata.All(m => b.Metadata.TryGetValue(m.Key, out var v) && v == m.Value);
}
