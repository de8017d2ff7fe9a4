namespace Readiness.Rendering;

/// <summary>
/// Where each check's documentation page (<c>checklists/checks/ID.md</c> in this repository) is published, for the
/// links that machine formats carry (SARIF <c>helpUri</c>). The base is overridable (<c>READINESS_DOCS_URL</c>) so an
/// organisation can point at its own copy of the pages.
/// </summary>
public sealed class CheckPages
{
    /// <summary>The pages in the project's own repository.</summary>
    public const string DefaultBase = "https://git.example/readiness/readiness/blob/main/checklists/checks/";

    public CheckPages(string? baseUrl = null)
    {
        var chosen = string.IsNullOrWhiteSpace(baseUrl) ? DefaultBase : baseUrl.Trim();
        if (!ReportFacts.IsWebUrl(chosen))
        {
            throw new ArgumentException($"the documentation base must be an absolute http(s) URL, not '{chosen}'", nameof(baseUrl));
        }

        BaseUrl = chosen.EndsWith('/') ? chosen : chosen + "/";
    }

    public string BaseUrl { get; }

    /// <summary>True for an absolute http(s) URL, the only kind of base the pages can be linked from.</summary>
    public static bool IsValidBase(string? baseUrl) => ReportFacts.IsWebUrl(baseUrl?.Trim());

    /// <summary>The absolute URL of the page of <paramref name="checkId"/>.</summary>
    public string For(string checkId)
    {
        ArgumentNullException.ThrowIfNull(checkId);
        return BaseUrl + Uri.EscapeDataString(checkId) + ".md";
    }
}
