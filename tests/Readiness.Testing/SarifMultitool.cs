using System.Diagnostics;
using System.Text.Json;

namespace Readiness.Testing;

/// <summary>
/// The SARIF multitool (npm package <c>@microsoft/sarif-multitool</c>, run with node) as the reference validator of
/// SARIF 2.1.0 logs: <c>validate</c> checks a log against the 2.1.0 schema it ships and its own rules, and writes its
/// findings as a SARIF log. <c>.ci/install-tools</c> installs it; a missing validator fails the test that needs it.
/// </summary>
public static class SarifMultitool
{
    public const string Variable = "READINESS_SARIF_MULTITOOL";

    /// <summary>The tool's <c>bin.js</c>: <c>READINESS_SARIF_MULTITOOL</c>, else where .ci/install-tools puts it.</summary>
    public static string? Find()
    {
        if (Environment.GetEnvironmentVariable(Variable) is { Length: > 0 } configured)
        {
            return File.Exists(configured) ? configured : null;
        }

        var folder = Environment.GetEnvironmentVariable("READINESS_CI_TOOLS") is { Length: > 0 } tools
            ? tools
            : Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.UserProfile), ".cache", "readiness-ci");
        var bin = Path.Combine(folder, "node_modules", "@microsoft", "sarif-multitool", "bin.js");
        return File.Exists(bin) ? bin : null;
    }

    /// <summary>The tool, or an assertion failure that says how to install it (never a silent skip).</summary>
    public static string Require() =>
        Find() ?? throw new InvalidOperationException(
            $"The SARIF multitool is not installed: run 'bash .ci/install-tools' (CI does) or set {Variable} to its bin.js.");

    /// <summary>Validates <paramref name="files"/> and returns every finding: level (error, warning, note), rule, text.</summary>
    public static IReadOnlyList<ValidatorFinding> Validate(IEnumerable<string> files)
    {
        ArgumentNullException.ThrowIfNull(files);
        var tool = Require();
        using var work = new TempDirectory();
        var output = Path.Combine(work.Path, "validation.sarif");
        var start = new ProcessStartInfo("node")
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
            WorkingDirectory = work.Path,
        };
        // The files come before the options: --log takes a list and would swallow them.
        foreach (var a in new[] { tool, "validate" }.Concat(files).Concat(["--output", output, "--log", "ForceOverwrite"]))
        {
            start.ArgumentList.Add(a);
        }

        start.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        using var process = Process.Start(start) ?? throw new InvalidOperationException("node could not be started");
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(120_000))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException("the SARIF multitool did not finish within 120 s");
        }

        if (!File.Exists(output))
        {
            throw new InvalidOperationException($"the SARIF multitool wrote no log (exit {process.ExitCode}): {stdout.Result}{stderr.Result}");
        }

        using var log = JsonDocument.Parse(File.ReadAllText(output));
        var findings = new List<ValidatorFinding>();
        foreach (var run in log.RootElement.GetProperty("runs").EnumerateArray())
        {
            // A tool failure (a file it could not read or parse) is a notification, not a result.
            foreach (var invocation in run.TryGetProperty("invocations", out var inv) ? inv.EnumerateArray() : default)
            {
                foreach (var note in invocation.TryGetProperty("toolExecutionNotifications", out var n) ? n.EnumerateArray() : default)
                {
                    findings.Add(new ValidatorFinding("error", "tool", Text(note)));
                }
            }

            foreach (var result in run.TryGetProperty("results", out var r) ? r.EnumerateArray() : default)
            {
                // SARIF 2.1.0 §3.27.10: an absent level means "warning".
                var level = result.TryGetProperty("level", out var l) ? l.GetString() ?? "warning" : "warning";
                var rule = result.TryGetProperty("ruleId", out var id) ? id.GetString() ?? string.Empty : string.Empty;
                findings.Add(new ValidatorFinding(level, rule, Text(result)));
            }
        }

        return findings;
    }

    private static string Text(JsonElement item)
    {
        if (!item.TryGetProperty("message", out var message))
        {
            return string.Empty;
        }

        var text = message.TryGetProperty("text", out var t) ? t.GetString() : message.TryGetProperty("id", out var id) ? id.GetString() : null;
        var args = message.TryGetProperty("arguments", out var a) ? string.Join(" | ", a.EnumerateArray().Select(x => x.GetString())) : string.Empty;
        return $"{text} {args}".Trim();
    }
}
