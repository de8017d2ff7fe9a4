namespace Readiness.Core.Projects;

/// <summary>A <c>None</c>/<c>Content</c> item with <c>Pack="true"</c>: a file that goes into the package.</summary>
/// <param name="Include">The Include as written (after property expansion).</param>
/// <param name="Path">The file it names, repository-relative and normalised (null when it is a wildcard).</param>
/// <param name="PackagePath">The PackagePath metadata, if any.</param>
/// <param name="Location">Where the item is declared.</param>
public sealed record PackItem(string Include, string? Path, string? PackagePath, SourceLocation Location);
