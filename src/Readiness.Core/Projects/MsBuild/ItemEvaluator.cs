using System.Xml.Linq;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// Pass 2: item definitions, then items, in import order, with the final property values (as MSBuild does).
/// Keeps PackageReference, GlobalPackageReference, PackageVersion, ProjectReference, and None/Content for packing.
/// Include/Update/Remove, metadata as attributes or child elements (each with its own condition). Item paths are
/// relative to the project folder whichever file declares them.
/// </summary>
internal sealed class ItemEvaluator(
    PropertyTable properties,
    Expander expander,
    ConditionEvaluator conditions,
    EvaluationNotes notes,
    FileSet files,
    string projectPath)
{
    private static readonly HashSet<string> KeptTypes = new(StringComparer.Ordinal)
    {
        "PackageReference", "GlobalPackageReference", "PackageVersion", "ProjectReference", "None", "Content",
    };

    private static readonly HashSet<string> Operations = new(StringComparer.Ordinal)
    {
        "Include", "Exclude", "Remove", "Update", "Condition", "KeepMetadata", "RemoveMetadata", "KeepDuplicates",
        "MatchOnMetadata", "MatchOnMetadataOptions",
    };

    /// <summary>GlobalPackageReference becomes a PackageReference with these assets (NuGet.targets).</summary>
    private static readonly (string Name, string Value)[] GlobalReferenceAssets =
    [
        ("IncludeAssets", "Runtime;Build;Native;contentFiles;Analyzers"),
        ("PrivateAssets", "All"),
    ];

    private static readonly XName ConditionName = "Condition";

    private readonly string projectFolder = RepoPath.Directory(projectPath);
    private readonly Dictionary<string, Dictionary<string, MetadataValue>> definitions = new(StringComparer.Ordinal);
    private readonly List<ItemRecord> items = [];
    private readonly HashSet<string> defaultNone = new(StringComparer.Ordinal);
    private bool full;

    public ItemSet Evaluate(IReadOnlyList<PendingGroup> groups)
    {
        foreach (var group in groups.Where(g => g.Element.Name.LocalName == "ItemDefinitionGroup"))
        {
            Definitions(group);
        }

        foreach (var group in groups.Where(g => g.Element.Name.LocalName == "ItemGroup"))
        {
            if (Test(group.Element, group.File, "ItemGroup"))
            {
                foreach (var element in group.Element.Elements())
                {
                    Item(group.File, element);
                }
            }
        }

        return Build();
    }

    private void Definitions(PendingGroup group)
    {
        if (!Test(group.Element, group.File, "ItemDefinitionGroup"))
        {
            return;
        }

        foreach (var type in group.Element.Elements())
        {
            var name = type.Name.LocalName;
            if (!KeptTypes.Contains(name) || !Test(type, group.File, "item definition", name))
            {
                continue;
            }

            if (!definitions.TryGetValue(name, out var defaults))
            {
                defaults = new Dictionary<string, MetadataValue>(StringComparer.OrdinalIgnoreCase);
                definitions[name] = defaults;
            }

            foreach (var (key, value) in Metadata(group.File, type))
            {
                defaults[key] = value;
            }
        }
    }

    private void Item(string file, XElement element)
    {
        var type = element.Name.LocalName;
        if (!KeptTypes.Contains(type))
        {
            return;
        }

        var at = ProjectEvaluator.Location(file, element);
        var include = element.Attribute("Include")?.Value;
        var update = element.Attribute("Update")?.Value;
        var remove = element.Attribute("Remove")?.Value;
        if (!Test(element, file, type, include ?? update ?? remove))
        {
            return;
        }

        var what = $"{type} {include ?? update ?? remove}";

        if (include is not null)
        {
            if (Specs(include, file, at, what) is not { } specs)
            {
                return;
            }

            var excluded = element.Attribute("Exclude")?.Value is { } exclude ? Specs(exclude, file, at, what) ?? [] : [];
            var metadata = Metadata(file, element);
            var kept = specs.Where(s => !excluded.Any(x => Matches(type, s, x))).ToList();
            foreach (var spec in kept)
            {
                // Each item gets its own metadata: a later Update changes one item, not its siblings.
                var own = kept.Count == 1 && !definitions.ContainsKey(type) ? metadata : WithDefaults(type, metadata);
                Add(new ItemRecord(type, spec, at, own));
            }
        }
        else if (update is not null)
        {
            if (Specs(update, file, at, what) is not { } specs)
            {
                return;
            }

            var metadata = Metadata(file, element);
            foreach (var spec in specs)
            {
                if (type == "None")
                {
                    MaterializeDefaultNone(spec, at);
                }

                foreach (var item in items.Where(i => i.Type == type && Matches(type, i.Spec, spec)))
                {
                    foreach (var (key, value) in metadata)
                    {
                        item.Metadata[key] = value;
                    }
                }
            }
        }
        else if (remove is not null)
        {
            if (Specs(remove, file, at, what) is { } specs)
            {
                items.RemoveAll(i => i.Type == type && specs.Any(s => Matches(type, i.Spec, s)));
            }
        }
    }

    private void Add(ItemRecord record)
    {
        if (items.Count >= MsBuildLimits.MaxItems)
        {
            if (!full)
            {
                notes.Add($"{record.Location}: more than {MsBuildLimits.MaxItems:N0} items; later ones are not read");
                full = true;
            }

            return;
        }

        items.Add(record);
    }

    /// <summary>The SDK's default None items exist before the project's own; an Update reaches them.</summary>
    private void MaterializeDefaultNone(string spec, SourceLocation at)
    {
        var candidates = VirtualPaths.HasWildcard(spec)
            ? Resolve(spec) is { } pattern ? files.Match(pattern) : []
            : Resolve(spec) is { } path && files.FileExists(path) ? [path] : [];
        foreach (var file in candidates)
        {
            if (DefaultNoneItems.Includes(file, projectPath, properties) && defaultNone.Add(file))
            {
                var relative = projectFolder.Length == 0 ? file : file[(projectFolder.Length + 1)..];
                Add(new ItemRecord("None", relative, at, WithDefaults("None", new(StringComparer.OrdinalIgnoreCase))));
            }
        }
    }

    private Dictionary<string, MetadataValue> WithDefaults(string type, Dictionary<string, MetadataValue> metadata)
    {
        var result = definitions.TryGetValue(type, out var defaults)
            ? new Dictionary<string, MetadataValue>(defaults, StringComparer.OrdinalIgnoreCase)
            : new Dictionary<string, MetadataValue>(StringComparer.OrdinalIgnoreCase);
        foreach (var (key, value) in metadata)
        {
            result[key] = value;
        }

        return result;
    }

    /// <summary>Metadata from attributes and child elements, expanded; a child's own condition is honoured.</summary>
    private Dictionary<string, MetadataValue> Metadata(string file, XElement element)
    {
        var result = new Dictionary<string, MetadataValue>(StringComparer.OrdinalIgnoreCase);
        foreach (var attribute in element.Attributes().Where(a => !a.IsNamespaceDeclaration && !Operations.Contains(a.Name.LocalName)))
        {
            var name = attribute.Name.LocalName;
            var at = ProjectEvaluator.Location(file, attribute);
            result[name] = new MetadataValue(name, Expand(attribute.Value, file, at, name), at);
        }

        foreach (var child in element.Elements())
        {
            var name = child.Name.LocalName;
            if (!Test(child, file, "metadata", name))
            {
                continue;
            }

            var at = ProjectEvaluator.Location(file, child);
            result[name] = new MetadataValue(name, Expand(child.Value, file, at, name), at);
        }

        return result;
    }

    private string Expand(string text, string file, SourceLocation at, string metadata)
    {
        var expansion = expander.Expand(text, new ExpandScope(file, at));
        if (expansion.Undefined.Count > 0)
        {
            notes.Undefined(expansion.Undefined, at, $"metadata {metadata}");
        }

        if (expansion.Unevaluated is { } why)
        {
            notes.Add($"{at}: metadata {metadata} is kept as written: {why}");
        }

        return Escaping.Unescape(expansion.Value);
    }

    /// <summary>An Include/Update/Remove list: expanded, split on ';', unescaped; null (with a note) when not certain.</summary>
    private List<string>? Specs(string text, string file, SourceLocation at, string what)
    {
        var expansion = expander.Expand(text, new ExpandScope(file, at));
        notes.Undefined(expansion.Undefined, at, what);
        if (expansion.Unevaluated is { } why)
        {
            notes.Add($"{at}: {what} is not read: {why}");
            return null;
        }

        return Escaping.SplitList(expansion.Value).Select(Escaping.Unescape).ToList();
    }

    private bool Matches(string type, string itemSpec, string pattern)
    {
        if (type is not ("None" or "Content" or "ProjectReference"))
        {
            return string.Equals(itemSpec, pattern, StringComparison.OrdinalIgnoreCase);
        }

        var item = Resolve(itemSpec);
        var target = Resolve(pattern);
        if (item is null || target is null)
        {
            return string.Equals(itemSpec.Replace('\\', '/'), pattern.Replace('\\', '/'), StringComparison.Ordinal);
        }

        return VirtualPaths.HasWildcard(target) ? FileSet.WildcardRegex(target).IsMatch(item) : item == target;
    }

    /// <summary>An item path resolved against the project folder; null when it lies outside the repository.</summary>
    private string? Resolve(string spec)
    {
        var target = VirtualPaths.Resolve(spec, projectFolder);
        return target.Kind == PathKind.Inside ? target.Path : null;
    }

    private bool Test(XElement element, string file, string kind, string? name = null)
    {
        if (element.Attribute(ConditionName)?.Value is not { } condition)
        {
            return true;
        }

        // Item and ItemGroup conditions resolve Exists() against the project folder (checked against dotnet msbuild).
        var at = ProjectEvaluator.Location(file, element);
        var result = conditions.Evaluate(condition, new ExpandScope(file, at), projectFolder);
        var what = name is null ? kind : $"{kind} {name}";
        if (result.Undefined.Count > 0)
        {
            notes.Undefined(result.Undefined, at, $"the condition of {what}");
        }

        if (result.Value is null)
        {
            notes.Add($"{result.Reason}; {what} is skipped");
            return false;
        }

        return result.Value.Value;
    }

    private ItemSet Build()
    {
        var central = SdkModel.IsTrue(properties.Value("ManagePackageVersionsCentrally"));
        var overrides = !string.Equals(properties.Value("CentralPackageVersionOverrideEnabled"), "false", StringComparison.OrdinalIgnoreCase);
        var globals = central && !string.Equals(properties.Value("RestoreEnableGlobalPackageReference"), "false", StringComparison.OrdinalIgnoreCase);

        var pinned = items.Where(i => i.Type == "PackageVersion").ToList();
        var versions = pinned
            .Select(i => new CentralPackageVersion(i.Spec, i.Meta("Version") ?? string.Empty, Plain(i.Metadata), i.Location))
            .ToList();
        var references = new List<PackageReferenceItem>();
        foreach (var item in items.Where(i => i.Type == "PackageReference"))
        {
            references.Add(Reference(item, central, overrides, pinned));
        }

        if (globals)
        {
            foreach (var item in items.Where(i => i.Type == "GlobalPackageReference"))
            {
                var metadata = Plain(item.Metadata);
                foreach (var (name, value) in GlobalReferenceAssets)
                {
                    metadata[name] = value;
                }

                item.Metadata.TryGetValue("Version", out var version);
                references.Add(new PackageReferenceItem(item.Spec, version?.Value, version?.Location, metadata, item.Location));
                versions.Add(new CentralPackageVersion(item.Spec, version?.Value ?? string.Empty, Plain(item.Metadata), item.Location));
            }
        }

        var projectReferences = items.Where(i => i.Type == "ProjectReference").Select(ProjectReference).ToList();
        var packItems = items
            .Where(i => i.Type is "None" or "Content" && SdkModel.IsTrue(i.Meta("Pack") ?? string.Empty))
            .Select(i => new PackItem(i.Spec, VirtualPaths.HasWildcard(i.Spec) ? null : Resolve(i.Spec), i.Meta("PackagePath"), i.Location))
            .ToList();
        return new ItemSet(references, projectReferences, packItems, versions);
    }

    /// <summary>
    /// The version in effect: with central management, VersionOverride (unless switched off), else the central
    /// PackageVersion, else the reference's own Version; without it, the reference's own Version
    /// (learn.microsoft.com/nuget/consume-packages/central-package-management).
    /// </summary>
    private PackageReferenceItem Reference(ItemRecord item, bool central, bool overrides, List<ItemRecord> pinned)
    {
        MetadataValue? version = null;
        if (central)
        {
            if (overrides && item.Metadata.TryGetValue("VersionOverride", out var over) && over.Value.Length > 0)
            {
                version = over;
            }
            else if (pinned.LastOrDefault(v => string.Equals(v.Spec, item.Spec, StringComparison.OrdinalIgnoreCase)) is { } entry)
            {
                // The location of the Version itself: a PackageVersion Update in a nearer file may have set it.
                version = entry.Metadata.TryGetValue("Version", out var pin) ? pin : new MetadataValue("Version", string.Empty, entry.Location);
            }

            if (item.Metadata.TryGetValue("Version", out var own) && own.Value.Length > 0)
            {
                // From memory: NuGet refuses a Version on a PackageReference under central management (NU1008).
                notes.Add($"{own.Location}: PackageReference {item.Spec} sets Version while central package management is on (NuGet refuses this, NU1008)");
                version ??= own;
            }
        }
        else if (item.Metadata.TryGetValue("Version", out var own) && own.Value.Length > 0)
        {
            version = own;
        }

        return new PackageReferenceItem(item.Spec, version?.Value, version?.Location, Plain(item.Metadata), item.Location);
    }

    private ProjectReferenceItem ProjectReference(ItemRecord item)
    {
        var path = Resolve(item.Spec);
        if (path is null)
        {
            notes.Add($"{item.Location}: ProjectReference {item.Spec} points outside the repository");
        }

        path ??= VirtualPaths.NormalizeClimbing(projectFolder.Length == 0 ? item.Spec : projectFolder + "/" + item.Spec);
        return new ProjectReferenceItem(path, Plain(item.Metadata), item.Location);
    }

    private static Dictionary<string, string> Plain(Dictionary<string, MetadataValue> metadata)
    {
        var result = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        foreach (var value in metadata.Values)
        {
            result[value.Name] = value.Value;
        }

        return result;
    }
}
