namespace Readiness.Core.Changelogs;

/// <summary>One changelog to judge: which file, for which package and version.</summary>
/// <param name="Package">The package it covers, or null for the repository as a whole.</param>
/// <param name="Path">The changelog found, or null when there is none.</param>
/// <param name="Version">The version its release section must carry, or null when no version is known.</param>
/// <param name="VersionSource">Where <paramref name="Version"/> came from, for messages.</param>
/// <param name="Searched">Where the changelog was looked for, for messages.</param>
/// <param name="Configured">The path was configured (<c>changelog:</c>) rather than searched for.</param>
public sealed record ChangelogTarget(
    string? Package,
    string? Path,
    string? Version,
    string VersionSource,
    string Searched,
    bool Configured);
