using System.Collections;

namespace Readiness.Rendering;

/// <summary>Decides whether terminal output may carry ANSI colour.</summary>
public static class ConsoleColorPolicy
{
    /// <summary>
    /// Colour only on a terminal, never when <c>NO_COLOR</c> is set to a non-empty value (https://no-color.org:
    /// "when present and not an empty string ... prevents the addition of ANSI color") nor when <c>TERM=dumb</c>
    /// (terminfo's name for a terminal without capabilities; common practice, no published source).
    /// </summary>
    /// <param name="isTerminal">Whether the output goes to a terminal (not redirected).</param>
    /// <param name="environment">The environment, as <see cref="Environment.GetEnvironmentVariables()"/> returns it.</param>
    public static bool ShouldUseColor(bool isTerminal, IDictionary environment)
    {
        ArgumentNullException.ThrowIfNull(environment);
        if (!isTerminal)
        {
            return false;
        }

        if (environment["NO_COLOR"] is string noColor && noColor.Length > 0)
        {
            return false;
        }

        return !string.Equals(environment["TERM"] as string, "dumb", StringComparison.Ordinal);
    }
}
