using System.CommandLine;
using Readiness.Core.Engine;
using Readiness.Core.Registry;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;
using Readiness.Registries;
using Readiness.Rendering;

namespace Readiness.Cli.Commands;

/// <summary><c>readiness check [PATH]</c>: inspect one release candidate and report.</summary>
public sealed class CheckCommand(Composition composition, CliConsole console)
{
    private readonly CheckOptions options = new();

    public Command Build()
    {
        var command = new Command("check", "Inspect one release candidate and report whether it is ready.");
        options.AddTo(command);
        command.SetAction((parse, token) => RunAsync(parse, token));
        return command;
    }

    public async Task<int> RunAsync(ParseResult parse, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(parse);
        var path = parse.GetValue(options.Path);
        if (path is not null && path.StartsWith('-'))
        {
            await console.Error.WriteLineAsync($"readiness: unknown option '{path}' (see readiness check --help)").ConfigureAwait(false);
            return ExitCodes.Usage;
        }

        if (console.Env(DocsUrlVariable) is { } docs && !CheckPages.IsValidBase(docs))
        {
            await console.Error.WriteLineAsync($"readiness: {DocsUrlVariable} must be an absolute http(s) URL, not '{docs}'").ConfigureAwait(false);
            return ExitCodes.Usage;
        }

        if (parse.GetValue(options.Registry) is { } registry && !registry.Contains("://", StringComparison.Ordinal) && !Directory.Exists(console.FullPath(registry)))
        {
            await console.Error.WriteLineAsync($"readiness: --registry {registry}: no such folder ({console.FullPath(registry)}); give a local folder feed or a service index URL").ConfigureAwait(false);
            return ExitCodes.Usage;
        }

        var request = await BuildRequestAsync(parse, console.FullPath(path ?? "."), cancellationToken).ConfigureAwait(false);
        var report = await composition.Runner.RunAsync(request, Registries(parse), cancellationToken).ConfigureAwait(false);
        if (UnknownConfirmations(report, request.Confirmed ?? []) is { Count: > 0 } unknown)
        {
            foreach (var problem in unknown)
            {
                await console.Error.WriteLineAsync($"readiness: {problem}").ConfigureAwait(false);
            }

            return ExitCodes.Usage;
        }
        await WriteReportAsync(report, parse.GetValue(options.Format), parse.GetValue(options.Output), cancellationToken).ConfigureAwait(false);
        await new WorkflowIntegration(console).WriteAsync(report, parse.GetValue(options.Output) is null, cancellationToken).ConfigureAwait(false);
        return FailPolicy.ExitCode(report, parse.GetValue(options.FailOn) ?? "block");
    }

    public async Task<RunRequest> BuildRequestAsync(ParseResult parse, string repositoryPath, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(parse);
        var checklistValue = parse.GetValue(options.Checklist);
        var definition = checklistValue is null
            ? null
            : await new ChecklistLoader(composition.Runner.Parser).LoadAsync(checklistValue, console.CurrentDirectory, cancellationToken).ConfigureAwait(false);
        return new RunRequest(
            new SnapshotRequest(repositoryPath, parse.GetValue(options.Ref) ?? "HEAD", parse.GetValue(options.Tag), parse.GetValue(options.Worktree)),
            definition is null ? checklistValue : null,
            definition,
            parse.GetValue(options.Version),
            parse.GetValue(options.Confirm) ?? [],
            null,
            ExplicitRegistryTimeout(parse));
    }

