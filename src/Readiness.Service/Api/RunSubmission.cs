using System.Text.Json;
using Readiness.Service.Storage;

namespace Readiness.Service.Api;

/// <summary>
/// The body of <c>POST /api/runs</c>: the repository the hook client inspected, its JSON report
/// (schema readiness-report/1) and the checks a person bypassed.
/// </summary>
public sealed record RunSubmission(string? Repository, JsonElement Report, IReadOnlyList<Waiver>? Waivers);
