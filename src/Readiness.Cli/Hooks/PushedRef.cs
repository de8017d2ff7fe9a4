namespace Readiness.Cli.Hooks;

/// <summary>One line git gives a pre-push hook: <c>&lt;local ref&gt; SP &lt;local oid&gt; SP &lt;remote ref&gt; SP &lt;remote oid&gt;</c>
/// (https://git-scm.com/docs/githooks#_pre_push).</summary>
public sealed record PushedRef(string LocalRef, string LocalOid, string RemoteRef, string RemoteOid)
{
    public const string ZeroOid = "0000000000000000000000000000000000000000";

    /// <summary>A deletion: git sends <c>(delete)</c> and an all-zero local oid.</summary>
    public bool IsDelete => LocalOid.All(c => c == '0');

    /// <summary>The remote ref did not exist before this push (all-zero remote oid).</summary>
    public bool IsNew => RemoteOid.All(c => c == '0');

    public string? TagName => RemoteRef.StartsWith("refs/tags/", StringComparison.Ordinal) ? RemoteRef["refs/tags/".Length..] : null;

    /// <summary>The local tag's name when a local tag is pushed (<c>git push origin v1.2.0</c>), else null.</summary>
    public string? LocalTagName => LocalRef.StartsWith("refs/tags/", StringComparison.Ordinal) ? LocalRef["refs/tags/".Length..] : null;

    public string? BranchName => RemoteRef.StartsWith("refs/heads/", StringComparison.Ordinal) ? RemoteRef["refs/heads/".Length..] : null;

    /// <summary>Parses the hook's standard input; malformed lines are returned as errors, not guessed.</summary>
    public static (IReadOnlyList<PushedRef> Refs, IReadOnlyList<string> Errors) Parse(string input)
    {
        ArgumentNullException.ThrowIfNull(input);
        var refs = new List<PushedRef>();
        var errors = new List<string>();
        foreach (var raw in input.Split('\n'))
        {
            var line = raw.TrimEnd('\r');
            if (line.Length == 0)
            {
                continue;
            }

            var parts = line.Split(' ');
            if (parts.Length != 4 || !IsOid(parts[1]) || !IsOid(parts[3]))
            {
                errors.Add($"unexpected pre-push input line: '{line}'");
                continue;
            }

            refs.Add(new PushedRef(parts[0], parts[1], parts[2], parts[3]));
        }

        return (refs, errors);
    }

    private static bool IsOid(string text) => text.Length is 40 or 64 && text.All(Uri.IsHexDigit);
}
