using System.Globalization;
using static Readiness.Core.Projects.MsBuild.ConditionParser;

namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// Evaluates a condition the way MSBuild does (learn.microsoft.com/visualstudio/msbuild/msbuild-conditions):
/// <c>==</c>/<c>!=</c> compare numerically when both sides are numbers, as booleans when both are booleans, and
/// otherwise as strings ignoring case; <c>&lt;</c>, <c>&gt;</c>, <c>&lt;=</c>, <c>&gt;=</c> need numbers or versions;
/// <c>and</c>/<c>or</c> short-circuit. <c>Exists()</c> asks the file tree. Anything else is "not evaluated" (null).
/// </summary>
internal sealed class ConditionEvaluator(Expander expander, FileSet files, Dictionary<string, Node?> parsed)
{
    public ConditionResult Evaluate(string condition, ExpandScope scope, string existsBase)
    {
        if (condition.Trim().Length == 0)
        {
            return new ConditionResult(true, null, []);
        }

        if (!parsed.TryGetValue(condition, out var node))
        {
            node = Parse(condition);
            parsed[condition] = node;
        }

        if (node is null)
        {
            return new ConditionResult(null, $"{scope.Location}: condition \"{condition}\" cannot be parsed", []);
        }

        var run = new Run(scope, existsBase);
        var value = Eval(node, run);
        return new ConditionResult(value, value is null ? run.Reason ?? $"{scope.Location}: condition \"{condition}\" is not evaluated" : null, run.Undefined);
    }

    private bool? Eval(Node node, Run run) => node switch
    {
        Or or => EvalOr(or, run),
        And and => EvalAnd(and, run),
        Not not => !Eval(not.Operand, run),
        Compare compare => EvalCompare(compare, run),
        Call call => EvalCall(call, run),
        Text text => AsBoolean(text, run),
        _ => null,
    };

    /// <summary>Left to right, stopping at the first true term (MSBuild short-circuits); unknown when a term is and none is true.</summary>
    private bool? EvalOr(Or or, Run run)
    {
        var unknown = false;
        foreach (var term in or.Terms)
        {
            var value = Eval(term, run);
            if (value == true)
            {
                return true;
            }

            unknown |= value is null;
        }

        return unknown ? null : false;
    }

    /// <summary>Left to right, stopping at the first false term; unknown when a term is and none is false.</summary>
    private bool? EvalAnd(And and, Run run)
    {
        var unknown = false;
        foreach (var term in and.Terms)
        {
            var value = Eval(term, run);
            if (value == false)
            {
                return false;
            }

            unknown |= value is null;
        }

        return unknown ? null : true;
    }

    private bool? AsBoolean(Text text, Run run)
    {
        var (value, undefined) = Operand(text, run);
        if (value is null)
        {
            return null;
        }

        run.Undefined.AddRange(undefined);
        var b = Boolean(value);
        if (b is null)
        {
            run.Fail($"{run.Scope.Location}: '{value}' is not a boolean (MSBuild stops with an error here)");
        }

        return b;
    }

    private bool? EvalCompare(Compare compare, Run run)
    {
        var (left, leftUndefined) = Operand(compare.Left, run);
        var (right, rightUndefined) = Operand(compare.Right, run);
        if (left is null || right is null)
        {
            return null;
        }

        var equality = compare.Operator is "==" or "!=";

        // A comparison with '' is the usual "not set yet" test: an undefined property answers it truly.
        if (!equality || right.Length > 0)
        {
            run.Undefined.AddRange(leftUndefined);
        }

        if (!equality || left.Length > 0)
        {
            run.Undefined.AddRange(rightUndefined);
        }

        if (equality)
        {
            bool same;
            if (Number(left) is { } ln && Number(right) is { } rn)
            {
                same = ln == rn;
            }
            else if (Boolean(left) is { } lb && Boolean(right) is { } rb)
            {
                same = lb == rb;
            }
            else
            {
                same = string.Equals(left, right, StringComparison.OrdinalIgnoreCase);
            }

            return compare.Operator == "==" ? same : !same;
        }

        int order;
        if (Number(left) is { } l && Number(right) is { } r)
        {
            order = l.CompareTo(r);
        }
        else if (Version.TryParse(left, out var lv) && Version.TryParse(right, out var rv))
        {
            order = lv.CompareTo(rv);
        }
        else
        {
            run.Fail($"{run.Scope.Location}: '{left}' {compare.Operator} '{right}' compares values that are not both numbers or versions (MSBuild stops with an error here)");
            return null;
        }

        return compare.Operator switch
        {
            "<" => order < 0,
            ">" => order > 0,
            "<=" => order <= 0,
            ">=" => order >= 0,
            _ => null,
        };
    }

    private bool? EvalCall(Call call, Run run)
    {
        var name = call.Name.ToUpperInvariant();
        if (name is not ("EXISTS" or "HASTRAILINGSLASH") || call.Arguments.Count != 1)
        {
            run.Fail($"{run.Scope.Location}: condition function {call.Name}() is not evaluated");
            return null;
        }

        var (value, undefined) = Operand(call.Arguments[0], run);
        if (value is null)
        {
            return null;
        }

        run.Undefined.AddRange(undefined);
        if (name == "HASTRAILINGSLASH")
        {
            return value.EndsWith('/') || value.EndsWith('\\');
        }

        var path = value.Trim();
        if (VirtualPaths.HasWildcard(path))
        {
            run.Fail($"{run.Scope.Location}: Exists('{path}') with a wildcard is not evaluated");
            return null;
        }

        var target = VirtualPaths.Resolve(path, run.ExistsBase);
        switch (target.Kind)
        {
            case PathKind.Empty:
                return false;
            case PathKind.Inside:
                return files.Exists(target.Path);
            default:
                run.Fail($"{run.Scope.Location}: Exists('{path}') looks outside the repository; not evaluated");
                return null;
        }
    }

    /// <summary>An operand's value (unescaped), or null when it cannot be known.</summary>
    private (string? Value, IReadOnlyList<string> Undefined) Operand(Node node, Run run)
    {
        if (node is Text text)
        {
            var expansion = expander.Expand(text.Value, run.Scope);
            if (expansion.Unevaluated is { } why)
            {
                run.Fail(why);
                return (null, expansion.Undefined);
            }

            return (Escaping.Unescape(expansion.Value), expansion.Undefined);
        }

        var b = Eval(node, run);
        return (b is null ? null : b.Value ? "true" : "false", []);
    }

    private static double? Number(string s)
    {
        if (s.StartsWith("0x", StringComparison.OrdinalIgnoreCase))
        {
            return long.TryParse(s.AsSpan(2), NumberStyles.AllowHexSpecifier, CultureInfo.InvariantCulture, out var hex) ? hex : null;
        }

        return double.TryParse(s, NumberStyles.AllowDecimalPoint | NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var d)
            && double.IsFinite(d) ? d : null;
    }

    /// <summary>MSBuild's boolean strings: true/on/yes, false/off/no, each optionally negated with '!'.</summary>
    private static bool? Boolean(string s) => s.ToUpperInvariant() switch
    {
        "TRUE" or "ON" or "YES" or "!FALSE" or "!OFF" or "!NO" => true,
        "FALSE" or "OFF" or "NO" or "!TRUE" or "!ON" or "!YES" => false,
        _ => null,
    };

    private sealed class Run(ExpandScope scope, string existsBase)
    {
        public ExpandScope Scope { get; } = scope;

        public string ExistsBase { get; } = existsBase;

        public string? Reason { get; private set; }

        public List<string> Undefined { get; } = [];

        public void Fail(string reason) => Reason ??= reason;
    }
}
