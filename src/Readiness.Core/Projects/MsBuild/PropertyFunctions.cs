using System.Globalization;
using NuGet.Frameworks;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// The property functions evaluated statically, because they are pure and common in project trees:
/// <c>[MSBuild]::GetPathOfFileAbove</c> / <c>GetDirectoryNameOfFileAbove</c> (parent Directory.Build.props chains),
/// <c>ValueOrDefault</c>, <c>EnsureTrailingSlash</c>, the target-framework and version helpers, and a few string
/// methods on a property (<c>$(TargetFramework.StartsWith('net4'))</c>). Everything else is left unevaluated.
/// Semantics follow MSBuild's IntrinsicFunctions (learn.microsoft.com/visualstudio/msbuild/property-functions).
/// </summary>
internal sealed class PropertyFunctions(Expander expander, FileSet files, string projectFolder)
{
    private static readonly string[] IntrinsicTypes = ["MSBuild", "Microsoft.Build.Evaluation.IntrinsicFunctions"];

    /// <summary>The function's result (escaped), or null when it is not one evaluated here.</summary>
    public string? TryEvaluate(string body, ExpandScope scope, ExpandState state, int depth)
    {
        if (body.StartsWith('['))
        {
            return Static(body, scope, state, depth);
        }

        var dot = body.IndexOf('.', StringComparison.Ordinal);
        return dot > 0 && Expander.IsName(body[..dot].Trim()) ? Instance(body[..dot].Trim(), body[(dot + 1)..], scope, state, depth) : null;
    }

    private string? Static(string body, ExpandScope scope, ExpandState state, int depth)
    {
        var close = body.IndexOf(']', StringComparison.Ordinal);
        if (close < 0 || !IntrinsicTypes.Contains(body[1..close].Trim(), StringComparer.OrdinalIgnoreCase))
        {
            return null;
        }

        var rest = body[(close + 1)..].TrimStart();
        if (!rest.StartsWith("::", StringComparison.Ordinal) || !TryCall(rest[2..], out var name, out var rawArgs))
        {
            return null;
        }

        var args = Arguments(rawArgs, scope, state, depth);
        if (args is null)
        {
            return null;
        }

        return name.ToUpperInvariant() switch
        {
            "GETPATHOFFILEABOVE" when args.Count is 1 or 2 =>
                PathOfFileAbove(args[0], args.Count == 2 ? args[1] : VirtualPaths.Folder(RepoPath.Directory(scope.File)), scope, state),
            "GETDIRECTORYNAMEOFFILEABOVE" when args.Count == 2 =>
                FolderOfFileAbove(args[0], args[1], scope, state, out var found) ? (found is null ? string.Empty : VirtualPaths.Full(found)) : null,
            "VALUEORDEFAULT" when args.Count == 2 => args[0].Length > 0 ? args[0] : args[1],
            "ENSURETRAILINGSLASH" when args.Count == 1 =>
                args[0].Length == 0 || args[0].EndsWith('/') || args[0].EndsWith('\\') ? args[0] : args[0] + "/",
            "GETTARGETFRAMEWORKIDENTIFIER" when args.Count == 1 => Framework(args[0])?.Framework,
            "GETTARGETFRAMEWORKVERSION" when args.Count is 1 or 2 => FrameworkVersion(args),
            "ISTARGETFRAMEWORKCOMPATIBLE" when args.Count == 2 =>
                Framework(args[0]) is { } target && Framework(args[1]) is { } candidate
                    ? Bool(DefaultCompatibilityProvider.Instance.IsCompatible(target, candidate))
                    : null,
            "VERSIONEQUALS" when args.Count == 2 => CompareVersions(args, c => c == 0),
            "VERSIONNOTEQUALS" when args.Count == 2 => CompareVersions(args, c => c != 0),
            "VERSIONGREATERTHAN" when args.Count == 2 => CompareVersions(args, c => c > 0),
            "VERSIONGREATERTHANOREQUALS" when args.Count == 2 => CompareVersions(args, c => c >= 0),
            "VERSIONLESSTHAN" when args.Count == 2 => CompareVersions(args, c => c < 0),
            "VERSIONLESSTHANOREQUALS" when args.Count == 2 => CompareVersions(args, c => c <= 0),
            _ => null,
        };
    }

