using System.Collections;

namespace Readiness.Rendering.Tests;

public sealed class ConsoleColorPolicyTests
{
    private static Hashtable Env(params (string Name, string Value)[] variables)
    {
        var env = new Hashtable();
        foreach (var (name, value) in variables)
        {
            env[name] = value;
        }

        return env;
    }

    [Fact]
    public void Terminal_WithoutNoColor_UsesColor() =>
        Assert.True(ConsoleColorPolicy.ShouldUseColor(true, Env(("TERM", "xterm-256color"))));

    [Theory]
    [InlineData("1")]
    [InlineData("0")]
    [InlineData("false")]
    [InlineData("yes please")]
    public void NoColorWithAnyNonEmptyValue_DisablesColor(string value)
    {
        // https://no-color.org: "when present and not an empty string (regardless of its value), prevents the
        // addition of ANSI color" — so even "0" and "false" disable colour.
        Assert.False(ConsoleColorPolicy.ShouldUseColor(true, Env(("NO_COLOR", value), ("TERM", "xterm"))));
    }

    [Fact]
    public void NoColorEmpty_DoesNotDisableColor()
    {
        // https://no-color.org: only a non-empty value counts.
        Assert.True(ConsoleColorPolicy.ShouldUseColor(true, Env(("NO_COLOR", string.Empty), ("TERM", "xterm"))));
    }

    [Fact]
    public void DumbTerminal_DisablesColor()
    {
        // TERM=dumb is terminfo's entry for a terminal without capabilities (common practice, no published source
        // for the colour convention).
        Assert.False(ConsoleColorPolicy.ShouldUseColor(true, Env(("TERM", "dumb"))));
    }

    [Fact]
    public void NotATerminal_DisablesColor() =>
        Assert.False(ConsoleColorPolicy.ShouldUseColor(false, Env(("TERM", "xterm-256color"))));

    [Fact]
    public void NullEnvironment_Throws() =>
        Assert.Throws<ArgumentNullException>(() => ConsoleColorPolicy.ShouldUseColor(true, null!));

    [Fact]
    public void ProcessEnvironment_IsAccepted()
    {
        // The shape the CLI passes: Environment.GetEnvironmentVariables() returns a non-generic IDictionary.
        var expected = !Console.IsOutputRedirected
            && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("NO_COLOR"))
            && Environment.GetEnvironmentVariable("TERM") != "dumb";
        Assert.Equal(expected, ConsoleColorPolicy.ShouldUseColor(!Console.IsOutputRedirected, Environment.GetEnvironmentVariables()));
    }
}
