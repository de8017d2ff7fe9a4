namespace Readiness.Testing.Hostile;

/// <summary>
/// One hostile or unusual repository: <see cref="Build"/> writes it into a fresh test repository (at a scale: 1 for
/// CI, larger for the bench), <see cref="Args"/> are added to <c>check --offline</c>.
/// </summary>
public sealed record HostileCase(string Name, HostileExpectation Expect, Action<HostileBuild> Build, string[] Args)
{
    public HostileCase(string name, HostileExpectation expect, Action<HostileBuild> build)
        : this(name, expect, build, [])
    {
    }

    /// <summary>Text the report must show, when the case is about a reason being named (checked case-insensitively).</summary>
    public string? MustMention { get; init; }

    public override string ToString() => Name;
}
