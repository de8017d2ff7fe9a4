using Readiness.Core.Projects;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Metadata;

/// <summary>
/// A packable project builds deterministically in CI (<c>ContinuousIntegrationBuild</c>), publishes its repository
/// URL and ships symbols (<c>.snupkg</c>, or PDBs embedded in the assembly).
/// </summary>
public sealed class ReproducibleCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.MetadataReproducible,
        "The package is built reproducibly, with source link and symbols",
        Severity.Info,
        Standards.SourceLink,
        "With a deterministic CI build, a published repository URL and symbols, users can step into the library's "
        + "source while debugging and confirm that the package was built from the tagged commit.",
        "Set ContinuousIntegrationBuild=true when building in CI (Condition=\"'$(GITHUB_ACTIONS)' == 'true'\"), "
        + "PublishRepositoryUrl=true (or RepositoryUrl), and IncludeSymbols=true with SymbolPackageFormat=snupkg.");

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        foreach (var project in context.Projects.Packable)
        {
            yield return Judge(project, context.Snapshot.Files);
        }
    }

    /// <summary>
    /// Where a file the project reads declares <c>ContinuousIntegrationBuild</c>, even under a condition the static
    /// read took as false (conditions on CI variables such as <c>$(GITHUB_ACTIONS)</c>, which no file sets).
    /// </summary>
    public static SourceLocation? ConditionalDeclaration(ProjectInfo project, Snapshots.IFileTree files)
    {
        ArgumentNullException.ThrowIfNull(project);
        ArgumentNullException.ThrowIfNull(files);
        foreach (var file in project.Imports.Prepend(project.Path).Distinct(StringComparer.Ordinal))
        {
            string? text;
            try
            {
                text = Snapshots.FileTreeExtensions.ReadText(files, file);
            }
            catch (Snapshots.FileTooLargeException)
            {
                continue;
            }

            var lines = text?.Split('\n') ?? [];
            for (var i = 0; i < lines.Length; i++)
            {
                if (lines[i].Contains("<ContinuousIntegrationBuild", StringComparison.OrdinalIgnoreCase))
                {
                    return new SourceLocation(file, i + 1);
                }
            }
        }

        return null;
    }

    private Finding Judge(ProjectInfo project, Snapshots.IFileTree files)
    {
        var problems = new List<string>();
        var notes = new List<string>();
        var evidence = new List<Evidence>();

        var ci = project.Property("ContinuousIntegrationBuild");
        if (ci is null && ConditionalDeclaration(project, files) is { } declared)
        {
            evidence.Add(new Evidence(declared.Path, declared.Line));
            notes.Add($"ContinuousIntegrationBuild is declared at {declared} under a condition that holds only in some "
                + "builds (such as a CI variable no file sets); it was not evaluated");
        }
        else if (ci is null)
        {
            problems.Add("ContinuousIntegrationBuild is never set (paths in the PDBs stay machine-specific)");
        }
        else
        {
            evidence.Add(At(ci));
            if (ci.Unevaluated is { } why)
            {
                notes.Add($"ContinuousIntegrationBuild is set under a condition ({why})");
            }
            else if (!IsTrue(ci.Value))
            {
                problems.Add($"ContinuousIntegrationBuild is '{ci.Value}' ({ci.Location})");
            }
            else
            {
                notes.Add("ContinuousIntegrationBuild is true unconditionally (also on developer machines)");
            }
        }

        if (IsTrue(project.Value("PublishRepositoryUrl")) || project.Value("RepositoryUrl") is not null)
        {
            evidence.AddRange(new[] { "PublishRepositoryUrl", "RepositoryUrl" }.Select(project.Property).OfType<PropertyValue>().Select(At));
        }
        else
        {
            problems.Add("the repository URL is not published (neither PublishRepositoryUrl=true nor RepositoryUrl)");
        }

        var symbols = IsTrue(project.Value("IncludeSymbols"));
        var snupkg = string.Equals(project.Value("SymbolPackageFormat"), "snupkg", StringComparison.OrdinalIgnoreCase);
        if (symbols && snupkg)
        {
            evidence.AddRange(new[] { "IncludeSymbols", "SymbolPackageFormat" }.Select(project.Property).OfType<PropertyValue>().Select(At));
        }
        else if (string.Equals(project.Value("DebugType"), "embedded", StringComparison.OrdinalIgnoreCase))
        {
            notes.Add("symbols are embedded in the assembly (DebugType=embedded)");
            evidence.Add(At(project.Property("DebugType")!));
        }
        else
        {
            problems.Add(symbols
                ? $"IncludeSymbols is set but SymbolPackageFormat is '{project.Value("SymbolPackageFormat") ?? "(unset: legacy .symbols.nupkg)"}', not snupkg"
                : "no symbols package (IncludeSymbols=true with SymbolPackageFormat=snupkg)");
        }

        var noteText = notes.Count == 0 ? string.Empty : " Note: " + string.Join("; ", notes) + ".";
        if (evidence.Count == 0)
        {
            evidence.Add(new Evidence(project.Path));
        }

        return problems.Count > 0
            ? Finding.Fail(string.Join("; ", problems) + "." + noteText, Descriptor.Fix, project.PackageId, evidence.Distinct().ToArray())
            : Finding.Pass("Deterministic CI build, repository URL published, symbols shipped." + noteText, project.PackageId, evidence.Distinct().ToArray());
    }

    private static bool IsTrue(string? v) => string.Equals(v?.Trim(), "true", StringComparison.OrdinalIgnoreCase);

    private static Evidence At(PropertyValue p) => new(p.Location.Path, p.Location.Line);
}
