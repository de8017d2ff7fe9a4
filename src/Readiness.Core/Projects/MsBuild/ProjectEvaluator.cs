using System.Xml.Linq;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// Evaluates one project statically, in MSBuild's order. Pass 1 walks properties and imports in document order:
/// the SDK's props (Directory.Build.props, nearest only; then Directory.Packages.props, nearest only), the project
/// body, the SDK's targets (Version defaults, then Directory.Build.targets, then pack defaults). Pass 2 evaluates
/// item definitions, then items, with the final property values. Nothing is executed.
/// </summary>
internal sealed class ProjectEvaluator
{
    private static readonly string[] ReservedNames =
    [
        "MSBuildProjectDirectory", "MSBuildProjectDirectoryNoRoot", "MSBuildProjectFile", "MSBuildProjectExtension",
        "MSBuildProjectFullPath", "MSBuildProjectName",
    ];

    private static readonly XName ConditionName = "Condition";

    private readonly ReadSession session;
    private readonly string projectPath;
    private readonly string projectFolder;
    private readonly PropertyTable properties = new();
    private readonly EvaluationNotes notes = new();
    private readonly List<string> imports = [];
    private readonly HashSet<string> imported = new(StringComparer.Ordinal);
    private readonly List<PendingGroup> groups = [];
    private readonly Expander expander;
    private readonly ConditionEvaluator conditions;
    private bool propsDone;
    private bool targetsDone;
    private bool dotNetSdk;

    private ProjectEvaluator(ReadSession session, string projectPath, string? targetFramework)
    {
        this.session = session;
        this.projectPath = projectPath;
        projectFolder = RepoPath.Directory(projectPath);
        expander = new Expander(properties, session.Files, projectFolder);
        conditions = new ConditionEvaluator(expander, session.Files, session.Conditions);

        var at = new SourceLocation(projectPath, 0);
        var fileName = RepoPath.FileName(projectPath);
        Reserved("MSBuildProjectDirectory", VirtualPaths.Full(projectFolder), at);
        Reserved("MSBuildProjectDirectoryNoRoot", VirtualPaths.Full(projectFolder)[1..], at);
        Reserved("MSBuildProjectFile", fileName, at);
        Reserved("MSBuildProjectExtension", Path.GetExtension(fileName), at);
        Reserved("MSBuildProjectFullPath", VirtualPaths.Full(projectPath), at);
        Reserved("MSBuildProjectName", Path.GetFileNameWithoutExtension(fileName), at);
        if (targetFramework is not null)
        {
            properties.Set(new PropertyEntry("TargetFramework", targetFramework, at, PropertyOrigin.Global));
        }
    }

    public static Evaluation Evaluate(ReadSession session, string projectPath, XElement root, string? targetFramework)
    {
        var evaluator = new ProjectEvaluator(session, projectPath, targetFramework);
        evaluator.Run(root);
        var items = new ItemEvaluator(evaluator.properties, evaluator.expander, evaluator.conditions, evaluator.notes, session.Files, projectPath)
            .Evaluate(evaluator.groups);
        return new Evaluation(evaluator.properties, items, evaluator.imports, evaluator.notes.Final(evaluator.properties), evaluator.dotNetSdk);
    }

    /// <summary>The SDKs a project names: the Sdk attribute (';'-separated) and Sdk elements.</summary>
    public static IReadOnlyList<(string Name, SourceLocation Location)> ProjectSdks(string path, XElement root)
    {
        var result = new List<(string, SourceLocation)>();
        if (root.Attribute("Sdk")?.Value is { } list)
        {
            result.AddRange(list.Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
                .Select(s => (SdkModel.Name(s), new SourceLocation(path, ProjectXmlCache.Line(root)))));
        }

        result.AddRange(root.Elements().Where(e => e.Name.LocalName == "Sdk" && e.Attribute("Name") is not null)
            .Select(e => (SdkModel.Name(e.Attribute("Name")!.Value), new SourceLocation(path, ProjectXmlCache.Line(e)))));
        return result;
    }

