namespace Readiness.Core.Registry;

/// <summary>One published version: normalised version text; listed/deprecated when the feed says (null when unknown).</summary>
public sealed record PublishedVersion(string Version, bool? Listed = null, bool? Deprecated = null);
