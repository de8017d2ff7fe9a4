using Readiness.Core.Configuration;
using Readiness.Core.Reports;

namespace Readiness.Core.Checklists;

/// <summary>A check as the resolved checklist runs it: its severity and merged parameters.</summary>
public sealed record PlannedCheck(string Id, Severity Severity, IReadOnlyDictionary<string, ConfigNode> With);
