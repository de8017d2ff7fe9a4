using Readiness.Core.Projects;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Build;

/// <summary>
/// Every project file and every import of the repository's build can be read. A file that cannot be read (too large,
/// not UTF-8 or UTF-16, a DTD, malformed XML, a symbolic link, an evaluation that cannot finish) hides what the
/// release declares, so each is an <c>error</c> naming file:line: checks that depend on it cannot pass on missing facts.
/// </summary>
public sealed class BuildReadableCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.BuildReadable,
        "Every project file and import of the build can be read",
        Severity.Block,
        Standards.MsBuildProjectFiles,
        "A project file that cannot be read hides its version, license, dependencies and packing: every check about "
        + "that package would be judging a package it never saw, so the release cannot be called ready.",
        "Fix the file named: well-formed XML in UTF-8 (or UTF-16 with a byte-order mark), no <!DOCTYPE>, under the size "
        + "limit, a real file rather than a symbolic link.");

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var unreadable = context.Projects.Problems.Where(p => p.Kind == ProjectProblemKind.Unreadable).ToList();
        if (unreadable.Count == 0)
        {
            var count = context.Projects.Projects.Count;
            yield return count == 0
                ? Finding.Skip("No project file was found.")
                : Finding.Pass($"All {count} project file(s) and their imports were read.");
            yield break;
        }

        foreach (var problem in unreadable)
        {
            yield return Finding.Error($"{problem.Path} could not be read: {problem.Message}", null, new Evidence(problem.Path, problem.Line));
        }
    }
}
