using Readiness.Core.Licensing;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Checks.License;

/// <summary>
/// Each packable project has a license file next to it, in a folder above it, or at the root (names:
/// <see cref="LicenseFiles"/>), or packs one through <c>PackageLicenseFile</c>.
/// </summary>
public sealed class LicenseFileCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.LicenseFile,
        "A license file is present",
        Severity.Block,
        Standards.NuGetLicense,
        "Without the license text in the repository, people who find the source cannot tell on what terms they "
        + "may use it, and the package cannot ship the text its license asks to be distributed with copies.",
        "Add a LICENSE file at the repository root holding the full text of the license (e.g. the SPDX list's text "
        + "for your license id), with your copyright line.");

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var packable = context.Projects.Packable.ToArray();
        if (packable.Length == 0)
        {
            yield return Finding.Skip(LicenseNote.With("No packable project: nothing is published, so no license file is required."));
            yield break;
        }

        var index = new FolderIndex(context.Snapshot.Files);
        foreach (var project in packable)
        {
            var files = LicenseFiles.Nearest(index, project.Path);
            if (files.Count > 0)
            {
                var more = files.Count > 1 ? $" (and {string.Join(", ", files.Skip(1))})" : string.Empty;
                yield return Finding.Pass(
                    LicenseNote.With($"{project.Path}: license file {files[0]}{more}."), project.PackageId, new Evidence(files[0]));
                continue;
            }

            if (project.Value("PackageLicenseFile") is { } packageFile
                && PackedFiles.ItemsPackedAt(project, packageFile).FirstOrDefault(i => context.Snapshot.Files.Exists(i.Path!)) is { } item)
            {
                yield return Finding.Pass(
                    LicenseNote.With($"{project.Path}: packs {item.Path} as its license file {packageFile} ({item.Location})."),
                    project.PackageId,
                    new Evidence(item.Path!), new Evidence(item.Location.Path, item.Location.Line));
                continue;
            }

            yield return Finding.Fail(
                LicenseNote.With($"No license file next to {project.Path}, in a folder above it or at the root (looked for LICENSE, LICENSE.md, LICENSE.txt, COPYING and their variants)."),
                Descriptor.Fix,
                project.PackageId,
                new Evidence(project.Path));
        }
    }
}
