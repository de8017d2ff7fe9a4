namespace Readiness.Testing.Hostile;

/// <summary>What went wrong in one <see cref="HostileRun"/>, by kind: the suite asserts none, the bench counts them.</summary>
public static class HostileVerdict
{
    public const string Crash = "crash";
    public const string Hang = "hang";
    public const string Memory = "memory";
    public const string Leak = "leak";
    public const string FailOpen = "fail-open";
    public const string WrongExit = "wrong-exit";
    public const string RawControl = "raw-control";
    public const string Forged = "forged-line";
    public const string Unmentioned = "reason-not-named";

    /// <summary>Peak resident memory allowed for any case (the issue's bound).</summary>
    public const long MaxRssBytes = 500L * 1024 * 1024;

    public static IReadOnlyList<(string Kind, string Detail)> Problems(HostileCase hostile, HostileRun run)
    {
        ArgumentNullException.ThrowIfNull(hostile);
        ArgumentNullException.ThrowIfNull(run);
        var problems = new List<(string, string)>();
        var all = run.Output + "\n" + run.Error;
        if (run.TimedOut)
        {
            problems.Add((Hang, $"no answer within {run.Elapsed.TotalSeconds:F0} s"));
            return problems;
        }

        // .NET prints "Unhandled exception." and "   at " frames for an escaping exception; 134 is SIGABRT.
        if (run.ExitCode is < 0 or > 3 || all.Contains("Unhandled exception", StringComparison.Ordinal) || all.Contains("\n   at ", StringComparison.Ordinal))
        {
            problems.Add((Crash, $"exit {run.ExitCode}: {FirstLines(run.Error)}"));
        }

        if (run.PeakRssBytes > MaxRssBytes)
        {
            problems.Add((Memory, $"peak RSS {run.PeakRssMegabytes:F0} MB"));
        }

        foreach (var secret in (string[])[HostileCorpus.Secret, HostileCorpus.Marker, "root:x:0:0", "hunter2-hostile"])
        {
            if (all.Contains(secret, StringComparison.Ordinal))
            {
                problems.Add((Leak, $"output holds '{secret[..6]}...'"));
            }
        }

        var expected = hostile.Expect switch
        {
            HostileExpectation.Ready => [0],
            HostileExpectation.NotReady => [1, 3],
            HostileExpectation.ConfigurationError => [2],
            _ => (int[])[0, 1, 2, 3],
        };
        if (run.ExitCode is >= 0 and <= 3 && !expected.Contains(run.ExitCode))
        {
            problems.Add((run.ExitCode == 0 ? FailOpen : WrongExit, $"exit {run.ExitCode}, expected {string.Join(" or ", expected)}: {FirstLines(run.Error)}"));
        }

        var control = all.FirstOrDefault(IsUnsafe);
        if (control != default(char))
        {
            problems.Add((RawControl, $"U+{(int)control:X4} in output"));
        }

        if (all.Split('\n').Any(line => line.TrimStart(' ', '|', '-', '*', '#', '>', '`', '"').StartsWith(HostileCorpus.ForgedLine, StringComparison.Ordinal)))
        {
            problems.Add((Forged, "a line of output starts with text from the repository"));
        }

        if (hostile.MustMention is { } mention && run.ExitCode is >= 0 and <= 3 && !all.Contains(mention, StringComparison.OrdinalIgnoreCase))
        {
            problems.Add((Unmentioned, $"output never says '{mention}'"));
        }

        return problems;
    }

    /// <summary>
    /// Characters a terminal or a browser interprets or hides: C0 controls other than tab, line feed and carriage
    /// return, DEL, C1 controls, zero-width characters and the bidirectional embeddings, overrides and isolates
    /// (Unicode UAX #9), the line and paragraph separators, and the BOM used as a zero-width no-break space.
    /// </summary>
    public static bool IsUnsafe(char c) =>
        c is (< ' ' and not '\t' and not '\n' and not '\r') or (>= '\u007f' and <= '\u009f')
            or (>= '\u200b' and <= '\u200f') or (>= '\u202a' and <= '\u202e') or (>= '\u2066' and <= '\u2069')
            or '\u2028' or '\u2029' or '\ufeff' or '\u061c';

    private static string FirstLines(string text)
    {
        var lines = text.Split('\n', StringSplitOptions.RemoveEmptyEntries).Take(2);
        var joined = string.Join(" / ", lines);
        return new string([.. (joined.Length > 200 ? joined[..200] : joined).Select(c => IsUnsafe(c) ? '?' : c)]);
    }
}