    /// <summary>SDK-style: an Sdk attribute, an Sdk element, or an Import with an Sdk attribute.</summary>
    public static bool IsSdkStyle(XElement root) =>
        root.Attribute("Sdk") is not null
        || root.Elements().Any(e => e.Name.LocalName == "Sdk")
        || root.Descendants().Any(e => e.Name.LocalName == "Import" && e.Attribute("Sdk") is not null);

    private void Run(XElement root)
    {
        imported.Add(projectPath);
        var sdks = ProjectSdks(projectPath, root);
        foreach (var (name, at) in sdks)
        {
            SdkProps(name, at);
        }

        Walk(projectPath, root, 0, 0);
        for (var i = sdks.Count - 1; i >= 0; i--)
        {
            SdkTargets(sdks[i].Location);
        }
    }

    private void Walk(string file, XElement container, int depth, int nesting)
    {
        foreach (var element in container.Elements())
        {
            switch (element.Name.LocalName)
            {
                case "PropertyGroup":
                    PropertyGroup(file, element);
                    break;
                case "ItemGroup":
                case "ItemDefinitionGroup":
                    groups.Add(new PendingGroup(element, file));
                    break;
                case "Import":
                    Import(file, element, depth);
                    break;
                case "ImportGroup":
                    // Import and ImportGroup conditions resolve Exists() against the file that holds them.
                    if (Test(element, file, RepoPath.Directory(file), "ImportGroup"))
                    {
                        foreach (var import in element.Elements().Where(e => e.Name.LocalName == "Import"))
                        {
                            Import(file, import, depth);
                        }
                    }

                    break;
                case "Choose":
                    Choose(file, element, depth, nesting);
                    break;
            }
        }
    }

    private void PropertyGroup(string file, XElement group)
    {
        // MSBuild resolves Exists() in a PropertyGroup's condition against the file that holds it, but in a
        // property's own condition against the project folder (checked against dotnet msbuild).
        if (!Test(group, file, RepoPath.Directory(file), "PropertyGroup"))
        {
            return;
        }

        foreach (var element in group.Elements())
        {
            var name = element.Name.LocalName;
            if (!Test(element, file, projectFolder, "property", name))
            {
                continue;
            }

            var at = Location(file, element);
            if (IsReserved(name))
            {
                notes.Add($"{at}: {name} is a reserved property; MSBuild refuses to set it (MSB4004), so it is ignored here");
                continue;
            }

            if (properties.IsReadOnly(name))
            {
                // A global property (TargetFramework of an inner build) wins over every file.
                continue;
            }

            var expansion = expander.Expand(RawValue(element), new ExpandScope(file, at));
            properties.Set(new PropertyEntry(
                name,
                expansion.Value,
                at,
                PropertyOrigin.File,
                expansion.Unevaluated,
                null,
                expansion.Undefined.Count > 0 ? expansion.Undefined.Distinct(StringComparer.OrdinalIgnoreCase).ToArray() : null));
            if (expansion.Unevaluated is { } why)
            {
                notes.Add(why.StartsWith(at.ToString() + ":", StringComparison.Ordinal) ? why : $"{at}: {name} uses a value that is not evaluated ({why})");
            }

            if (expansion.Undefined.Count > 0)
            {
                notes.Undefined(expansion.Undefined, at, $"property {name}");
            }
        }
    }

    private void Choose(string file, XElement choose, int depth, int nesting)
    {
        var at = Location(file, choose);
        if (nesting >= MsBuildLimits.MaxChooseDepth)
        {
            notes.Add($"{at}: Choose nested deeper than {MsBuildLimits.MaxChooseDepth} levels; skipped");
            return;
        }

        foreach (var branch in choose.Elements())
        {
            if (branch.Name.LocalName == "When")
            {
                var condition = branch.Attribute("Condition")?.Value ?? string.Empty;
                var result = conditions.Evaluate(condition, new ExpandScope(file, Location(file, branch)), projectFolder);
                notes.Undefined(result.Undefined, Location(file, branch), "a When condition");
                if (result.Value is null)
                {
                    notes.Add($"{result.Reason}; the whole Choose at {at} is skipped");
                    return;
                }

                if (result.Value == true)
                {
                    Branch(file, branch, depth, nesting);
                    return;
                }
            }
            else if (branch.Name.LocalName == "Otherwise")
            {
                Branch(file, branch, depth, nesting);
                return;
            }
        }
    }

