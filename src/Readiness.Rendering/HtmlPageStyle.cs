using System.Security.Cryptography;
using System.Text;

namespace Readiness.Rendering;

/// <summary>The page's only style sheet, inline, and the Content-Security-Policy that allows exactly it.</summary>
internal static class HtmlPageStyle
{
    public const string Css = """

:root { color-scheme: light dark; --fg: #1f2328; --bg: #ffffff; --muted: #59636e; --line: #d1d9e0; --head: #f6f8fa; --link: #0969da; }
@media (prefers-color-scheme: dark) {
  :root { --fg: #e6edf3; --bg: #0d1117; --muted: #9198a1; --line: #3d444d; --head: #151b23; --link: #4493f8; }
}
* { box-sizing: border-box; }
body { margin: 0; background: var(--bg); color: var(--fg); font: 15px/1.5 system-ui, -apple-system, "Segoe UI", sans-serif; }
main { max-width: 72rem; margin: 0 auto; padding: 1.5rem; }
h2 { font-size: 1.6rem; margin: 0 0 .5rem; }
h3 { font-size: 1.15rem; margin: 1.75rem 0 .5rem; padding-top: .75rem; border-top: 1px solid var(--line); }
a { color: var(--link); }
table { border-collapse: collapse; width: 100%; margin: 1rem 0; font-size: .92rem; }
th, td { border: 1px solid var(--line); padding: .35rem .6rem; text-align: left; vertical-align: top; }
td:nth-child(-n+2) { white-space: nowrap; }
td:nth-child(n+5) { overflow-wrap: anywhere; }
th { background: var(--head); }
tr:nth-child(even) td { background: var(--head); }
ul { padding-left: 1.5rem; }
.contains-task-list { list-style: none; padding-left: .5rem; }
hr { border: 0; border-top: 1px solid var(--line); margin: 2rem 0 1rem; }
hr + p { color: var(--muted); font-size: .85rem; }

""";

    /// <summary>
    /// Nothing may load or run; the one inline style element is allowed by its hash (CSP Level 3, "hash-source":
    /// https://www.w3.org/TR/CSP3/#grammardef-hash-source).
    /// </summary>
    public static readonly string ContentSecurityPolicy =
        $"default-src 'none'; style-src 'sha256-{Convert.ToBase64String(SHA256.HashData(Encoding.UTF8.GetBytes(Css)))}'; "
        + "base-uri 'none'; form-action 'none'";
}
