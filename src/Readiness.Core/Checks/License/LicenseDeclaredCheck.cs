using Readiness.Core.Licensing;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Checks.License;

/// <summary>
/// Each packable project declares its license the way NuGet reads it: a <c>PackageLicenseExpression</c> NuGet.Packaging
/// accepts (standard SPDX ids, none deprecated, upper-case operators), or a <c>PackageLicenseFile</c> that names a
/// file packed into the package. <c>PackageLicenseUrl</c> alone is deprecated (nuspec reference) and fails.
/// </summary>
public sealed class LicenseDeclaredCheck : ICheck
{
    private const string Expression = "PackageLicenseExpression";
    private const string File = "PackageLicenseFile";
    private const string Url = "PackageLicenseUrl";

    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.LicenseDeclared,
        "The package declares a valid license",
        Severity.Block,
        Standards.Spdx,
        "Consumers' tools and policies read the package's license metadata to decide whether they may use it; a "
        + "missing, malformed or deprecated declaration makes the package unusable where licenses are audited.",
        "Set <PackageLicenseExpression> to an SPDX expression such as MIT or Apache-2.0, or pack the license text and "
        + "name it with <PackageLicenseFile>; remove <PackageLicenseUrl>.")
    {
        Settings = ["publish-to"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var packable = context.Projects.Packable.ToArray();
        if (packable.Length == 0)
        {
            yield return Finding.Skip(LicenseNote.With("No packable project: no package declares a license."));
            yield break;
        }

        var toNuGetOrg = context.Parameters.String("publish-to") is { } feed && feed.Contains("api.nuget.org", StringComparison.OrdinalIgnoreCase);
        foreach (var project in packable)
        {
            yield return Judge(context, project, toNuGetOrg);
        }
    }

    private Finding Judge(CheckContext context, ProjectInfo project, bool toNuGetOrg)
    {
        var package = project.PackageId;
        var expression = Declared(project, Expression);
        var file = Declared(project, File);
        var url = Declared(project, Url);
        foreach (var property in new[] { expression, file, url })
        {
            if (property is { Unevaluated: { } why })
            {
                return Finding.Skip(
                    LicenseNote.With($"{property.Name} could not be evaluated statically ({property.Location}): {why}."), package, At(property));
            }
        }

        if (expression is not null && file is not null)
        {
            return Finding.Fail(
                LicenseNote.With($"{project.Path} sets both {Expression} ({expression.Location}) and {File} ({file.Location}); a package has one license element, and pack refuses both (from memory: NU5033)."),
                "Keep one: the expression when the license is a standard one, the file for a custom text.",
                package, At(expression), At(file));
        }

        if (url is not null && (expression ?? file) is { } modern)
        {
            return Finding.Fail(
                LicenseNote.With($"{project.Path} sets the deprecated {Url} ({url.Location}) beside {modern.Name}; pack refuses the combination (from memory: NU5035)."),
                $"Remove {Url}: the {modern.Name} already declares the license.",
                package, At(url), At(modern));
        }

        if (expression is not null)
        {
            var verdict = LicenseExpressionJudge.Judge(expression.Value);
            if (!verdict.Accepted)
            {
                return Finding.Fail(LicenseNote.With($"{Expression} ({expression.Location}): {verdict.Message}"), verdict.Hint ?? Descriptor.Fix, package, At(expression));
            }

            if (verdict.NotApproved.Count > 0)
            {
                var ids = string.Join(", ", verdict.NotApproved);
                var message = $"{Expression} ({expression.Location}): {verdict.Message} {ids} is neither OSI-approved nor FSF-libre, and nuget.org accepts only such licenses.";
                return toNuGetOrg
                    ? Finding.Fail(LicenseNote.With(message), "Choose an OSI-approved license, or publish to a registry that accepts this one.", package, At(expression))
                    : Finding.Pass(LicenseNote.With(message), package, At(expression));
            }

            return Finding.Pass(LicenseNote.With($"{Expression} ({expression.Location}): {verdict.Message}"), package, At(expression));
        }

        if (file is not null)
        {
            return JudgeFile(context, project, file);
        }

        if (url is not null)
        {
            return Finding.Fail(
                LicenseNote.With($"{project.Path} declares its license only with {Url} ({url.Location}), which the nuspec reference deprecates: consumers' tools cannot tell what license a URL holds."),
                $"Replace {Url} with <{Expression}> (an SPDX id such as MIT), or pack the text and name it with <{File}>.",
                package, At(url));
        }

        return Finding.Fail(
            LicenseNote.With($"{project.Path} declares no license ({Expression}, {File} and {Url} are all unset)."),
            Descriptor.Fix,
            package,
            new Evidence(project.Path));
    }

    private Finding JudgeFile(CheckContext context, ProjectInfo project, PropertyValue file)
    {
        var files = context.Snapshot.Files;
        var package = project.PackageId;
        var items = PackedFiles.ItemsPackedAt(project, file.Value);
        if (items.FirstOrDefault(i => files.Exists(i.Path!)) is { } packed)
        {
            return Finding.Pass(
                LicenseNote.With($"{File} ({file.Location}) names {file.Value}, packed from {packed.Path} ({packed.Location})."),
                package, At(file), new Evidence(packed.Location.Path, packed.Location.Line));
        }

        var packHint = $"Pack the file: <None Include=\"PATH/TO/{RepoPath.FileName(file.Value.Replace('\\', '/'))}\" Pack=\"true\" PackagePath=\"\\\" /> (PackagePath \"\\\" is the package root).";
        if (items.Count > 0)
        {
            var missing = items[0];
            return Finding.Fail(
                LicenseNote.With($"{File} ({file.Location}) names {file.Value}, packed from {missing.Path} ({missing.Location}), which does not exist."),
                "Point the Pack item's Include at the license file's real path.",
                package, At(file), new Evidence(missing.Location.Path, missing.Location.Line));
        }

        if (project.PackItems.FirstOrDefault(i => i.Path is null) is { } wildcard)
        {
            return Finding.Skip(
                LicenseNote.With($"{File} ({file.Location}) names {file.Value}; it is packed, if at all, by the wildcard item '{wildcard.Include}' ({wildcard.Location}), which is not expanded statically."),
                package, At(file));
        }

        var candidate = RepoPath.Combine(project.Folder, file.Value);
        return files.Exists(candidate)
            ? Finding.Fail(
                LicenseNote.With($"{File} ({file.Location}) names {file.Value}; {candidate} exists but is not packed, so the package would lack its license (pack refuses it; from memory: NU5030)."),
                packHint, package, At(file))
            : Finding.Fail(
                LicenseNote.With($"{File} ({file.Location}) names {file.Value}, but no Pack item puts a file there and {candidate} does not exist."),
                packHint, package, At(file));
    }

    private static PropertyValue? Declared(ProjectInfo project, string name) =>
        project.Property(name) is { } p && (p.Value.Trim().Length > 0 || p.Unevaluated is not null) ? p : null;

    private static Evidence At(PropertyValue property) => new(property.Location.Path, property.Location.Line);
}