    /// <summary>One message per <c>--confirm</c> that names no manual item of the checklist applied.</summary>
    public static IReadOnlyList<string> UnknownConfirmations(Report report, IReadOnlyList<string> confirmed)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(confirmed);
        const string prefix = "manual.";
        var items = report.Results.Where(r => r.Check.StartsWith(prefix, StringComparison.Ordinal)).Select(r => r.Check[prefix.Length..]).ToList();
        return confirmed
            .Where(id => !items.Contains(id, StringComparer.Ordinal))
            .Select(id => $"--confirm {id}: checklist {report.Subject.Checklist} has no manual item '{id}'"
                + (Core.Configuration.NameSuggestion.Nearest(id, items) is { } near ? $"; did you mean '{near}'?"
                    : items.Count == 0 ? " (it has no manual items)" : $" (its items: {string.Join(", ", items)})"))
            .ToList();
    }

    public RegistrySelector? Registries(ParseResult parse)
    {
        ArgumentNullException.ThrowIfNull(parse);
        if (parse.GetValue(options.Offline))
        {
            return null;
        }

        return RegistriesFor(
            parse.GetValue(options.Registry),
            ExplicitRegistryTimeout(parse),
            parse.GetValue(options.NoCache));
    }

    /// <summary>
    /// <c>--registry-timeout</c>, else <c>READINESS_REGISTRY_TIMEOUT</c> (seconds); null lets the repository's
    /// <c>registry-timeout</c> or the default decide (<see cref="RegistryPhase.Resolve"/>).
    /// </summary>
    public TimeSpan? ExplicitRegistryTimeout(ParseResult parse)
    {
        ArgumentNullException.ThrowIfNull(parse);
        if (parse.GetValue(options.RegistryTimeout) is { } seconds)
        {
            return seconds > 0 ? TimeSpan.FromSeconds(seconds) : throw new Core.Configuration.ConfigurationException(new("(command line)", 1, 1), "--registry-timeout must be a positive number of seconds");
        }

        var env = console.Env("READINESS_REGISTRY_TIMEOUT");
        if (env is null)
        {
            return null;
        }

        return double.TryParse(env, System.Globalization.NumberStyles.AllowDecimalPoint, System.Globalization.CultureInfo.InvariantCulture, out var fromEnv) && fromEnv > 0
            ? TimeSpan.FromSeconds(fromEnv)
            : throw new Core.Configuration.ConfigurationException(new("READINESS_REGISTRY_TIMEOUT", 1, 1), $"must be a positive number of seconds, not '{env}'");
    }

    /// <summary>The registry for a run: <paramref name="explicitSource"/>, else <c>publish-to</c>, else the public feed.</summary>
    public RegistrySelector RegistriesFor(string? explicitSource, TimeSpan? timeout, bool noCache)
    {
        return config =>
        {
            var source = RegistryFactory.ChooseSource(explicitSource, config);
            var local = source.Contains("://", StringComparison.Ordinal) ? source : console.FullPath(source);
            var registryOptions = new RegistryOptions { Timeout = RegistryPhase.Resolve(timeout, config), NoCache = noCache, AskOwners = config.GetList("owners").Count > 0 };
            return RegistryFactory.Create(local, registryOptions);
        };
    }

    public async Task WriteReportAsync(Report report, string? format, string? output, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(report);
        var chosen = format ?? (output is not null ? FormatFromExtension(output) : "text");
        var color = output is null && ConsoleColorPolicy.ShouldUseColor(console.IsTerminal, new Dictionary<string, string>(console.Environment));
        var renderer = Renderers(color).Find(chosen) ?? throw new InvalidOperationException($"no renderer for {chosen}");
        if (output is null)
        {
            renderer.Render(report, console.Out);
            return;
        }

        var file = console.FullPath(output);
        Directory.CreateDirectory(Path.GetDirectoryName(file)!);
        await using (var writer = new StreamWriter(file))
        {
            renderer.Render(report, writer);
        }

        await console.Out.WriteLineAsync(Summary(report) + $" Report written to {file}").ConfigureAwait(false);
        _ = cancellationToken;
    }

    /// <summary>The renderers, with the check descriptors and the check pages' address (<c>READINESS_DOCS_URL</c>).</summary>
    public RendererCatalog Renderers(bool color = false) =>
        new(color, checks: composition.Catalog, pages: new CheckPages(console.Env(DocsUrlVariable)));

    public const string DocsUrlVariable = "READINESS_DOCS_URL";

    public static string Summary(Report report)
    {
        ArgumentNullException.ThrowIfNull(report);
        return ReportWording.Sentence(report) + ".";
    }

    private static string FormatFromExtension(string output) => Path.GetExtension(output).ToLowerInvariant() switch
    {
        ".json" => "json",
        ".sarif" => "sarif",
        ".xml" => "junit",
        ".html" or ".htm" => "html",
        ".md" or ".markdown" => "markdown",
        _ => "text",
    };
}
