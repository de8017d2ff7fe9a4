using Readiness.Core.Configuration;
using Readiness.Core.Reports;

namespace Readiness.Core.Checklists;

/// <summary>A checklist's (or repository configuration's) settings for one check.</summary>
/// <param name="Severity">The severity to apply, or null for the check's default.</param>
/// <param name="Off">The check is dropped (<c>severity: off</c>).</param>
/// <param name="With">The check's parameters.</param>
/// <param name="Mark">Where the settings are written.</param>
public sealed record CheckSettings(Severity? Severity, bool Off, IReadOnlyDictionary<string, ConfigNode> With, ConfigMark Mark);
