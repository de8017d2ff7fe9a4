using Readiness.Core.Reports;

namespace Readiness.Core.Checks.Registry;

/// <summary>No dependency is two or more major versions behind its newest stable listed version, and none is a
/// version its publisher deprecated (when the registry says).</summary>
public sealed class RegistryDependenciesCurrentCheck : ICheck
{
    public const int MajorsBehind = 2;

    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.RegistryDependenciesCurrent,
        "Dependencies are reasonably current",
        Severity.Info,
        Standards.NuGetDependencies,
        "Consumers who also use a newer major of the same dependency get a conflict (or a silent upgrade past what the "
        + "package was tested with); old majors also stop receiving fixes.",
        "Move the dependency to a current major (or widen the range), and test against it.")
    {
        Settings = ["registry-required"],
    };

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (RegistrySubjects.Unavailable(context) is { } skip)
        {
            yield return skip;
            yield break;
        }

        foreach (var project in context.Projects.Packable)
        {
            var id = project.PackageId;
            foreach (var reference in RegistrySubjects.DeclaredDependencies(project))
            {
                var evidence = RegistrySubjects.Where(reference);
                var (range, problem) = RegistrySubjects.Range(reference);
                if (range?.MinVersion is not { } declared)
                {
                    yield return Finding.Skip($"Dependency {reference.Id}: {problem ?? "its range has no lower bound"}.", id, evidence);
                    continue;
                }

                var (lookup, noAnswer) = RegistrySubjects.Lookup(context, reference.Id, id);
                if (lookup is null)
                {
                    yield return noAnswer! with { Evidence = [evidence] };
                    continue;
                }

                var published = RegistrySubjects.Parsed(lookup);
                var deprecated = published.FirstOrDefault(p => p.Version == declared && p.Entry.Deprecated == true);
                var stable = published.Where(p => !p.Version.IsPrerelease && p.Entry.Listed != false).Select(p => p.Version).ToArray();
                var newest = stable.Length == 0 ? null : stable.Max();
                var text = declared.ToNormalizedString();
                if (deprecated.Entry is not null)
                {
                    yield return Finding.Fail(
                        $"Dependency {reference.Id} {text} is deprecated by its publisher on {context.Registry!.Source}.",
                        newest is null ? Descriptor.Fix : $"Move to {reference.Id} {newest.ToNormalizedString()}, or to the alternative its publisher names.",
                        id,
                        evidence);
                }
                else if (newest is null)
                {
                    yield return Finding.Skip($"Dependency {reference.Id}: the registry lists no stable version to compare with.", id, evidence);
                }
                else if (newest.Major - declared.Major >= MajorsBehind)
                {
                    yield return Finding.Fail(
                        $"Dependency {reference.Id} {text} is {newest.Major - declared.Major} major versions behind {newest.ToNormalizedString()}, its newest stable version.",
                        Descriptor.Fix,
                        id,
                        evidence);
                }
                else
                {
                    yield return Finding.Pass($"Dependency {reference.Id} {text}: the newest stable version is {newest.ToNormalizedString()}.", id, evidence);
                }
            }
        }
    }
}