    private void Branch(string file, XElement branch, int depth, int nesting)
    {
        foreach (var element in branch.Elements())
        {
            switch (element.Name.LocalName)
            {
                case "PropertyGroup":
                    PropertyGroup(file, element);
                    break;
                case "ItemGroup":
                    groups.Add(new PendingGroup(element, file));
                    break;
                case "Choose":
                    Choose(file, element, depth, nesting + 1);
                    break;
            }
        }
    }

    private void Import(string file, XElement element, int depth)
    {
        var at = Location(file, element);
        var project = element.Attribute("Project")?.Value ?? string.Empty;
        if (!Test(element, file, RepoPath.Directory(file), "import of", project))
        {
            return;
        }

        if (element.Attribute("Sdk")?.Value is { } sdk)
        {
            var name = SdkModel.Name(sdk);
            if (string.Equals(project, "Sdk.props", StringComparison.OrdinalIgnoreCase))
            {
                SdkProps(name, at);
            }
            else if (string.Equals(project, "Sdk.targets", StringComparison.OrdinalIgnoreCase))
            {
                NoteUnknownSdk(name, at);
                SdkTargets(at);
            }
            else
            {
                notes.Add($"{at}: {project} of MSBuild SDK {name} is not read; what it sets is unknown");
            }

            return;
        }

        var expansion = expander.Expand(project, new ExpandScope(file, at));
        notes.Undefined(expansion.Undefined, at, $"import of {project}");
        if (expansion.Unevaluated is { } why)
        {
            notes.Add($"{at}: import of \"{project}\" is not read: {why}");
            return;
        }

        foreach (var part in Escaping.SplitList(expansion.Value))
        {
            ImportPath(Escaping.Unescape(part), file, at, depth);
        }
    }

    private void ImportPath(string path, string file, SourceLocation at, int depth)
    {
        var target = VirtualPaths.Resolve(path, RepoPath.Directory(file));
        if (target.Kind == PathKind.Empty)
        {
            notes.Add($"{at}: an import of an empty path (MSBuild stops with an error here); ignored");
            return;
        }

        if (target.Kind == PathKind.Outside)
        {
            notes.Add($"{at}: import of {path} lies outside the repository; not read");
            session.ReportImportProblem(new ProjectProblem(at.Path, at.Line, $"imports {path}, which lies outside the repository; not read (what it sets is unknown)", ProjectProblemKind.Skipped));
            return;
        }

        if (VirtualPaths.HasWildcard(target.Path))
        {
            foreach (var match in session.Files.Match(target.Path).Order(StringComparer.Ordinal))
            {
                ImportFile(match, at, depth);
            }

            return;
        }

        if (!session.Files.FileExists(target.Path))
        {
            notes.Add($"{at}: import of {target.Path} names a file that is not in the repository (MSBuild stops with an error here); not read");
            return;
        }

        ImportFile(target.Path, at, depth);
    }

    private void ImportFile(string path, SourceLocation at, int depth)
    {
        if (depth + 1 > MsBuildLimits.MaxImportDepth)
        {
            notes.Add($"{at}: imports nested deeper than {MsBuildLimits.MaxImportDepth} levels; {path} not read");
            return;
        }

        // MSBuild imports a file once per evaluation and ignores later imports of it (warning MSB4011); this also ends cycles.
        if (!imported.Add(path))
        {
            return;
        }

        var load = session.Xml.Load(path);
        if (load.Root is null)
        {
            if (load.Problem is { } problem)
            {
                session.ReportImportProblem(problem);
                notes.Add($"{at}: import of {path} could not be read: {problem.Message}");
            }

            return;
        }

        imports.Add(path);
        Walk(path, load.Root, depth + 1, 0);
    }

