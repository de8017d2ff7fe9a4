using Readiness.Core.Projects;
using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Metadata;

/// <summary>
/// A packable project declares the metadata users see on the registry: a description and authors that are not the
/// SDK's defaults, a repository URL, tags, a readme that exists and is packed, and an icon that exists if declared.
/// </summary>
public sealed class PackageMetadataCheck : ICheck
{
    /// <summary>The .NET SDK's default Description (Microsoft.NET.Sdk targets; confirmed with dotnet msbuild -getProperty in the tests).</summary>
    public const string SdkDefaultDescription = "Package Description";

    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.MetadataPackage,
        "The package has a description, authors, repository, tags and readme",
        Severity.Warn,
        Standards.NuGetMetadata,
        "The registry page is all a stranger sees before installing: without a real description, authors, a source "
        + "repository and a readme, they cannot judge or trust the package.",
        "Set Description, Authors, RepositoryUrl and PackageTags in the project (or Directory.Build.props), and add a "
        + "README.md with PackageReadmeFile=\"README.md\" and <None Include=\"README.md\" Pack=\"true\" PackagePath=\"\\\" />.");

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        foreach (var project in context.Projects.Packable)
        {
            yield return Judge(project, context);
        }
    }

    private Finding Judge(ProjectInfo project, CheckContext context)
    {
        var problems = new List<string>();
        var evidence = new List<Evidence>();
        var notes = new List<string>();

        var description = project.Property("PackageDescription") is { Value.Length: > 0 } pd ? pd : project.Property("Description");
        if (description is not { Value.Length: > 0 })
        {
            problems.Add($"no Description (the SDK writes '{SdkDefaultDescription}')");
        }
        else if (string.Equals(description.Value.Trim(), SdkDefaultDescription, StringComparison.Ordinal))
        {
            problems.Add($"{description.Name} is the SDK default '{SdkDefaultDescription}'");
            evidence.Add(At(description));
        }

        var authors = project.Property("Authors");
        if (authors is not { Value.Length: > 0 })
        {
            problems.Add($"no Authors (the SDK writes the assembly name, {project.Value("AssemblyName") ?? project.Name})");
        }
        else if (IsAssemblyNameDefault(authors.Value, project))
        {
            problems.Add($"Authors is '{authors.Value}', the SDK default (the assembly name)");
            evidence.Add(At(authors));
        }

        if (project.Property("RepositoryUrl") is not { Value.Length: > 0 })
        {
            if (IsTrue(project.Value("PublishRepositoryUrl")))
            {
                notes.Add("RepositoryUrl comes from the git remote at build time (PublishRepositoryUrl)");
            }
            else
            {
                problems.Add("no RepositoryUrl");
            }
        }

        if (project.Property("PackageTags") is not { Value.Length: > 0 })
        {
            problems.Add("no PackageTags");
        }

        CheckPackedFile(project, context, "PackageReadmeFile", "readme", required: true, problems, evidence);
        CheckPackedFile(project, context, "PackageIcon", "icon", required: false, problems, evidence);
        if (project.Property("PackageIcon") is null && project.Property("PackageIconUrl") is { } iconUrl)
        {
            notes.Add($"PackageIconUrl ({iconUrl.Location}) is deprecated (NU5048); pack an icon with PackageIcon");
        }

        var noteText = notes.Count == 0 ? string.Empty : " Note: " + string.Join("; ", notes) + ".";
        if (problems.Count > 0)
        {
            if (evidence.Count == 0)
            {
                evidence.Add(new Evidence(project.Path));
            }

            return Finding.Fail("Package metadata is incomplete: " + string.Join("; ", problems) + "." + noteText, Descriptor.Fix,
                project.PackageId, evidence.ToArray());
        }

        return Finding.Pass("Description, Authors, RepositoryUrl, PackageTags and a packed readme are declared." + noteText,
            project.PackageId, Declarations(project).ToArray());
    }

    private static void CheckPackedFile(
        ProjectInfo project, CheckContext context, string property, string what, bool required, List<string> problems, List<Evidence> evidence)
    {
        var declared = project.Property(property);
        if (declared is not { Value.Length: > 0 })
        {
            if (required)
            {
                problems.Add($"no {property} (no {what} on the registry page)");
            }

            return;
        }

        var item = PackagePaths.Find(project, declared.Value);
        if (item is null)
        {
            problems.Add($"{property} is '{declared.Value}' ({declared.Location}) but no item packs a file to that path");
            evidence.Add(At(declared));
        }
        else if (item.Path is null || !context.Snapshot.Files.Exists(item.Path))
        {
            problems.Add($"the {what} {item.Path ?? item.Include} packed at {item.Location} does not exist at this commit");
            evidence.Add(new Evidence(item.Location.Path, item.Location.Line));
        }
    }

    private static bool IsAssemblyNameDefault(string authors, ProjectInfo project) =>
        string.Equals(authors.Trim(), project.Value("AssemblyName") ?? project.Name, StringComparison.Ordinal);

    private static IEnumerable<Evidence> Declarations(ProjectInfo project) =>
        new[] { "Description", "Authors", "RepositoryUrl", "PackageTags", "PackageReadmeFile" }
            .Select(project.Property).OfType<PropertyValue>().Select(At);

    private static bool IsTrue(string? v) => string.Equals(v, "true", StringComparison.OrdinalIgnoreCase);

    private static Evidence At(PropertyValue p) => new(p.Location.Path, p.Location.Line);
}
