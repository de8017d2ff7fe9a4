using System.Text;
using Readiness.Core.Checklists;
using Readiness.Core.Checks;
using Readiness.Core.Engine;
using Readiness.Core.Reports;

namespace Readiness.Core.Tests.Documentation;

/// <summary>Generates the check index and one page per check from the descriptors (the single source of truth).</summary>
internal static class CheckDocumentation
{
    public static string Page(ICheck check, IReadOnlyList<ResolvedChecklist> checklists)
    {
        var d = check.Descriptor;
        var b = new StringBuilder();
        b.Append("# ").Append(d.Id).Append("\n\n");
        b.Append("**").Append(d.Title).Append("**\n\n");
        b.Append("| | |\n|---|---|\n");
        b.Append("| default severity | `").Append(d.DefaultSeverity.Name()).Append("` |\n");
        b.Append("| standard | [").Append(d.Standard.Name).Append("](").Append(d.Standard.Url).Append(") |\n");
        b.Append("| in checklists | ").Append(string.Join(", ", checklists.Select(c => (c.Name, Planned: c.Checks.FirstOrDefault(p => p.Id == d.Id)))
            .Where(x => x.Planned is not null).Select(x => $"`{x.Name}` ({x.Planned!.Severity.Name()})"))).Append(" |\n\n");
        b.Append("## Why it matters\n\n").Append(d.Why).Append("\n\n");
        b.Append("## How to fix a failure\n\n").Append(d.Fix).Append("\n\n");
        if (d.Settings.Count > 0)
        {
            b.Append("## Settings\n\nRead from `.readiness.yml`, or from the check's `settings:` in a checklist: ")
                .Append(string.Join(", ", d.Settings.Select(x => $"`{x}`"))).Append(".\n\n");
        }

        b.Append("## See also\n\n`readiness explain ").Append(d.Id).Append("` prints this page's essentials; `readiness explain ").Append(d.Id).Append(" --page` prints this page from the installed tool.\n\n");
        b.Append("<!-- Generated from the check's descriptor; edit the descriptor, then regenerate (DEVELOPERS.md). -->\n");
        return b.ToString();
    }

    public static string Index(CheckCatalog catalog)
    {
        var b = new StringBuilder();
        b.Append("# Checks\n\n");
        b.Append("Every check Readiness runs, with its default severity and the standard it enforces. The built-in ");
        b.Append("checklists are `library.yml`, `host-plugin.yml` and `strict.yml` in this folder.\n\n");
        b.Append("| id | title | default | standard |\n|---|---|---|---|\n");
        foreach (var check in catalog.Checks)
        {
            var d = check.Descriptor;
            b.Append($"| [{d.Id}](checks/{d.Id}.md) | {d.Title} | `{d.DefaultSeverity.Name()}` | [{d.Standard.Name}]({d.Standard.Url}) |\n");
        }

        var missing = CheckIds.All.Where(id => catalog.Find(id) is null).Order(StringComparer.Ordinal).ToList();
        if (missing.Count > 0)
        {
            b.Append("\nListed in the catalog but not implemented yet: ").Append(string.Join(", ", missing.Select(m => $"`{m}`"))).Append(".\n");
        }

        b.Append("\n<!-- Generated from the checks' descriptors; regenerate as DEVELOPERS.md says. -->\n");
        return b.ToString();
    }
}
