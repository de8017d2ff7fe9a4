namespace Readiness.Core.Projects.MsBuild;

/// <summary>Item metadata as declared (attribute or child element), unescaped, with its location.</summary>
internal sealed record MetadataValue(string Name, string Value, SourceLocation Location);
