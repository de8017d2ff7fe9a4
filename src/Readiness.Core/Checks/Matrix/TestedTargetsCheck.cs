using NuGet.Frameworks;

using Readiness.Core.Matrix;
using Readiness.Core.Projects;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Matrix;

/// <summary>
/// Each runtime target of a packable project is targeted by a test project that references it, and the CI
/// configuration installs an SDK able to build it.
/// </summary>
public sealed class TestedTargetsCheck : ICheck
{
    private static readonly IFrameworkCompatibilityProvider Compatibility = DefaultCompatibilityProvider.Instance;

    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.MatrixTestedTargets,
        "Every target is tested and built in CI",
        Severity.Warn,
        Standards.LibraryTargeting,
        "Each target framework is a separate build of the library with its own API surface and runtime behaviour. "
        + "A target no test runs against ships untested code to the users of that runtime.",
        "Add the missing targets to a test project's TargetFrameworks (the test project must reference the library), "
        + "and install an SDK of that major version or later in CI (actions/setup-dotnet dotnet-version, or global.json).");

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var ci = WorkflowSdkReader.Read(context.Snapshot.Files);
        foreach (var project in context.Projects.Packable)
        {
            yield return Judge(project, context.Projects, ci);
        }
    }

    /// <summary>Test projects that reference <paramref name="project"/>, directly or through other projects.</summary>
    public static IReadOnlyList<ProjectInfo> TestsOf(ProjectInfo project, ProjectModel model)
    {
        ArgumentNullException.ThrowIfNull(project);
        ArgumentNullException.ThrowIfNull(model);
        return model.Tests.Where(t => Reaches(t, project.Path, model)).ToArray();
    }

    private static bool Reaches(ProjectInfo from, string target, ProjectModel model)
    {
        var seen = new HashSet<string>(StringComparer.OrdinalIgnoreCase) { from.Path };
        var queue = new Queue<ProjectInfo>([from]);
        while (queue.TryDequeue(out var current))
        {
            foreach (var reference in current.ProjectReferences)
            {
                if (string.Equals(reference.Path, target, StringComparison.OrdinalIgnoreCase))
                {
                    return true;
                }

                if (seen.Add(reference.Path) && model.Find(reference.Path) is { } next)
                {
                    queue.Enqueue(next);
                }
            }
        }

        return false;
    }

    private static bool IsRuntime(NuGetFramework f) =>
        f.Framework == FrameworkConstants.FrameworkIdentifiers.NetCoreApp || f.Framework == FrameworkConstants.FrameworkIdentifiers.Net;

    private Finding Judge(ProjectInfo project, ProjectModel model, CiSdkReport ci)
    {
        var evidence = new List<Evidence> { SupportedTargetsCheck.TargetEvidence(project) };
        var targets = SupportedTargetsCheck.Targets(project).Where(t => !t.Framework.IsUnsupported).ToArray();
        if (targets.Length == 0)
        {
            return Finding.Skip("No recognised target framework is declared.", project.PackageId, evidence.ToArray());
        }

        var tests = TestsOf(project, model);
        var testTargets = tests.SelectMany(t => SupportedTargetsCheck.Targets(t).Select(x => (Project: t, x.Framework))).ToArray();
        var failures = new List<string>();
        foreach (var (text, framework) in targets)
        {
            // A runtime target needs a test build of that very runtime; a .NET Standard target needs any test
            // target that can consume it (NuGet's compatibility rules).
            var covered = testTargets.Where(t => IsRuntime(framework)
                ? t.Framework.Framework == framework.Framework && t.Framework.Version == framework.Version
                : Compatibility.IsCompatible(t.Framework, framework)).ToArray();
            if (covered.Length == 0)
            {
                failures.Add(tests.Count == 0
                    ? $"{text}: no test project references {project.Name}"
                    : $"{text}: no test project targets it ({string.Join(", ", tests.Select(t => t.Name))} target {string.Join(";", tests.SelectMany(t => t.TargetFrameworks).Distinct(StringComparer.OrdinalIgnoreCase))})");
            }
        }

        evidence.AddRange(tests.Select(SupportedTargetsCheck.TargetEvidence));
        var ciNote = string.Empty;
        var ciUnknown = false;
        if (!ci.HasCi)
        {
            ciNote = $" No CI configuration ({WorkflowSdkReader.WorkflowFolder}/*.yml) was found, so the CI SDKs were not checked.";
            ciUnknown = true;
        }
        else if (ci.Sdks.Count == 0)
        {
            ciNote = " The CI workflows install no specific .NET SDK (no actions/setup-dotnet version, no global.json), so the SDK the runner brings is unknown."
                + Unevaluated(ci);
            ciUnknown = true;
        }
        else
        {
            foreach (var (text, framework) in targets)
            {
                if (!ci.Sdks.Any(s => SdkVersions.CanBuild(s.Major, framework)))
                {
                    failures.Add($"{text}: no CI SDK can build it (CI installs {string.Join(", ", ci.Sdks.Select(s => $"{s.Text} ({s.Path}:{s.Line})"))})");
                }
            }

            evidence.AddRange(ci.Sdks.Select(s => new Evidence(s.Path, s.Line)).Distinct());
            ciNote = $" CI SDKs: {string.Join(", ", ci.Sdks.Select(s => s.Text).Distinct(StringComparer.Ordinal))}." + Unevaluated(ci);
        }

        if (failures.Count > 0)
        {
            return Finding.Fail(string.Join("; ", failures) + "." + ciNote, Descriptor.Fix, project.PackageId, evidence.Distinct().ToArray());
        }

        var tested = $"{string.Join(", ", targets.Select(t => t.Text))} tested by {string.Join(", ", tests.Select(t => t.Name))}.";
        return ciUnknown
            ? Finding.Skip(tested + ciNote, project.PackageId, evidence.Distinct().ToArray())
            : Finding.Pass(tested + ciNote, project.PackageId, evidence.Distinct().ToArray());
    }

    private static string Unevaluated(CiSdkReport ci) =>
        ci.Unevaluated.Count == 0 ? string.Empty : " Not evaluated: " + string.Join("; ", ci.Unevaluated) + ".";
}
