using System.Security.Cryptography;
using System.Text;

namespace Readiness.Rendering;

/// <summary>The page's only style sheet, inline, and the Content-Security-Policy that allows exactly it.</summary>
public static class HtmlPageStyle
{
    /// <summary>
    /// Readiness's own look (DEVELOPERS.md, "Look"): warm paper and ink, a slate-teal link; a serif for headings,
    /// the system sans for text, monospace for ids and places. Every text colour meets
    /// WCAG 2.2 AA (4.5:1) on both backgrounds in both schemes (HtmlPageStyleTests computes the ratios).
    /// </summary>
    public const string Css = """

:root { color-scheme: light dark; --ink: #24211d; --paper: #fbf9f4; --quiet: #5e574d; --rule: #d8d0c2; --band: #f2ede3;
  --link: #1d5a73; }
@media (prefers-color-scheme: dark) {
  :root { --ink: #ebe5da; --paper: #1a1a1c; --quiet: #ada597; --rule: #45423c; --band: #25252a;
    --link: #84c4dc; }
}
* { box-sizing: border-box; }
body { margin: 0; background: var(--paper); color: var(--ink); font: 15px/1.55 ui-sans-serif, system-ui, "Noto Sans", sans-serif; }
main { max-width: 70rem; margin: 0 auto; padding: 1.75rem 1.25rem; }
h2, h3 { font-family: Charter, "Bitstream Charter", "Sitka Text", Cambria, Georgia, serif; font-weight: 700; letter-spacing: .01em; }
h2 { font-size: 1.75rem; margin: 0 0 .4rem; padding-bottom: .3rem; border-bottom: 3px double var(--rule); }
h3 { font-size: 1.15rem; margin: 2rem 0 .5rem; padding-left: .6rem; border-left: 4px solid var(--rule); }
a { color: var(--link); text-underline-offset: .15em; }
code { font: .9em ui-monospace, "DejaVu Sans Mono", Menlo, monospace; }
table { border-collapse: collapse; width: 100%; margin: 1rem 0; font-size: .92rem; }
th, td { border-bottom: 1px solid var(--rule); padding: .4rem .6rem; text-align: left; vertical-align: top; }
th { border-bottom: 2px solid var(--ink); font-weight: 600; }
td:nth-child(-n+2) { white-space: nowrap; }
td:nth-child(n+5) { overflow-wrap: anywhere; }
td:nth-child(3), td:nth-child(6) { font-family: ui-monospace, "DejaVu Sans Mono", Menlo, monospace; font-size: .85rem; }
tbody tr:nth-child(odd) td { background: var(--band); }
ul { padding-left: 1.5rem; }
.contains-task-list { list-style: none; padding-left: .5rem; }
hr { border: 0; border-top: 1px solid var(--rule); margin: 2rem 0 1rem; }
hr + p { color: var(--quiet); font-size: .85rem; }

""";

    /// <summary>
    /// Nothing may load or run; the one inline style element is allowed by its hash (CSP Level 3, "hash-source":
    /// https://www.w3.org/TR/CSP3/#grammardef-hash-source).
    /// </summary>
    public static readonly string ContentSecurityPolicy =
        $"default-src 'none'; style-src 'sha256-{Convert.ToBase64String(SHA256.HashData(Encoding.UTF8.GetBytes(Css)))}'; "
        + "base-uri 'none'; form-action 'none'";
}
