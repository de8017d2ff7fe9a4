using Readiness.Core.Projects;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Versioning;

/// <summary>
/// Recognises projects whose version is not written in the project: computed from git tags by a build package,
/// or injected by CI at build time over a placeholder.
/// </summary>
public static class VersionSourceDetector
{
    /// <summary>Well-known packages that compute the version from git history (from memory; each project's README).</summary>
    public static readonly IReadOnlyList<string> GitVersioningPackages =
    [
        "MinVer",
        "Nerdbank.GitVersioning",
        "GitVersion.MsBuild",
        "GitVersionTask",
        "Versionize",
        "GitInfo",
    ];

    /// <summary>Placeholder versions that mean "the real one is passed at build time" (common practice, no published source).</summary>
    public static readonly IReadOnlyList<string> Placeholders = ["0.0.0", "0.0.0-dev", "0.0.0-local", "1.0.0-local", "0.0.1-local"];

    /// <summary>Why the project's version is not what it declares, or null when the declared value is the version.</summary>
    public static string? ExternalSource(ProjectInfo project, IFileTree files, DeclaredVersion declared)
    {
        ArgumentNullException.ThrowIfNull(project);
        ArgumentNullException.ThrowIfNull(files);
        var package = project.PackageReferences.FirstOrDefault(r => GitVersioningPackages.Contains(r.Id, StringComparer.OrdinalIgnoreCase));
        if (package is not null)
        {
            return $"the version is computed from git tags by the {package.Id} package ({package.Location})";
        }

        foreach (var folder in RepoPath.FoldersUpward(project.Path))
        {
            var versionJson = folder.Length == 0 ? "version.json" : folder + "/version.json";
            if (files.Exists(versionJson))
            {
                return $"the version is computed from git history by a version.json file ({versionJson})";
            }
        }

        foreach (var config in new[] { "GitVersion.yml", "GitVersion.yaml" })
        {
            if (files.Exists(config))
            {
                return $"the version is computed from git tags by GitVersion ({config})";
            }
        }

        if (Projects.PackCommands.Read(files).VersionArguments is [var passed, ..])
        {
            return $"the version is passed to the build at {passed} (CI or a build script)";
        }

        if (declared.Value is { } v && Placeholders.Contains(v, StringComparer.OrdinalIgnoreCase))
        {
            return $"{declared.Property} is the placeholder {v} ({declared.Location}); the real version is passed at build time";
        }

        return null;
    }
}