    private string? Instance(string property, string call, ExpandScope scope, ExpandState state, int depth)
    {
        var trimmed = call.Trim();
        if (string.Equals(trimmed, "Length", StringComparison.Ordinal))
        {
            return expander.Lookup(property, scope, state).Length.ToString(CultureInfo.InvariantCulture);
        }

        if (!TryCall(trimmed, out var name, out var rawArgs))
        {
            return null;
        }

        var args = Arguments(rawArgs, scope, state, depth);
        if (args is null)
        {
            return null;
        }

        var value = Escaping.Unescape(expander.Lookup(property, scope, state));
        return (name, args.Count) switch
        {
            ("StartsWith", 1) => Bool(value.StartsWith(args[0], StringComparison.Ordinal)),
            ("EndsWith", 1) => Bool(value.EndsWith(args[0], StringComparison.Ordinal)),
            ("Contains", 1) => Bool(value.Contains(args[0], StringComparison.Ordinal)),
            ("ToLower" or "ToLowerInvariant", 0) => value.ToLowerInvariant(),
            ("ToUpper" or "ToUpperInvariant", 0) => value.ToUpperInvariant(),
            ("Trim", 0) => value.Trim(),
            ("Replace", 2) when args[0].Length > 0 => BoundedReplace(value, args[0], args[1], scope, state),
            _ => null,
        };
    }

    /// <summary>
    /// <c>Replace</c> with its result's length computed first: a result longer than
    /// <see cref="MsBuildLimits.MaxValueLength"/> is never built (the value is left unevaluated, with the reason).
    /// </summary>
    private static string? BoundedReplace(string value, string old, string replacement, ExpandScope scope, ExpandState state)
    {
        long count = 0;
        for (var at = value.IndexOf(old, StringComparison.Ordinal); at >= 0; at = value.IndexOf(old, at + old.Length, StringComparison.Ordinal))
        {
            count++;
        }

        if (value.Length + (count * (replacement.Length - (long)old.Length)) > MsBuildLimits.MaxValueLength)
        {
            state.Fail($"{scope.Location}: Replace would grow the value beyond {MsBuildLimits.MaxValueLength:N0} characters; not evaluated");
            return null;
        }

        return value.Replace(old, replacement, StringComparison.Ordinal);
    }

    /// <summary>Splits <c>Name(args)</c>; false when anything follows the closing parenthesis (a chained call).</summary>
    private static bool TryCall(string text, out string name, out string args)
    {
        name = args = string.Empty;
        var open = text.IndexOf('(', StringComparison.Ordinal);
        if (open <= 0)
        {
            return false;
        }

        var close = Expander.FindClose(text, open + 1);
        if (close < 0 || text[(close + 1)..].Trim().Length > 0)
        {
            return false;
        }

        name = text[..open].Trim();
        args = text[(open + 1)..close];
        return Expander.IsName(name);
    }

    /// <summary>Arguments split on top-level commas, unquoted, expanded and unescaped; null when one is not certain.</summary>
    private List<string>? Arguments(string raw, ExpandScope scope, ExpandState state, int depth)
    {
        var result = new List<string>();
        if (raw.Trim().Length == 0)
        {
            return result;
        }

        var start = 0;
        var nesting = 0;
        for (var i = 0; i <= raw.Length; i++)
        {
            if (i < raw.Length)
            {
                var c = raw[i];
                if (c is '\'' or '"' or '`')
                {
                    var end = raw.IndexOf(c, i + 1);
                    if (end < 0)
                    {
                        return null;
                    }

                    i = end;
                    continue;
                }

                if (c == '(')
                {
                    nesting++;
                }
                else if (c == ')')
                {
                    nesting--;
                }

                if (c != ',' || nesting > 0)
                {
                    continue;
                }
            }

            var arg = raw[start..i].Trim();
            if (arg.Length >= 2 && arg[0] is '\'' or '"' or '`' && arg[^1] == arg[0])
            {
                arg = arg[1..^1];
            }

            var inner = new ExpandState();
            var value = expander.Expand(arg, scope, inner, depth + 1);
            state.Undefined.AddRange(inner.Undefined);
            if (inner.Reason is { } why)
            {
                state.Fail(why);
                return null;
            }

            result.Add(Escaping.Unescape(value));
            start = i + 1;
        }

        return result;
    }

