using Readiness.Core.Reports;

namespace Readiness.Core.Checklists;

/// <summary>Something a person must confirm before the release (with --confirm ID or a ticked box).</summary>
public sealed record ManualItem(string Id, string Text, Severity Severity);
