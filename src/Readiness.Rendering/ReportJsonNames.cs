namespace Readiness.Rendering;

/// <summary>Field names of the JSON report, schema <c>readiness-report/1</c> (cli.md). Part of the contract.</summary>
internal static class ReportJsonNames
{
    public const string Schema = "schema";
    public const string Ready = "ready";
    public const string Subject = "subject";
    public const string Repository = "repository";
    public const string Commit = "commit";
    public const string Ref = "ref";
    public const string Tag = "tag";
    public const string Version = "version";
    public const string Checklist = "checklist";
    public const string Inspected = "inspected";
    public const string Summary = "summary";
    public const string Blocking = "blocking";
    public const string Results = "results";
    public const string Check = "check";
    public const string Title = "title";
    public const string Status = "status";
    public const string Severity = "severity";
    public const string Package = "package";
    public const string Message = "message";
    public const string Hint = "hint";
    public const string Evidence = "evidence";
    public const string Path = "path";
    public const string Line = "line";
    public const string Standard = "standard";
    public const string Name = "name";
    public const string Url = "url";

    // Added to the cli.md example; the contract allows new fields.
    public const string GeneratedAt = "generatedAt";
    public const string Notes = "notes";
    public const string SchemaVersion = "schemaVersion";

    public const string InspectedCommit = "commit";
    public const string InspectedWorktree = "worktree";
}
