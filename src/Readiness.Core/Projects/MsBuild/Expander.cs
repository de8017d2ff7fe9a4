using System.Text;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// Expands <c>$(Name)</c> references the way MSBuild does at evaluation time: undefined properties are empty,
/// values are taken as they stand at that moment. A small set of property functions is evaluated
/// (<see cref="PropertyFunctions"/>); anything else (<c>$([System.DateTime]::Now)</c>, <c>@(Item)</c>,
/// <c>%(Metadata)</c>, registry reads) is kept as written and reported, never guessed.
/// </summary>
internal sealed class Expander
{
    private readonly PropertyTable properties;
    private readonly PropertyFunctions functions;

    /// <summary>Characters built by expansion so far in this evaluation (bounded by <see cref="MsBuildLimits.MaxExpandedCharacters"/>).</summary>
    private long built;

    public Expander(PropertyTable properties, FileSet files, string projectFolder)
    {
        this.properties = properties;
        functions = new PropertyFunctions(this, files, projectFolder);
    }

    public Expansion Expand(string text, ExpandScope scope)
    {
        if (text.IndexOf('(', StringComparison.Ordinal) < 0)
        {
            return new Expansion(text, null, []);
        }

        var state = new ExpandState();
        var value = Expand(text, scope, state, 0);
        return new Expansion(value, state.Reason, state.Undefined);
    }

    internal string Expand(string text, ExpandScope scope, ExpandState state, int depth)
    {
        if (text.IndexOf('(', StringComparison.Ordinal) < 0)
        {
            return text;
        }

        if (depth > MsBuildLimits.MaxExpansionDepth)
        {
            state.Fail($"{scope.Location}: expressions nested deeper than {MsBuildLimits.MaxExpansionDepth} levels are not evaluated");
            return text;
        }

        if (built > MsBuildLimits.MaxExpandedCharacters)
        {
            // Values that each stay under the per-value cap can still add up (P2 = $(P1)x, P3 = $(P2)x, ...).
            state.Fail($"{scope.Location}: this evaluation has built more than {MsBuildLimits.MaxExpandedCharacters:N0} characters of values; the rest is not evaluated");
            return string.Empty;
        }

        var sb = new StringBuilder(text.Length);
        var i = 0;
        while (i < text.Length)
        {
            var c = text[i];
            if ((c == '$' || c == '@' || c == '%') && i + 1 < text.Length && text[i + 1] == '(')
            {
                var close = FindClose(text, i + 2);
                if (close < 0)
                {
                    // An unclosed reference is literal text for MSBuild too.
                    sb.Append(text, i, text.Length - i);
                    break;
                }

                var raw = text[i..(close + 1)];
                if (c == '$')
                {
                    sb.Append(Reference(text[(i + 2)..close], raw, scope, state, depth));
                }
                else
                {
                    sb.Append(raw);
                    state.Fail(c == '@'
                        ? $"{scope.Location}: item list {raw} is not evaluated"
                        : $"{scope.Location}: item metadata {raw} is not evaluated");
                }

                i = close + 1;
            }
            else
            {
                sb.Append(c);
                i++;
            }

            if (sb.Length > MsBuildLimits.MaxValueLength)
            {
                state.Fail($"{scope.Location}: the value grows beyond {MsBuildLimits.MaxValueLength:N0} characters; cut there");
                built += MsBuildLimits.MaxValueLength;
                return sb.ToString(0, MsBuildLimits.MaxValueLength);
            }
        }

        built += sb.Length;
        return sb.ToString();
    }

    /// <summary>The value of a property (escaped); records taint and undefined names in <paramref name="state"/>.</summary>
    internal string Lookup(string name, ExpandScope scope, ExpandState state)
    {
        if (ThisFile(name, scope.File) is { } reserved)
        {
            return reserved;
        }

        var entry = properties[name];
        if (entry is null)
        {
            state.Undefined.Add(name);
            return string.Empty;
        }

        if (entry.Unevaluated is { } why)
        {
            state.Fail(why);
        }

        if (entry.Undefined is { Count: > 0 } undefined)
        {
            state.Undefined.AddRange(undefined);
        }

        return entry.Value;
    }

    /// <summary>MSBuildThisFile* depend on the file being evaluated, not on the project.</summary>
    internal static string? ThisFile(string name, string file)
    {
        if (!name.StartsWith("MSBuildThisFile", StringComparison.OrdinalIgnoreCase))
        {
            return null;
        }

        var folder = RepoPath.Directory(file);
        var fileName = RepoPath.FileName(file);
        return name.ToUpperInvariant() switch
        {
            "MSBUILDTHISFILE" => fileName,
            "MSBUILDTHISFILEDIRECTORY" => VirtualPaths.Folder(folder),
            "MSBUILDTHISFILEDIRECTORYNOROOT" => VirtualPaths.Folder(folder)[1..],
            "MSBUILDTHISFILEEXTENSION" => Path.GetExtension(fileName),
            "MSBUILDTHISFILEFULLPATH" => VirtualPaths.Full(file),
            "MSBUILDTHISFILENAME" => Path.GetFileNameWithoutExtension(fileName),
            _ => null,
        };
    }

    internal static bool IsName(string s)
    {
        if (s.Length == 0 || !(char.IsAsciiLetter(s[0]) || s[0] == '_'))
        {
            return false;
        }

        foreach (var c in s)
        {
            if (!(char.IsAsciiLetterOrDigit(c) || c == '_' || c == '-'))
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>The index of the ')' closing a group opened just before <paramref name="start"/>, skipping quoted text.</summary>
    internal static int FindClose(string text, int start)
    {
        var depth = 1;
        for (var j = start; j < text.Length; j++)
        {
            var c = text[j];
            if (c is '\'' or '"' or '`')
            {
                var end = text.IndexOf(c, j + 1);
                if (end < 0)
                {
                    return -1;
                }

                j = end;
            }
            else if (c == '(')
            {
                depth++;
            }
            else if (c == ')' && --depth == 0)
            {
                return j;
            }
        }

        return -1;
    }

    private string Reference(string inner, string raw, ExpandScope scope, ExpandState state, int depth)
    {
        var body = inner.Trim();
        if (IsName(body))
        {
            return Lookup(body, scope, state);
        }

        if (functions.TryEvaluate(body, scope, state, depth) is { } value)
        {
            return value;
        }

        state.Fail($"{scope.Location}: {Describe(body, raw)} is not evaluated");
        return raw;
    }

    private static string Describe(string body, string raw) =>
        body.StartsWith("Registry:", StringComparison.OrdinalIgnoreCase) ? $"registry read {raw}" : $"property function {raw}";
}
