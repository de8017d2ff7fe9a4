using System.Text.Json;
using System.Text.RegularExpressions;

using Readiness.Core.Configuration;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Matrix;

/// <summary>
/// Reads the .NET SDK versions a commit's CI installs: <c>actions/setup-dotnet</c> steps of
/// <c>.github/workflows/*.yml</c> (<c>dotnet-version</c> as one value, a list or a multi-line string, with
/// <c>${{ matrix.* }}</c> and <c>${{ env.* }}</c> substituted per matrix combination; <c>global-json-file</c>), and the
/// root <c>global.json</c>'s <c>sdk.version</c>. YAML is read with aliases refused; a workflow that uses them, or an
/// expression only known at run time, is reported as unevaluated, never guessed.
/// </summary>
public static partial class WorkflowSdkReader
{
    public const string WorkflowFolder = ".github/workflows";

    public static CiSdkReport Read(IFileTree files)
    {
        ArgumentNullException.ThrowIfNull(files);
        var workflows = files.FilesIn(WorkflowFolder)
            .Where(p => p.EndsWith(".yml", StringComparison.OrdinalIgnoreCase) || p.EndsWith(".yaml", StringComparison.OrdinalIgnoreCase))
            .ToArray();
        var sdks = new List<CiSdk>();
        var unevaluated = new List<string>();
        foreach (var path in workflows)
        {
            ReadWorkflow(files, path, sdks, unevaluated);
        }

        if (workflows.Length > 0 && GlobalJson(files, "global.json", unevaluated) is { } pinned
            && !sdks.Any(s => s.Path == pinned.Path && s.Line == pinned.Line))
        {
            sdks.Add(pinned);
        }

        return new CiSdkReport(workflows, sdks, unevaluated);
    }

    /// <summary>The <c>sdk.version</c> of a global.json, or null when the file or the value is missing.</summary>
    public static CiSdk? GlobalJson(IFileTree files, string path, ICollection<string> unevaluated)
    {
        ArgumentNullException.ThrowIfNull(files);
        ArgumentNullException.ThrowIfNull(unevaluated);
        string? text;
        try
        {
            text = files.ReadText(path, 256 * 1024);
        }
        catch (FileTooLargeException e)
        {
            unevaluated.Add(e.Message);
            return null;
        }

        if (text is null)
        {
            return null;
        }

        try
        {
            using var doc = JsonDocument.Parse(text, new JsonDocumentOptions { AllowTrailingCommas = true, CommentHandling = JsonCommentHandling.Skip, MaxDepth = 16 });
            if (doc.RootElement.ValueKind == JsonValueKind.Object
                && doc.RootElement.TryGetProperty("sdk", out var sdk) && sdk.ValueKind == JsonValueKind.Object
                && sdk.TryGetProperty("version", out var version) && version.ValueKind == JsonValueKind.String)
            {
                var value = version.GetString()!;
                var line = LineOf(text, "\"version\"");
                if (SdkVersions.Major(value) is { } major)
                {
                    return new CiSdk(major, value, path, line);
                }

                unevaluated.Add($"{path}:{line}: sdk.version '{value}' is not an SDK version");
            }
        }
        catch (JsonException e)
        {
            unevaluated.Add($"{path}:{(e.LineNumber ?? 0) + 1}: not valid JSON ({e.Message})");
        }

        return null;
    }

    private static void ReadWorkflow(IFileTree files, string path, List<CiSdk> sdks, List<string> unevaluated)
    {
        ConfigMap root;
        try
        {
            var text = files.ReadText(path, YamlReader.MaxChars) ?? string.Empty;
            if (YamlReader.Read(path, text) is not ConfigMap map)
            {
                unevaluated.Add($"{path}: not a mapping; not evaluated");
                return;
            }

            root = map;
        }
        catch (ConfigurationException e)
        {
            unevaluated.Add($"{e.Mark.File}:{e.Mark.Line}: {e.Problem}; the workflow was not evaluated");
            return;
        }
        catch (FileTooLargeException e)
        {
            unevaluated.Add(e.Message);
            return;
        }

        var workflowEnv = root.Find("env")?.Value as ConfigMap;
        if (root.Find("jobs")?.Value is not ConfigMap jobs)
        {
            return;
        }

        foreach (var job in jobs.Entries)
        {
            if (job.Value is not ConfigMap jobMap || jobMap.Find("steps")?.Value is not ConfigList steps)
            {
                continue;
            }

            var setups = steps.Items.OfType<ConfigMap>().Where(IsSetupDotnet).ToArray();
            if (setups.Length == 0)
            {
                continue;
            }

            var matrixNode = (jobMap.Find("strategy")?.Value as ConfigMap)?.Find("matrix")?.Value;
            var (combos, problem) = MatrixExpander.Expand(matrixNode);
            if (combos is null)
            {
                unevaluated.Add($"{path}:{matrixNode!.Mark.Line}: job {job.Key}: {problem}");
                combos = [new Dictionary<string, ConfigNode>(StringComparer.Ordinal)];
            }

            var jobEnv = jobMap.Find("env")?.Value as ConfigMap;
            foreach (var step in setups)
            {
                var with = step.Find("with")?.Value as ConfigMap;
                var scope = new Scope(combos, [step.Find("env")?.Value as ConfigMap, jobEnv, workflowEnv]);
                if (with?.Find("dotnet-version")?.Value is { } versions)
                {
                    foreach (var item in versions is ConfigList list ? list.Items : [versions])
                    {
                        AddVersions(path, item, scope, sdks, unevaluated);
                    }
                }

                if (with?.Find("global-json-file")?.Value is ConfigScalar globalJson)
                {
                    var jsonFiles = scope.Substitute(globalJson.Value, out var why);
                    foreach (var file in jsonFiles)
                    {
                        if (GlobalJson(files, RepoPath.Normalize(file), unevaluated) is { } pinned)
                        {
                            sdks.Add(pinned);
                        }
                    }

                    if (why is not null)
                    {
                        unevaluated.Add($"{path}:{globalJson.Mark.Line}: global-json-file: {why}");
                    }
                }
            }
        }
    }