    private void SdkProps(string name, SourceLocation at)
    {
        dotNetSdk |= SdkModel.IsDotNet(name);
        NoteUnknownSdk(name, at);

        if (propsDone)
        {
            return;
        }

        propsDone = true;

        // Microsoft.Common.props: Directory.Build.props, the nearest one above the project only.
        if (SdkModel.DefaultOn(properties.Value("ImportDirectoryBuildProps"))
            && SdkFile("DirectoryBuildPropsPath", "Directory.Build.props", at) is { } buildProps)
        {
            ImportFile(buildProps, at, 0);
        }

        // NuGet.props, imported later by Microsoft.Common.props: Directory.Packages.props, nearest only.
        if (SdkModel.DefaultOn(properties.Value("ImportDirectoryPackagesProps"))
            && SdkFile("DirectoryPackagesPropsPath", "Directory.Packages.props", at) is { } packagesProps)
        {
            ImportFile(packagesProps, at, 0);
            Sdk("CentralPackageVersionsFileImported", "true", at, [], "set by NuGet.props when it imports Directory.Packages.props");
        }
    }

    private void NoteUnknownSdk(string name, SourceLocation at)
    {
        if (!SdkModel.IsDotNet(name))
        {
            notes.Add($"{at}: MSBuild SDK {name} is not read; properties and items it sets are unknown");
        }
    }

    private void SdkTargets(SourceLocation at)
    {
        if (targetsDone)
        {
            return;
        }

        targetsDone = true;
        if (dotNetSdk)
        {
            VersionDefaults(at);
        }

        // Microsoft.Common.targets: Directory.Build.targets, nearest only, after the SDK computed Version.
        if (SdkModel.DefaultOn(properties.Value("ImportDirectoryBuildTargets"))
            && SdkFile("DirectoryBuildTargetsPath", "Directory.Build.targets", at) is { } buildTargets)
        {
            ImportFile(buildTargets, at, 0);
        }

        if (dotNetSdk)
        {
            PackDefaults(at);
        }
    }

    /// <summary>Microsoft.NET.DefaultAssemblyInfo.targets, imported by the SDK before Microsoft.Common.targets.</summary>
    private void VersionDefaults(SourceLocation at)
    {
        if (properties.Value("Version").Length > 0)
        {
            return;
        }

        if (properties.Value("VersionPrefix").Length == 0)
        {
            Sdk("VersionPrefix", "1.0.0", at, [], "the .NET SDK sets VersionPrefix to 1.0.0 when Version and VersionPrefix are empty (Microsoft.NET.DefaultAssemblyInfo.targets)");
        }

        var prefix = properties["VersionPrefix"];
        var suffix = properties["VersionSuffix"];
        if (suffix is { Value.Length: > 0 })
        {
            Sdk("Version", prefix!.Value + "-" + suffix.Value, at, [prefix, suffix], "the .NET SDK sets Version to $(VersionPrefix)-$(VersionSuffix) when Version is empty, before Directory.Build.targets is imported (Microsoft.NET.DefaultAssemblyInfo.targets)");
        }

        if (properties.Value("Version").Length == 0)
        {
            Sdk("Version", prefix!.Value, at, [prefix], "the .NET SDK sets Version to $(VersionPrefix) when Version is empty, before Directory.Build.targets is imported (Microsoft.NET.DefaultAssemblyInfo.targets)");
        }
    }

