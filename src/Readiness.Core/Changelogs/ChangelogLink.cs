namespace Readiness.Core.Changelogs;

/// <summary>A link reference definition such as <c>[1.1.1]: https://git.example/...</c>.</summary>
/// <param name="Label">The label as written, without brackets.</param>
/// <param name="Url">The destination.</param>
/// <param name="Line">1-based line of the definition.</param>
public sealed record ChangelogLink(string Label, string Url, int Line);
