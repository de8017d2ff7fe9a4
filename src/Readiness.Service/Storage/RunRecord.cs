namespace Readiness.Service.Storage;

/// <summary>A stored run: one report on one commit, from the service's worker or from a hook client.</summary>
/// <param name="Id">The run's number.</param>
/// <param name="Repository">owner/name for the service's runs; what the client sent for hook runs.</param>
/// <param name="PullRequest">The pull request, for the service's runs.</param>
/// <param name="Commit">The inspected commit.</param>
/// <param name="Ref">The revision as named (head branch, tag).</param>
/// <param name="Checklist">The checklist applied.</param>
/// <param name="Verdict"><c>ready</c>, <c>not-ready</c> or <c>error</c>.</param>
/// <param name="Summary">One line of counts.</param>
/// <param name="Source"><c>service</c> or <c>hook</c>.</param>
/// <param name="JobId">The job that made it.</param>
/// <param name="ReportJson">The report as JSON (schema readiness-report/1); null for an error run.</param>
/// <param name="ReportMarkdown">The report as Markdown, as commented.</param>
/// <param name="Error">Why there is no report, for an error run.</param>
/// <param name="Waivers">Checks a person bypassed.</param>
/// <param name="Created">When it was stored.</param>
public sealed record RunRecord(
    long Id,
    string Repository,
    int? PullRequest,
    string Commit,
    string? Ref,
    string? Checklist,
    string Verdict,
    string? Summary,
    string Source,
    long? JobId,
    string? ReportJson,
    string? ReportMarkdown,
    string? Error,
    IReadOnlyList<Waiver> Waivers,
    DateTimeOffset Created)
{
    public const string Ready = "ready";
    public const string NotReady = "not-ready";
    public const string ErrorVerdict = "error";
    public const string FromService = "service";
    public const string FromHook = "hook";
}