    /// <summary>NuGet.Build.Tasks.Pack.targets, imported by the SDK after Directory.Build.targets.</summary>
    private void PackDefaults(SourceLocation at)
    {
        if (properties.Value("PackageVersion").Length == 0)
        {
            var version = properties["Version"];
            Sdk("PackageVersion", version?.Value ?? string.Empty, at, version is null ? [] : [version], "the pack targets set PackageVersion to $(Version) when it is empty (NuGet.Build.Tasks.Pack.targets)");
        }

        if (properties.Value("IsPackable").Length == 0)
        {
            var test = SdkModel.IsTrue(properties.Value("IsTestProject")) || SdkModel.IsTrue(properties.Value("IsTestingPlatformApplication"));
            Sdk("IsPackable", test ? "false" : "true", at, [], "the pack targets set IsPackable when it is empty: false for a test project, else true (NuGet.Build.Tasks.Pack.targets)");
        }
    }

    /// <summary>A property set by a modelled SDK step; it points at the declaration it was computed from.</summary>
    private void Sdk(string name, string value, SourceLocation at, PropertyEntry?[] inputs, string rule)
    {
        if (properties.IsReadOnly(name))
        {
            return;
        }

        var from = inputs.OfType<PropertyEntry>().ToArray();
        var location = from.LastOrDefault(e => e.Origin == PropertyOrigin.File)?.Location ?? from.FirstOrDefault()?.Location ?? at;
        var undefined = from.SelectMany(e => e.Undefined ?? []).Distinct(StringComparer.OrdinalIgnoreCase).ToArray();
        properties.Set(new PropertyEntry(
            name,
            value,
            location,
            PropertyOrigin.Sdk,
            from.Select(e => e.Unevaluated).FirstOrDefault(u => u is not null),
            rule,
            undefined.Length > 0 ? undefined : null));
    }

    /// <summary>The file the SDK imports: an explicit path property if set, else the nearest one above the project.</summary>
    private string? SdkFile(string pathProperty, string fileName, SourceLocation at)
    {
        var explicitPath = properties[pathProperty];
        if (explicitPath is { Value.Length: > 0 })
        {
            var target = VirtualPaths.Resolve(Escaping.Unescape(explicitPath.Value), projectFolder);
            if (explicitPath.Unevaluated is not null || target.Kind != PathKind.Inside
                || !Escaping.Unescape(explicitPath.Value).Replace('\\', '/').StartsWith(VirtualPaths.Root + "/", StringComparison.Ordinal))
            {
                notes.Add($"{explicitPath.Location}: {pathProperty} does not name a file by a path under the repository; {fileName} is not read");
                return null;
            }

            return session.Files.FileExists(target.Path) ? target.Path : null;
        }

        foreach (var folder in RepoPath.FoldersUpward(projectPath))
        {
            var candidate = folder.Length == 0 ? fileName : folder + "/" + fileName;
            if (session.Files.FileExists(candidate))
            {
                Sdk(pathProperty, VirtualPaths.Full(candidate), at, [], $"the SDK looks for the nearest {fileName} above the project");
                return candidate;
            }
        }

        return null;
    }

    /// <summary>Evaluates an element's condition; a condition that cannot be evaluated skips the element, with a note.</summary>
    private bool Test(XElement element, string file, string existsBase, string kind, string? name = null)
    {
        if (element.Attribute(ConditionName)?.Value is not { } condition)
        {
            return true;
        }

        var at = Location(file, element);
        var result = conditions.Evaluate(condition, new ExpandScope(file, at), existsBase);
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

    private void Reserved(string name, string value, SourceLocation at) =>
        properties.Set(new PropertyEntry(name, value, at, PropertyOrigin.Reserved));

    private static bool IsReserved(string name) =>
        ReservedNames.Contains(name, StringComparer.OrdinalIgnoreCase) || Expander.ThisFile(name, "x") is not null;

    /// <summary>A property's text as MSBuild takes it: untrimmed, inner XML when it holds elements.</summary>
    private static string RawValue(XElement element) =>
        element.HasElements
            ? string.Concat(element.Nodes().Select(n => n.ToString(SaveOptions.DisableFormatting)))
            : element.Value;

    internal static SourceLocation Location(string file, XObject node) => new(file, ProjectXmlCache.Line(node));
}
