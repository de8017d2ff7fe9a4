namespace Readiness.Cli.Commands;

/// <summary>One place a report goes: a format and a file, or standard output when <paramref name="File"/> is null.</summary>
public sealed record ReportTarget(string Format, string? File);
