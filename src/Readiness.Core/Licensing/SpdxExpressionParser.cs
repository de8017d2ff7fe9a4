using System.Text.RegularExpressions;

namespace Readiness.Core.Licensing;

/// <summary>
/// Parses SPDX license expressions by the grammar of the SPDX 3.0.1 annex
/// (https://spdx.github.io/spdx-spec/v3.0.1/annexes/spdx-license-expressions/): operators <c>AND</c>, <c>OR</c>,
/// <c>WITH</c> all upper or all lower case; binding tightest first <c>+</c>, <c>WITH</c>, <c>AND</c>, <c>OR</c>;
/// <c>WITH</c> applies to a simple expression only; <c>LicenseRef-</c>, <c>DocumentRef-…:LicenseRef-</c> and
/// <c>AdditionRef-</c> references. Syntax only: whether an id is on the SPDX list is <see cref="SpdxLicenseList"/>'s business.
/// </summary>
public static partial class SpdxExpressionParser
{
    /// <summary>
    /// Most tokens read: real expressions hold a handful of terms (the SPDX list's longest ids are under 50
    /// characters); a longer one is refused with a clear error, so no later walk of the tree can be deep.
    /// </summary>
    public const int MaxTokens = 512;

    /// <summary>Deepest parenthesis nesting accepted.</summary>
    public const int MaxDepth = 32;

    [GeneratedRegex(@"^[A-Za-z0-9.\-]+$", RegexOptions.CultureInvariant)]
    private static partial Regex IdString();

    [GeneratedRegex(@"^(?:DocumentRef-[A-Za-z0-9.\-]+:)?LicenseRef-[A-Za-z0-9.\-]+$", RegexOptions.CultureInvariant)]
    private static partial Regex LicenseRef();

    [GeneratedRegex(@"^(?:DocumentRef-[A-Za-z0-9.\-]+:)?AdditionRef-[A-Za-z0-9.\-]+$", RegexOptions.CultureInvariant)]
    private static partial Regex AdditionRef();

    /// <summary>True when <paramref name="text"/> is a syntactically valid expression.</summary>
    public static bool TryParse(string text, out SpdxNode? expression, out string? error)
    {
        ArgumentNullException.ThrowIfNull(text);
        expression = null;
        if (text.Contains('\n', StringComparison.Ordinal) || text.Contains('\r', StringComparison.Ordinal))
        {
            error = "an expression is written on one line";
            return false;
        }

        var tokens = Tokenize(text, out error);
        if (tokens is null)
        {
            return false;
        }

        if (tokens.Count == 0)
        {
            error = "the expression is empty";
            return false;
        }

        if (tokens.Count > MaxTokens)
        {
            error = $"the expression has more than {MaxTokens} terms, operators and parentheses; not read";
            return false;
        }

        var reader = new Reader(tokens);
        expression = reader.ParseOr(out error);
        if (expression is not null && error is null && !reader.AtEnd)
        {
            error = $"unexpected '{reader.Peek}'";
        }

        if (error is not null)
        {
            expression = null;
            return false;
        }

        return true;
    }

    /// <summary>The operator words used in <paramref name="text"/> written in lower case (<c>and</c>, <c>or</c>, <c>with</c>).</summary>
    public static IReadOnlyList<string> LowercaseOperators(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return (Tokenize(text, out _) ?? []).Where(t => t is "and" or "or" or "with").Distinct().ToArray();
    }

    private static List<string>? Tokenize(string text, out string? error)
    {
        error = null;
        var tokens = new List<string>();
        var i = 0;
        while (i < text.Length)
        {
            var c = text[i];
            if (c is ' ' or '\t')
            {
                i++;
            }
            else if (c is '(' or ')')
            {
                tokens.Add(c.ToString());
                i++;
            }
            else if (char.IsAsciiLetterOrDigit(c) || c is '.' or '-' or ':' or '+')
            {
                var start = i;
                while (i < text.Length && (char.IsAsciiLetterOrDigit(text[i]) || text[i] is '.' or '-' or ':' or '+'))
                {
                    i++;
                }

                tokens.Add(text[start..i]);
            }
            else
            {
                error = $"the character '{c}' is not allowed in a license expression";
                return null;
            }
        }

        return tokens;
    }

    private static bool IsOperator(string token, string upper) =>
        token == upper || token == upper.ToLowerInvariant();

    private sealed class Reader(List<string> tokens)
    {
        private int position;
        private int depth;

        public bool AtEnd => position >= tokens.Count;

        public string? Peek => AtEnd ? null : tokens[position];

        public SpdxNode? ParseOr(out string? error)
        {
            var left = ParseAnd(out error);
            while (left is not null && error is null && Peek is { } t && IsOperator(t, "OR"))
            {
                position++;
                var right = ParseAnd(out error);
                left = right is null ? null : new SpdxNode.Or(left, right);
            }

            return left;
        }

        private SpdxNode? ParseAnd(out string? error)
        {
            var left = ParseWith(out error);
            while (left is not null && error is null && Peek is { } t && IsOperator(t, "AND"))
            {
                position++;
                var right = ParseWith(out error);
                left = right is null ? null : new SpdxNode.And(left, right);
            }

            return left;
        }

        private SpdxNode? ParseWith(out string? error)
        {
            if (Peek == "(")
            {
                if (++depth > MaxDepth)
                {
                    error = $"parentheses nested deeper than {MaxDepth} levels";
                    return null;
                }

                position++;
                var inner = ParseOr(out error);
                depth--;
                if (inner is null || error is not null)
                {
                    return null;
                }

                if (Peek != ")")
                {
                    error = "a '(' is not closed";
                    return null;
                }

                position++;
                if (Peek is { } after && IsOperator(after, "WITH"))
                {
                    error = "WITH applies to a single license, not to a parenthesised expression";
                    return null;
                }

                return inner;
            }

            var license = ParseSimple(out error);
            if (license is null || Peek is not { } next || !IsOperator(next, "WITH"))
            {
                return license;
            }

            position++;
            if (Peek is not { } addition || addition is "(" or ")" || IsKeyword(addition))
            {
                error = "WITH must be followed by an exception or AdditionRef- identifier";
                return null;
            }

            if (!IdString().IsMatch(addition) && !AdditionRef().IsMatch(addition))
            {
                error = $"'{addition}' is not a valid exception identifier";
                return null;
            }

            position++;
            return new SpdxNode.With(license, addition);
        }

        private SpdxNode.License? ParseSimple(out string? error)
        {
            error = null;
            if (Peek is not { } token)
            {
                error = "the expression ends where a license was expected";
                return null;
            }

            if (token is "(" or ")" || IsKeyword(token))
            {
                error = $"'{token}' stands where a license was expected";
                return null;
            }

            if (IsMixedCaseOperator(token))
            {
                error = $"the operator '{token}' must be written all upper case or all lower case";
                return null;
            }

            position++;
            if (LicenseRef().IsMatch(token))
            {
                return new SpdxNode.License(token, false);
            }

            var plus = token.EndsWith('+');
            var id = plus ? token[..^1] : token;
            if (!IdString().IsMatch(id))
            {
                error = $"'{token}' is not a valid license identifier";
                return null;
            }

            return new SpdxNode.License(id, plus);
        }

        private static bool IsKeyword(string token) =>
            IsOperator(token, "AND") || IsOperator(token, "OR") || IsOperator(token, "WITH");

        private static bool IsMixedCaseOperator(string token) =>
            !IsKeyword(token) && token.ToUpperInvariant() is "AND" or "OR" or "WITH";
    }
}
