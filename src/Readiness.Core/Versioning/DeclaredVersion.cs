using Readiness.Core.Projects;

namespace Readiness.Core.Versioning;

/// <summary>The version a project declares, the way the .NET SDK computes the package version.</summary>
/// <param name="Value">The version text, or null when nothing is declared (the SDK then uses 1.0.0).</param>
/// <param name="Property">Which property gave it: PackageVersion, Version or VersionPrefix.</param>
/// <param name="Location">Where it is declared.</param>
/// <param name="Unevaluated">Why the value is not certain, if it is not.</param>
public sealed record DeclaredVersion(string? Value, string? Property, SourceLocation? Location, string? Unevaluated)
{
    /// <summary>PackageVersion &gt; Version &gt; VersionPrefix[-VersionSuffix] (NuGet pack targets).</summary>
    public static DeclaredVersion Of(ProjectInfo project)
    {
        ArgumentNullException.ThrowIfNull(project);
        foreach (var name in new[] { "PackageVersion", "Version" })
        {
            if (project.Property(name) is { Value.Length: > 0 } p)
            {
                return new DeclaredVersion(p.Value, name, p.Location, p.Unevaluated);
            }
        }

        if (project.Property("VersionPrefix") is { Value.Length: > 0 } prefix)
        {
            var suffix = project.Property("VersionSuffix");
            var value = suffix is { Value.Length: > 0 } ? $"{prefix.Value}-{suffix.Value}" : prefix.Value;
            return new DeclaredVersion(value, "VersionPrefix", prefix.Location, prefix.Unevaluated ?? suffix?.Unevaluated);
        }

        return new DeclaredVersion(null, null, null, null);
    }
}
