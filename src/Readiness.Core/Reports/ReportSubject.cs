namespace Readiness.Core.Reports;

/// <summary>What was inspected.</summary>
public sealed record ReportSubject(
    string Repository,
    string Commit,
    string Ref,
    string? Tag,
    string? Version,
    string Checklist,
    InspectionKind Inspected);