    private string? PathOfFileAbove(string file, string start, ExpandScope scope, ExpandState state) =>
        FolderOfFileAbove(start, file, scope, state, out var found)
            ? (found is null ? string.Empty : VirtualPaths.Full(RepoPath.Combine(found, file)))
            : null;

    /// <summary>
    /// Searches <paramref name="file"/> from <paramref name="start"/> upwards to the repository root; false when the
    /// start is outside the repository (not evaluated). <paramref name="found"/> is the repository-relative folder.
    /// </summary>
    private bool FolderOfFileAbove(string start, string file, ExpandScope scope, ExpandState state, out string? found)
    {
        found = null;
        var from = VirtualPaths.Resolve(start, projectFolder);
        if (from.Kind == PathKind.Outside || file.Trim().Length == 0)
        {
            state.Fail($"{scope.Location}: a search for '{file}' from '{start}' outside the repository is not evaluated");
            return false;
        }

        var folder = from.Path;
        while (true)
        {
            if (files.FileExists(RepoPath.Combine(folder, file.Trim())))
            {
                found = folder;
                return true;
            }

            if (folder.Length == 0)
            {
                return true;
            }

            folder = RepoPath.Directory(folder);
        }
    }

    private static NuGetFramework? Framework(string tfm)
    {
        if (tfm.Trim().Length == 0)
        {
            return null;
        }

        try
        {
            var framework = NuGetFramework.Parse(tfm.Trim());
            return framework.IsUnsupported ? null : framework;
        }
        catch (ArgumentException)
        {
            return null;
        }
    }

    private static string? FrameworkVersion(List<string> args)
    {
        if (Framework(args[0]) is not { } framework)
        {
            return null;
        }

        var min = 2;
        if (args.Count == 2 && !int.TryParse(args[1], NumberStyles.None, CultureInfo.InvariantCulture, out min))
        {
            return null;
        }

        var v = framework.Version;
        var parts = v.Revision != 0 ? 4 : v.Build != 0 ? 3 : v.Minor != 0 ? 2 : 1;
        return v.ToString(Math.Clamp(Math.Max(parts, min), 1, 4));
    }

    private static string? CompareVersions(List<string> args, Func<int, bool> test) =>
        SimpleVersion(args[0]) is { } a && SimpleVersion(args[1]) is { } b ? Bool(test(a.CompareTo(b))) : null;

    /// <summary>MSBuild's lenient version form: optional leading 'v', 1-4 numeric parts, anything after '-' or '+' ignored.</summary>
    internal static Version? SimpleVersion(string text)
    {
        var s = text.Trim();
        if (s.StartsWith('v') || s.StartsWith('V'))
        {
            s = s[1..];
        }

        var cut = s.IndexOfAny(['-', '+']);
        if (cut >= 0)
        {
            s = s[..cut];
        }

        var parts = s.Split('.');
        if (parts.Length is < 1 or > 4)
        {
            return null;
        }

        var numbers = new int[4];
        for (var i = 0; i < parts.Length; i++)
        {
            if (!int.TryParse(parts[i], NumberStyles.None, CultureInfo.InvariantCulture, out numbers[i]))
            {
                return null;
            }
        }

        return new Version(numbers[0], numbers[1], numbers[2], numbers[3]);
    }

    private static string Bool(bool value) => value ? "True" : "False";
}
