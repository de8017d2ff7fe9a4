using Readiness.Core.Licensing;

namespace Readiness.Core.Tests.Licensing;

public sealed class SpdxExpressionParserTests
{
    [Fact]
    public void AndBindsTighterThanOr()
    {
        // SPDX 3.0.1 annex (standards.md oracle 9): "LGPL-2.1-only OR BSD-3-Clause AND MIT" means
        // LGPL-2.1-only OR (BSD-3-Clause AND MIT).
        Assert.True(SpdxExpressionParser.TryParse("LGPL-2.1-only OR BSD-3-Clause AND MIT", out var node, out _));

        var or = Assert.IsType<SpdxNode.Or>(node);
        Assert.Equal(new SpdxNode.License("LGPL-2.1-only", false), or.Left);
        var and = Assert.IsType<SpdxNode.And>(or.Right);
        Assert.Equal(new SpdxNode.License("BSD-3-Clause", false), and.Left);
        Assert.Equal(new SpdxNode.License("MIT", false), and.Right);
    }

    [Fact]
    public void WithBindsTighterThanAnd()
    {
        // SPDX annex: binding order +, WITH, AND, OR; oracle 9: GPL-2.0-or-later WITH Bison-exception-2.2 is valid.
        Assert.True(SpdxExpressionParser.TryParse("GPL-2.0-or-later WITH Bison-exception-2.2 AND MIT", out var node, out _));

        var and = Assert.IsType<SpdxNode.And>(node);
        Assert.Equal(new SpdxNode.With(new SpdxNode.License("GPL-2.0-or-later", false), "Bison-exception-2.2"), and.Left);
    }

    [Fact]
    public void ParenthesesOverridePrecedence()
    {
        Assert.True(SpdxExpressionParser.TryParse("(MIT OR Apache-2.0) AND BSD-2-Clause", out var node, out _));

        Assert.IsType<SpdxNode.Or>(Assert.IsType<SpdxNode.And>(node).Left);
    }

    [Theory]
    // Valid by the SPDX 3.0.1 annex grammar.
    [InlineData("MIT", true)]
    [InlineData("GPL-2.0+", true)]
    [InlineData("MIT or Apache-2.0", true)]
    [InlineData("mit and apache-2.0", true)]
    [InlineData("LicenseRef-Bramble-Custom", true)]
    [InlineData("DocumentRef-spdx-tool-1.2:LicenseRef-MIT-Style-2", true)]
    [InlineData("GPL-2.0-or-later WITH AdditionRef-Bramble-exception", true)]
    [InlineData("((MIT))", true)]
    // Invalid: operators in mixed case, WITH after a compound, unbalanced, dangling operator, separators.
    [InlineData("MIT Or Apache-2.0", false)]
    [InlineData("(MIT OR Apache-2.0) WITH Classpath-exception-2.0", false)]
    [InlineData("(MIT", false)]
    [InlineData("MIT)", false)]
    [InlineData("MIT AND", false)]
    [InlineData("AND MIT", false)]
    [InlineData("MIT Apache-2.0", false)]
    [InlineData("MIT/Apache-2.0", false)]
    [InlineData("MIT, Apache-2.0", false)]
    [InlineData("GPL-2.0 +", false)]
    [InlineData("MIT WITH", false)]
    [InlineData("", false)]
    [InlineData("MIT\nOR Apache-2.0", false)]
    public void Grammar(string expression, bool valid)
    {
        Assert.Equal(valid, SpdxExpressionParser.TryParse(expression, out var node, out var error));
        Assert.Equal(valid, node is not null);
        Assert.Equal(valid, error is null);
    }

    [Fact]
    public void ThirtyThousandNestedParentheses_AreRefusedWithAClearError()
    {
        var expression = new string('(', 30_000) + "MIT" + new string(')', 30_000);

        Assert.False(SpdxExpressionParser.TryParse(expression, out var node, out var error));
        Assert.Null(node);
        Assert.Contains("more than", error, StringComparison.Ordinal);
    }

    [Fact]
    public void ParenthesesDeeperThanTheBound_AreRefused()
    {
        var expression = new string('(', 40) + "MIT" + new string(')', 40);

        Assert.False(SpdxExpressionParser.TryParse(expression, out _, out var error));
        Assert.Contains("nested deeper than 32", error, StringComparison.Ordinal);
    }

    [Fact]
    public void SixtyThousandTermChain_IsRefused_NotWalkedRecursively()
    {
        Assert.False(SpdxExpressionParser.TryParse(string.Join(" OR ", Enumerable.Repeat("MIT", 60_000)), out _, out var error));
        Assert.Contains("more than 512", error, StringComparison.Ordinal);

        // A long but real-sized chain still parses (SPDX 3.0.1 annex: OR is left-associative, any length).
        Assert.True(SpdxExpressionParser.TryParse(string.Join(" OR ", Enumerable.Repeat("MIT", 100)), out _, out _));
    }
}
