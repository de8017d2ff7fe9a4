using Readiness.Core.Licensing;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Checks.License;

/// <summary>
/// The license file's text is recognised as the declared license: texts are normalised after the SPDX matching
/// guidelines and recognised by key passages (<see cref="LicenseTextRecognizer"/>). With <c>OR</c> any one
/// alternative's text suffices, with <c>AND</c> each one's is needed; the texts may sit in one file or in several
/// files of the same folder (e.g. LICENSE-MIT and LICENSE-APACHE). Ids without a reference text are skipped.
/// </summary>
public sealed class LicenseAgreesCheck : ICheck
{
    private const string Expression = "PackageLicenseExpression";
    private const string File = "PackageLicenseFile";

    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.LicenseAgrees,
        "The license file agrees with the declared license",
        Severity.Warn,
        Standards.SpdxMatching,
        "When the metadata says one license and the shipped text says another, consumers cannot tell which terms "
        + "apply; audits flag the package.",
        "Make the license file hold the full text of the declared license (https://spdx.org/licenses/ID.html), or "
        + "correct PackageLicenseExpression to the license the file holds.");

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var packable = context.Projects.Packable.ToArray();
        if (packable.Length == 0)
        {
            yield return Finding.Skip(LicenseNote.With("No packable project: no declared license to compare."));
            yield break;
        }

        var index = new FolderIndex(context.Snapshot.Files);
        foreach (var project in packable)
        {
            yield return Judge(context, index, project);
        }
    }

    private Finding Judge(CheckContext context, FolderIndex index, ProjectInfo project)
    {
        var package = project.PackageId;
        var expression = project.Property(Expression) is { Value.Length: > 0 } e ? e : null;
        var file = project.Property(File) is { Value.Length: > 0 } f ? f : null;
        if ((expression ?? file) is { Unevaluated: { } why } uncertain)
        {
            return Finding.Skip(LicenseNote.With($"{uncertain.Name} could not be evaluated statically ({uncertain.Location}): {why}."), package);
        }

        if (expression is null)
        {
            return file is null
                ? Finding.Skip(LicenseNote.With($"{project.Path} declares no license expression; license.declared reports it."), package, new Evidence(project.Path))
                : JudgePackedFile(context, project, file);
        }

        if (!SpdxExpressionParser.TryParse(expression.Value.Trim(), out var node, out _))
        {
            return Finding.Skip(LicenseNote.With($"{Expression} '{expression.Value}' ({expression.Location}) is not a valid expression; license.declared reports it."), package, At(expression));
        }

        if (string.Equals(expression.Value.Trim(), "UNLICENSED", StringComparison.Ordinal))
        {
            return Finding.Skip(LicenseNote.With($"{Expression} is UNLICENSED ({expression.Location}): no license is granted, so there is no text to compare."), package, At(expression));
        }

        var paths = LicenseFiles.Nearest(index, project.Path);
        if (paths.Count == 0)
        {
            return Finding.Skip(LicenseNote.With($"No license file for {project.Path}; license.file reports it."), package, At(expression));
        }

        var texts = new List<(string Path, LicenseRecognition Recognition)>();
        foreach (var path in paths)
        {
            string? text;
            try
            {
                text = context.Snapshot.Files.ReadText(path);
            }
            catch (FileTooLargeException tooLarge)
            {
                return Finding.Error(LicenseNote.With(tooLarge.Message), package, new Evidence(path));
            }

            texts.Add((path, LicenseTextRecognizer.Recognize(text ?? string.Empty)));
        }

        var recognised = texts.SelectMany(t => t.Recognition.Recognised).Distinct().ToArray();
        var declared = expression.Value.Trim();
        var evidence = paths.Select(p => new Evidence(p)).Append(At(expression)).ToArray();
        var fileNames = string.Join(", ", paths);
        switch (Agrees(node!, recognised))
        {
            case true:
                return Finding.Pass(
                    LicenseNote.With($"{fileNames}: recognised as {string.Join(" + ", recognised.Select(s => s.Name))}, which agrees with {Expression} {declared} ({expression.Location})."),
                    package, evidence);
            case false when recognised.Length > 0:
                return Finding.Fail(
                    LicenseNote.With($"{fileNames}: recognised as {string.Join(" + ", recognised.Select(s => s.Name))}, but {Expression} declares {declared} ({expression.Location})."),
                    Descriptor.Fix.Replace("ID", Expected(node!).FirstOrDefault() ?? "ID", StringComparison.Ordinal),
                    package, evidence);
            case false:
                var closest = texts.Select(t => t.Recognition).Where(r => r.Closest is not null).MaxBy(r => r.ClosestFound);
                var near = closest is null ? string.Empty : $" (closest: {closest.Closest!.Name}, {closest.ClosestFound} of {closest.ClosestTotal} key passages)";
                return Finding.Fail(
                    LicenseNote.With($"{fileNames}: the text is not recognised as {declared} ({expression.Location}), nor as any license text the tool knows{near}."),
                    Descriptor.Fix.Replace("ID", Expected(node!).FirstOrDefault() ?? "ID", StringComparison.Ordinal),
                    package, evidence);
            default:
                var unknown = node!.Licenses.Where(l => LicenseSignatures.For(l.ToString()) is null).Select(l => l.ToString()).Distinct();
                return Finding.Skip(
                    LicenseNote.With($"No reference text for {string.Join(", ", unknown)} (known: {string.Join(", ", LicenseSignatures.All.Select(s => s.Name))}); compare {fileNames} with {declared} by hand."),
                    package, evidence);
        }
    }

    /// <summary>True, false, or null when an id without a reference text decides the outcome.</summary>
    private static bool? Agrees(SpdxNode node, IReadOnlyCollection<LicenseSignature> recognised) => node switch
    {
        SpdxNode.License license => LicenseSignatures.For(license.ToString()) is { } signature ? recognised.Contains(signature) : null,
        SpdxNode.With with => Agrees(with.Subject, recognised),
        SpdxNode.Or or => Either(Agrees(or.Left, recognised), Agrees(or.Right, recognised)),
        SpdxNode.And and => Both(Agrees(and.Left, recognised), Agrees(and.Right, recognised)),
        _ => null,
    };

    private static bool? Either(bool? left, bool? right) =>
        left == true || right == true ? true : left is null || right is null ? null : false;

    private static bool? Both(bool? left, bool? right) =>
        left == false || right == false ? false : left is null || right is null ? null : true;

    private static IEnumerable<string> Expected(SpdxNode node) =>
        node.Licenses.Where(l => LicenseSignatures.For(l.ToString()) is not null).Select(l => SpdxLicenseList.License(l.Id)?.LicenseID ?? l.Id);

    private static Finding JudgePackedFile(CheckContext context, ProjectInfo project, PropertyValue file)
    {
        var package = project.PackageId;
        var packed = PackedFiles.ItemsPackedAt(project, file.Value).FirstOrDefault(i => context.Snapshot.Files.Exists(i.Path!));
        if (packed is null)
        {
            return Finding.Skip(LicenseNote.With($"{File} {file.Value} ({file.Location}) is not packed from an existing file; license.declared reports it."), package, At(file));
        }

        string? text;
        try
        {
            text = context.Snapshot.Files.ReadText(packed.Path!);
        }
        catch (FileTooLargeException tooLarge)
        {
            return Finding.Error(LicenseNote.With(tooLarge.Message), package, new Evidence(packed.Path!));
        }

        var recognition = LicenseTextRecognizer.Recognize(text ?? string.Empty);
        if (recognition.Recognised.Count == 0)
        {
            return Finding.Skip(
                LicenseNote.With($"The license is declared as the file {packed.Path} ({file.Location}), whose text is not one the tool knows; with no declared id there is nothing to compare it with."),
                package, new Evidence(packed.Path!), At(file));
        }

        var note = recognition.Recognised is [{ } only]
            ? $" Note: {Expression} {(only.Ids.Count > 1 ? $"{only.Ids[0]} or {only.Ids[1]}" : only.Ids[0])} would say the same in a form consumers' tools read."
            : string.Empty;
        return Finding.Pass(
            LicenseNote.With($"The license is declared as the file {packed.Path} ({file.Location}), recognised as {recognition.Names}.{note}"),
            package, new Evidence(packed.Path!), At(file));
    }

    private static Evidence At(PropertyValue property) => new(property.Location.Path, property.Location.Line);
}