    private static void AddVersions(string path, ConfigNode item, Scope scope, List<CiSdk> sdks, List<string> unevaluated)
    {
        if (item is not ConfigScalar scalar)
        {
            unevaluated.Add($"{path}:{item.Mark.Line}: dotnet-version is not a value");
            return;
        }

        var lines = scalar.Value.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        for (var i = 0; i < lines.Length; i++)
        {
            // A block scalar's first value stands on the line after the key.
            var line = scalar.Value.Contains('\n', StringComparison.Ordinal) ? scalar.Mark.Line + i + 1 : scalar.Mark.Line;
            var substituted = scope.Substitute(lines[i], out var why);
            foreach (var value in substituted.SelectMany(v => v.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)))
            {
                if (SdkVersions.Major(value) is { } major)
                {
                    if (!sdks.Any(s => s.Path == path && s.Line == line && s.Text == value))
                    {
                        sdks.Add(new CiSdk(major, value, path, line));
                    }
                }
                else
                {
                    unevaluated.Add($"{path}:{line}: dotnet-version '{value}' is not an SDK version");
                }
            }

            if (why is not null)
            {
                unevaluated.Add($"{path}:{line}: dotnet-version: {why}");
            }
        }
    }

    private static bool IsSetupDotnet(ConfigMap step) =>
        step.Find("uses")?.Value is ConfigScalar { Value: var uses }
        && uses.Split('@')[0].Trim().Equals("actions/setup-dotnet", StringComparison.OrdinalIgnoreCase);

    private static int LineOf(string text, string needle)
    {
        var at = text.IndexOf(needle, StringComparison.Ordinal);
        return at < 0 ? 1 : text.AsSpan(0, at).Count('\n') + 1;
    }

    [GeneratedRegex(@"\$\{\{\s*(.*?)\s*\}\}", RegexOptions.CultureInvariant)]
    private static partial Regex Expression();

    [GeneratedRegex(@"^(matrix|env)\.([A-Za-z_][A-Za-z0-9_-]*)(?:\.([A-Za-z_][A-Za-z0-9_-]*))?$", RegexOptions.CultureInvariant)]
    private static partial Regex Reference();

    /// <summary>Substitutes <c>${{ matrix.x }}</c> and <c>${{ env.X }}</c> for every matrix combination.</summary>
    private sealed class Scope(IReadOnlyList<IReadOnlyDictionary<string, ConfigNode>> combos, ConfigMap?[] envs)
    {
        public IReadOnlyList<string> Substitute(string text, out string? problem)
        {
            problem = null;
            if (!text.Contains("${{", StringComparison.Ordinal))
            {
                return [text];
            }

            var results = new List<string>();
            foreach (var combo in combos)
            {
                string? failed = null;
                var value = Expression().Replace(text, m => Evaluate(m.Groups[1].Value, combo, ref failed));
                if (failed is not null)
                {
                    problem = failed;
                    continue;
                }

                if (!results.Contains(value, StringComparer.Ordinal))
                {
                    results.Add(value);
                }
            }

            return results;
        }

        private string Evaluate(string expression, IReadOnlyDictionary<string, ConfigNode> combo, ref string? failed)
        {
            var m = Reference().Match(expression);
            ConfigNode? node = null;
            if (m.Success && m.Groups[1].Value == "matrix")
            {
                node = combo.GetValueOrDefault(m.Groups[2].Value);
                if (m.Groups[3].Success)
                {
                    node = (node as ConfigMap)?.Find(m.Groups[3].Value)?.Value;
                }
            }
            else if (m.Success && !m.Groups[3].Success)
            {
                node = envs.Select(e => e?.Find(m.Groups[2].Value)?.Value).FirstOrDefault(v => v is not null);
            }

            if (node is ConfigScalar { Value: var value } && !value.Contains("${{", StringComparison.Ordinal))
            {
                return value;
            }

            failed = $"'${{{{ {expression} }}}}' is known only when the workflow runs";
            return string.Empty;
        }
    }
}
