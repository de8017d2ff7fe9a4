using System.Xml.Linq;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// Reads every SDK-style project of a file tree by evaluating its MSBuild XML statically: imports, properties,
/// conditions and items in MSBuild's order, over the files of the commit. Nothing is built, restored or executed;
/// what cannot be evaluated is named (file:line) in <see cref="ProjectInfo.Unevaluated"/>, never guessed.
/// Never throws on bad input: unreadable files become <see cref="ProjectProblem"/>s.
/// </summary>
public sealed class StaticProjectReader : IProjectModelReader
{
    private static readonly string[] ProjectExtensions = [".csproj", ".fsproj", ".vbproj"];

    public ProjectModel Read(IFileTree files)
    {
        ArgumentNullException.ThrowIfNull(files);
        var session = new ReadSession(files);
        var projects = new List<ProjectInfo>();
        var problems = new List<ProjectProblem>();
        foreach (var link in files.Unread.Where(u => IsProjectFile(u.Path) || IsBuildFile(u.Path)))
        {
            // git stores a link as its target text; MSBuild would follow it, possibly out of the repository.
            problems.Add(new ProjectProblem(link.Path, null, $"The project file {link.Reason}: it is not read, so nothing it declares is known."));
        }

        foreach (var path in files.Paths.Where(IsProjectFile))
        {
            var load = session.Xml.Load(path);
            if (load.Root is null)
            {
                problems.Add(load.Problem ?? new ProjectProblem(path, null, "The project file could not be read."));
                continue;
            }

            if (!ProjectEvaluator.IsSdkStyle(load.Root))
            {
                problems.Add(new ProjectProblem(
                    path,
                    ProjectXmlCache.Line(load.Root),
                    "Not an SDK-style project (no Sdk attribute, Sdk element or Sdk import); its properties are not evaluated.",
                    ProjectProblemKind.NotUnderstood));
                continue;
            }

            try
            {
                projects.Add(ReadProject(session, path, load.Root));
            }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                // One pathological project must not stop the others from being read.
                problems.Add(new ProjectProblem(path, null, $"The project could not be evaluated statically: {e.Message}"));
            }
        }

        var reported = problems.Select(p => p.Path).ToHashSet(StringComparer.Ordinal);
        problems.AddRange(session.ImportProblems.Where(p => !reported.Contains(p.Path)));
        return new ProjectModel(projects, problems);
    }

    public static bool IsProjectFile(string path) =>
        ProjectExtensions.Any(e => path.EndsWith(e, StringComparison.OrdinalIgnoreCase));

    /// <summary>Files MSBuild imports by name (Directory.Build.props/targets, Directory.Packages.props) or by extension.</summary>
    private static bool IsBuildFile(string path) =>
        path.EndsWith(".props", StringComparison.OrdinalIgnoreCase) || path.EndsWith(".targets", StringComparison.OrdinalIgnoreCase);

    private static ProjectInfo ReadProject(ReadSession session, string path, XElement root)
    {
        var main = ProjectEvaluator.Evaluate(session, path, root, null);
        var targets = new List<(string, Evaluation)>();
        var notes = new List<string>();
        var single = Escaping.Unescape(main.Properties.Value("TargetFramework")).Trim();
        if (single.Length > 0)
        {
            // One target: the project is evaluated once, with TargetFramework as an ordinary property.
            targets.Add((single, main));
        }
        else if (main.Properties["TargetFrameworks"] is { Value.Length: > 0 } list)
        {
            if (list.Unevaluated is { } why)
            {
                notes.Add($"{list.Location}: TargetFrameworks is not evaluated, so no target framework is evaluated on its own ({why})");
            }
            else
            {
                var tfms = Escaping.SplitList(Escaping.Unescape(list.Value)).Distinct(StringComparer.OrdinalIgnoreCase).ToList();
                if (tfms.Count > MsBuildLimits.MaxTargetFrameworks)
                {
                    notes.Add($"{list.Location}: more than {MsBuildLimits.MaxTargetFrameworks} target frameworks; only the first {MsBuildLimits.MaxTargetFrameworks} are evaluated");
                }

                // Each inner build sees TargetFramework as a global property that no file can change.
                foreach (var tfm in tfms.Take(MsBuildLimits.MaxTargetFrameworks))
                {
                    targets.Add((tfm, ProjectEvaluator.Evaluate(session, path, root, tfm)));
                }
            }
        }

        if (path.EndsWith(".fsproj", StringComparison.OrdinalIgnoreCase) && !SdkModel.IsTrue(main.Properties.Value("DisableImplicitFSharpCoreReference")))
        {
            notes.Add($"{path}:{ProjectXmlCache.Line(root)}: the F# SDK adds an implicit PackageReference to FSharp.Core, at a version of its own choosing; it is not read here");
        }

        return ProjectInfoBuilder.Build(path, main, targets, notes);
    }
}
