using Readiness.Core.Dependencies;
using Readiness.Core.Projects;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Deps;

/// <summary>
/// A library that plugs into a host must not ship the host: every reference to a host package (<c>host-packages</c>)
/// keeps its runtime assets from consumers, and a Roslyn component keeps <c>Microsoft.CodeAnalysis*</c> private.
/// </summary>
public sealed class HostCompileOnlyCheck : ICheck
{
    public const string RoslynPrefix = "Microsoft.CodeAnalysis";

    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.DepsHostCompileOnly,
        "Host packages are referenced compile-only",
        Severity.Block,
        Standards.NuGetAssets,
        "Every installation of the host brings its own host version. A plugin package that depends on the host's "
        + "runtime assets pins that version into its users' applications, where it clashes with the host they run.",
        "Add PrivateAssets=\"all\" (the dependency is left out of the package) or ExcludeAssets=\"runtime\" (the "
        + "dependency stays, without its runtime assets) to each host PackageReference; Roslyn components reference "
        + "Microsoft.CodeAnalysis* with PrivateAssets=\"all\".")
    {
        Settings = ["host-packages"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var hosts = new PackagePatterns(context.Parameters.Strings("host-packages"));
        var findings = new List<Finding>();
        var anyRoslyn = false;
        foreach (var project in context.Projects.Packable)
        {
            var roslyn = RoslynComponentReason(project);
            anyRoslyn |= roslyn is not null;
            var relevant = project.PackageReferences
                .Where(r => hosts.Matches(r.Id) || (roslyn is not null && IsRoslynPackage(r.Id)))
                .ToArray();
            if (relevant.Length > 0)
            {
                findings.Add(Judge(project, relevant, hosts, roslyn));
            }
        }

        if (findings.Count > 0)
        {
            return findings;
        }

        return hosts.IsEmpty && !anyRoslyn
            ? [Finding.Skip("No host packages are configured (host-packages in the checklist's settings: or in .readiness.yml) "
                + "and no project is a Roslyn component.")]
            : [Finding.Skip(hosts.IsEmpty
                ? "The Roslyn components reference no Microsoft.CodeAnalysis package."
                : $"No packable project references a host package ({hosts}).")];
    }

    public static bool IsRoslynPackage(string id) => id.StartsWith(RoslynPrefix, StringComparison.OrdinalIgnoreCase);

    /// <summary>Why the project counts as a Roslyn component (analyzer or generator), or null.</summary>
    public static string? RoslynComponentReason(ProjectInfo project)
    {
        ArgumentNullException.ThrowIfNull(project);
        if (IsTrue(project.Value("IsRoslynComponent")))
        {
            return "IsRoslynComponent is true";
        }

        if (IsTrue(project.Value("EnforceExtendedAnalyzerRules")))
        {
            return "EnforceExtendedAnalyzerRules is true";
        }

        return project.PackItems.Any(p => (p.PackagePath ?? string.Empty).Replace('\\', '/').TrimStart('/')
            .StartsWith("analyzers/", StringComparison.OrdinalIgnoreCase))
            ? "it packs files under analyzers/"
            : null;
    }

    private static bool IsTrue(string? value) => string.Equals(value, "true", StringComparison.OrdinalIgnoreCase);

    private Finding Judge(ProjectInfo project, PackageReferenceItem[] references, PackagePatterns hosts, string? roslyn)
    {
        var evidence = new List<Evidence>();
        var problems = new List<string>();
        var hints = new List<string>();
        var unevaluated = new List<string>();
        foreach (var reference in references)
        {
            var assets = ReferenceAssets.From(reference.Metadata);
            var where = Describe(reference);
            if (assets.Unevaluated is { } why)
            {
                unevaluated.Add($"{where}: {why}");
                evidence.Add(At(reference.Location));
                continue;
            }

            var roslynRule = roslyn is not null && IsRoslynPackage(reference.Id);
            if (roslynRule ? assets.IsOmitted : assets.IsCompileOnly)
            {
                continue;
            }

            evidence.Add(At(reference.Location));
            problems.Add(roslynRule
                ? $"{where} is not private, but the project is a Roslyn component ({roslyn})"
                : $"{where} passes the host's runtime assets to consumers");
            if (IsInheritedProps(reference.Location, project))
            {
                hints.Add($"{reference.Location.Path} adds {reference.Id} to every project below it; set the asset "
                    + $"metadata there (line {reference.Location.Line}), or on a PackageReference Update=\"{reference.Id}\" in this project.");
            }

            foreach (var central in IgnoredCentralMetadata(project, reference.Id))
            {
                evidence.Add(At(central.Location));
                hints.Add($"The asset metadata written on PackageVersion {central.Id} at {central.Location} has no effect: "
                    + "central package management reads only the version from Directory.Packages.props. Move "
                    + $"{string.Join(" and ", AssetNames(central.Metadata))} to the PackageReference at {reference.Location}.");
            }
        }

        var subject = $"{references.Length} host reference{(references.Length == 1 ? string.Empty : "s")}";
        if (problems.Count > 0)
        {
            var hint = string.Join(" ", hints.Prepend(Descriptor.Fix));
            return Finding.Fail(string.Join("; ", problems) + ".", hint, project.PackageId, evidence.ToArray());
        }

        if (unevaluated.Count > 0)
        {
            return Finding.Skip("The asset metadata could not be evaluated statically: " + string.Join("; ", unevaluated) + ".",
                project.PackageId, evidence.ToArray());
        }

        return Finding.Pass(
            $"Checked {subject}: {string.Join(", ", references.Select(r => $"{r.Id} ({How(r)})"))}.",
            project.PackageId,
            references.Select(r => At(r.Location)).ToArray());
    }

    private static string How(PackageReferenceItem reference)
    {
        var assets = ReferenceAssets.From(reference.Metadata);
        return assets.IsOmitted ? "private: left out of the package's dependencies" : "runtime assets excluded";
    }

    private static string Describe(PackageReferenceItem reference) =>
        reference.TargetFramework is { } tfm
            ? $"{reference.Id} (for {tfm}, {reference.Location})"
            : $"{reference.Id} ({reference.Location})";

    private static bool IsInheritedProps(SourceLocation location, ProjectInfo project) =>
        !string.Equals(location.Path, project.Path, StringComparison.OrdinalIgnoreCase)
        && Snapshots.RepoPath.FileName(location.Path).StartsWith("Directory.Build.", StringComparison.OrdinalIgnoreCase);

    private static IEnumerable<CentralPackageVersion> IgnoredCentralMetadata(ProjectInfo project, string id) =>
        project.CentralVersions.Where(c => string.Equals(c.Id, id, StringComparison.OrdinalIgnoreCase)
            && AssetNames(c.Metadata).Any());

    private static IEnumerable<string> AssetNames(IReadOnlyDictionary<string, string> metadata) =>
        new[] { "PrivateAssets", "ExcludeAssets", "IncludeAssets" }.Where(n => ReferenceAssets.Find(metadata, n) is not null);

    private static Evidence At(SourceLocation location) => new(location.Path, location.Line);
}
