using NuGet.Versioning;
using Readiness.Core.Reports;
using Readiness.Core.Versioning;

namespace Readiness.Core.Checks.Version;

/// <summary>Every declared version (and the tag's) is valid SemVer 2.0.0 as NuGet normalises it.</summary>
public sealed class VersionWellFormedCheck : ICheck
{
    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.VersionWellFormed,
        "Versions are valid SemVer 2.0.0",
        Severity.Block,
        Standards.SemVer,
        "Consumers' tools order and resolve versions by SemVer precedence; a malformed version sorts wrongly, "
        + "is normalised into something else by the registry, or is refused.",
        "Write the version as MAJOR.MINOR.PATCH with an optional -prerelease label and +build metadata, without "
        + "leading zeros; use a fourth number only if the checklist allows it (settings: allow-four-parts: true).")
    {
        Settings = ["allow-four-parts"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var allowFour = context.Parameters.Bool("allow-four-parts");
        if (context.Release.TagVersion is { } tagVersion)
        {
            yield return Judge(tagVersion, $"tag {context.Release.Tag!.Name}", null, allowFour, null);
        }
        else if (context.Release.VersionSource == ReleaseFacts.VersionOptionSource && context.Release.Version is { } given)
        {
            yield return Judge(given, "--version", null, allowFour, null);
        }

        foreach (var project in context.Projects.Packable)
        {
            var declared = DeclaredVersion.Of(project);
            var evidence = declared.Location is { } l ? new Evidence(l.Path, l.Line) : new Evidence(project.Path);
            if (VersionSourceDetector.ExternalSource(project, context.Snapshot.Files, declared) is { } external)
            {
                // The package gets the release's version, judged above, never the SDK default or a placeholder.
                yield return Finding.Pass($"Not judged on its own: {external}; the release's version is judged instead.", project.PackageId, evidence);
            }
            else if (declared.Value is null)
            {
                yield return Finding.Skip("No version declared (the SDK would use 1.0.0).", project.PackageId, evidence);
            }
            else if (declared.Unevaluated is { } why)
            {
                yield return Finding.Skip($"{declared.Property} could not be evaluated statically: {why}.", project.PackageId, evidence);
            }
            else
            {
                yield return Judge(declared.Value, declared.Property!, project.PackageId, allowFour, evidence);
            }
        }
    }

    private Finding Judge(string text, string what, string? package, bool allowFour, Evidence? evidence)
    {
        var ev = evidence is null ? [] : new[] { evidence };
        var problem = SemVerText.Problem(text, allowFour);
        if (problem is null)
        {
            var normalized = NuGetVersion.Parse(text).ToNormalizedString();
            return new Finding(CheckStatus.Pass, $"{what}: {text} is valid SemVer 2.0.0 (NuGet: {normalized}).", null, package, ev);
        }

        return new Finding(CheckStatus.Fail, $"{what}: '{text}' is not a valid version: {problem}.", Descriptor.Fix, package, ev);
    }
}
