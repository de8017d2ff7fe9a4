using Readiness.Core.Reports;

namespace Readiness.Core.Checks;

/// <summary>What a check is: stable id (<c>group.name</c>), title, default severity, the standard it enforces,
/// and the words <c>readiness explain</c> prints.</summary>
/// <param name="Id">Stable id, e.g. <c>changelog.has-entry</c>.</param>
/// <param name="Title">One line.</param>
/// <param name="DefaultSeverity">Severity when the checklist does not set one.</param>
/// <param name="Standard">The published standard, linked from every report line.</param>
/// <param name="Why">Why it matters to the people who consume the library.</param>
/// <param name="Fix">How to fix a failure, in general terms.</param>
public sealed record CheckDescriptor(
    string Id,
    string Title,
    Severity DefaultSeverity,
    StandardReference Standard,
    string Why,
    string Fix)
{
    public string Group => Id[..Id.IndexOf('.', StringComparison.Ordinal)];

    /// <summary>The settings the check reads: keys of <c>.readiness.yml</c> or of the checklist's <c>settings:</c>.</summary>
    public IReadOnlyList<string> Settings { get; init; } = [];
}
