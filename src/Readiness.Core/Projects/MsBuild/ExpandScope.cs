namespace Readiness.Core.Projects.MsBuild;

/// <summary>Where text is expanded: the file that holds it (for MSBuildThisFile*) and the declaration's location.</summary>
internal readonly record struct ExpandScope(string File, SourceLocation Location);
