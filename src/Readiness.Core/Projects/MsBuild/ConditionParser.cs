namespace Readiness.Core.Projects.MsBuild;

/// <summary>
/// Parses MSBuild conditions (learn.microsoft.com/visualstudio/msbuild/msbuild-conditions): <c>or</c>, <c>and</c>,
/// <c>!</c>, parentheses, <c>== != &lt; &gt; &lt;= &gt;=</c>, quoted and bare operands, and function calls.
/// Returns null when the text is not a condition MSBuild would accept.
/// </summary>
internal static class ConditionParser
{
    internal abstract record Node;

    /// <summary>A chain <c>a or b or c</c>, kept flat so a chain of any length is evaluated without recursion.</summary>
    internal sealed record Or(IReadOnlyList<Node> Terms) : Node;

    /// <summary>A chain <c>a and b and c</c>, kept flat like <see cref="Or"/>.</summary>
    internal sealed record And(IReadOnlyList<Node> Terms) : Node;

    internal sealed record Not(Node Operand) : Node;

    internal sealed record Compare(string Operator, Node Left, Node Right) : Node;

    internal sealed record Call(string Name, IReadOnlyList<Node> Arguments) : Node;

    /// <summary>An operand: quoted text or a bare word (a number, a boolean, a property reference).</summary>
    internal sealed record Text(string Value, bool Quoted) : Node;

    private enum Kind
    {
        Open,
        Close,
        Comma,
        Operator,
        Not,
        And,
        Or,
        String,
        Word,
        End,
    }

    private readonly record struct Token(Kind Kind, string Value);

    public static Node? Parse(string condition)
    {
        var tokens = Tokenize(condition);
        if (tokens is null)
        {
            return null;
        }

        var position = 0;
        var node = ParseOr(tokens, ref position, 0);
        return node is not null && tokens[position].Kind == Kind.End ? node : null;
    }

    private static Node? ParseOr(List<Token> t, ref int p, int depth)
    {
        if (depth > MsBuildLimits.MaxExpansionDepth)
        {
            return null;
        }

        var first = ParseAnd(t, ref p, depth);
        if (first is null || t[p].Kind != Kind.Or)
        {
            return first;
        }

        var terms = new List<Node> { first };
        while (t[p].Kind == Kind.Or)
        {
            p++;
            var next = ParseAnd(t, ref p, depth);
            if (next is null)
            {
                return null;
            }

            terms.Add(next);
        }

        return new Or(terms);
    }

    private static Node? ParseAnd(List<Token> t, ref int p, int depth)
    {
        var first = ParseRelation(t, ref p, depth);
        if (first is null || t[p].Kind != Kind.And)
        {
            return first;
        }

        var terms = new List<Node> { first };
        while (t[p].Kind == Kind.And)
        {
            p++;
            var next = ParseRelation(t, ref p, depth);
            if (next is null)
            {
                return null;
            }

            terms.Add(next);
        }

        return new And(terms);
    }

    /// <summary>MSBuild's grammar: a relation joins two factors, and '!' belongs to the factor.</summary>
    private static Node? ParseRelation(List<Token> t, ref int p, int depth)
    {
        var left = ParsePrimary(t, ref p, depth);
        if (left is not null && t[p].Kind == Kind.Operator)
        {
            var op = t[p++].Value;
            var right = ParsePrimary(t, ref p, depth);
            return right is null ? null : new Compare(op, left, right);
        }

        return left;
    }

    private static Node? ParsePrimary(List<Token> t, ref int p, int depth)
    {
        var token = t[p];
        if (depth > MsBuildLimits.MaxExpansionDepth)
        {
            return null;
        }

        switch (token.Kind)
        {
            case Kind.Not:
                p++;
                var operand = ParsePrimary(t, ref p, depth + 1);
                return operand is null ? null : new Not(operand);
            case Kind.Open:
                p++;
                var inner = ParseOr(t, ref p, depth + 1);
                if (inner is null || t[p].Kind != Kind.Close)
                {
                    return null;
                }

                p++;
                return inner;
            case Kind.String:
                p++;
                return new Text(token.Value, Quoted: true);
            case Kind.Word when t[p + 1].Kind == Kind.Open && Expander.IsName(token.Value):
                p += 2;
                var args = new List<Node>();
                if (t[p].Kind != Kind.Close)
                {
                    while (true)
                    {
                        var arg = ParseOr(t, ref p, depth + 1);
                        if (arg is null)
                        {
                            return null;
                        }

                        args.Add(arg);
                        if (t[p].Kind == Kind.Comma)
                        {
                            p++;
                            continue;
                        }

                        break;
                    }
                }

                if (t[p].Kind != Kind.Close)
                {
                    return null;
                }

                p++;
                return new Call(token.Value, args);
            case Kind.Word:
                p++;
                return new Text(token.Value, Quoted: false);
            default:
                return null;
        }
    }

    private static List<Token>? Tokenize(string s)
    {
        var tokens = new List<Token>();
        var i = 0;
        while (i < s.Length)
        {
            var c = s[i];
            if (char.IsWhiteSpace(c))
            {
                i++;
                continue;
            }

            switch (c)
            {
                case '(':
                    tokens.Add(new Token(Kind.Open, "("));
                    i++;
                    continue;
                case ')':
                    tokens.Add(new Token(Kind.Close, ")"));
                    i++;
                    continue;
                case ',':
                    tokens.Add(new Token(Kind.Comma, ","));
                    i++;
                    continue;
                case '\'':
                    var end = QuotedEnd(s, i + 1);
                    if (end < 0)
                    {
                        return null;
                    }

                    tokens.Add(new Token(Kind.String, s[(i + 1)..end]));
                    i = end + 1;
                    continue;
                case '=' or '!' or '<' or '>':
                    var two = i + 1 < s.Length && s[i + 1] == '=';
                    if (c == '=' && !two)
                    {
                        return null;
                    }

                    tokens.Add(c == '!' && !two ? new Token(Kind.Not, "!") : new Token(Kind.Operator, two ? s.Substring(i, 2) : c.ToString()));
                    i += two ? 2 : 1;
                    continue;
            }

            var start = i;
            while (i < s.Length && !char.IsWhiteSpace(s[i]) && s[i] is not ('(' or ')' or ',' or '\'' or '=' or '!' or '<' or '>'))
            {
                if (s[i] is '$' or '@' or '%' && i + 1 < s.Length && s[i + 1] == '(')
                {
                    var close = Expander.FindClose(s, i + 2);
                    if (close < 0)
                    {
                        return null;
                    }

                    i = close + 1;
                    continue;
                }

                i++;
            }

            if (i == start)
            {
                return null;
            }

            var word = s[start..i];
            tokens.Add(word.ToUpperInvariant() switch
            {
                "AND" => new Token(Kind.And, word),
                "OR" => new Token(Kind.Or, word),
                _ => new Token(Kind.Word, word),
            });
        }

        tokens.Add(new Token(Kind.End, string.Empty));
        return tokens;
    }

    /// <summary>The closing quote of a quoted operand; <c>$(...)</c> inside may hold quotes of its own.</summary>
    private static int QuotedEnd(string s, int start)
    {
        for (var i = start; i < s.Length; i++)
        {
            if (s[i] == '\'')
            {
                return i;
            }

            if (s[i] is '$' or '@' or '%' && i + 1 < s.Length && s[i + 1] == '(')
            {
                var close = Expander.FindClose(s, i + 2);
                if (close < 0)
                {
                    return -1;
                }

                i = close;
            }
        }

        return -1;
    }
}
