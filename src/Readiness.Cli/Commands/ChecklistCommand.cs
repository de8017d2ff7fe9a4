using System.CommandLine;
using Readiness.Core.Checklists;
using Readiness.Core.Configuration;
using Readiness.Core.Reports;

namespace Readiness.Cli.Commands;

/// <summary><c>readiness checklist list|show NAME|validate FILE</c>.</summary>
public sealed class ChecklistCommand(Composition composition, CliConsole console)
{
    public Command Build()
    {
        var command = new Command("checklist", "List, show or validate checklists.");

        var list = new Command("list", "List the built-in checklists and the one the current repository configures.");
        list.SetAction(_ => List());
        command.Subcommands.Add(list);

        var name = new Argument<string>("NAME") { Description = "A checklist name or a path to a checklist file" };
        var show = new Command("show", "Print a checklist resolved (after extends).");
        show.Arguments.Add(name);
        show.SetAction((parse, token) => ShowAsync(parse.GetValue(name)!, token));
        command.Subcommands.Add(show);

        var file = new Argument<string>("FILE") { Description = "A checklist file to validate" };
        var validate = new Command("validate", "Validate a checklist file; errors name the line and column.");
        validate.Arguments.Add(file);
        validate.SetAction((parse, token) => ValidateAsync(parse.GetValue(file)!, token));
        command.Subcommands.Add(validate);
        return command;
    }

    public int List()
    {
        var resolver = composition.Runner.Resolver;
        foreach (var n in composition.Checklists.Names)
        {
            var definition = resolver.Load(n);
            console.Out.WriteLine($"{n,-14} {definition.Description}{(definition.Extends is { } e ? $" (extends {e})" : string.Empty)}");
        }

        var config = Path.Combine(console.CurrentDirectory, RepositoryConfig.FileName);
        if (File.Exists(config))
        {
            var parsed = new RepositoryConfigParser(composition.Runner.Parser).Parse(RepositoryConfig.FileName, File.ReadAllText(config));
            console.Out.WriteLine($"configured: {parsed.Checklist ?? "(none: library)"} ({RepositoryConfig.FileName})");
        }

        return ExitCodes.Ready;
    }

    public async Task<int> ShowAsync(string name, CancellationToken cancellationToken)
    {
        var definition = await new ChecklistLoader(composition.Runner.Parser).LoadAsync(name, console.CurrentDirectory, cancellationToken).ConfigureAwait(false)
            ?? composition.Runner.Resolver.Load(name);
        Print(composition.Runner.Resolver.Resolve(definition));
        return ExitCodes.Ready;
    }

    public async Task<int> ValidateAsync(string file, CancellationToken cancellationToken)
    {
        var path = console.FullPath(file);
        if (!File.Exists(path))
        {
            await console.Error.WriteLineAsync($"{file}:1:1: file not found").ConfigureAwait(false);
            return ExitCodes.Usage;
        }

        var definition = composition.Runner.Parser.Parse(file, await File.ReadAllTextAsync(path, cancellationToken).ConfigureAwait(false));
        var resolved = composition.Runner.Resolver.Resolve(definition);
        await console.Out.WriteLineAsync($"{file}: valid checklist '{resolved.Name}' with {resolved.Checks.Count} checks and {resolved.Manual.Count} manual items.").ConfigureAwait(false);
        return ExitCodes.Ready;
    }

    private void Print(ResolvedChecklist checklist)
    {
        console.Out.WriteLine($"name: {checklist.Name}");
        if (checklist.Description is { } d)
        {
            console.Out.WriteLine($"description: {d}");
        }

        console.Out.WriteLine($"# resolved from: {string.Join(", ", checklist.Sources)}");
        console.Out.WriteLine("checks:");
        foreach (var check in checklist.Checks)
        {
            var implemented = composition.Catalog.Find(check.Id) is null ? "  # not implemented in this version" : string.Empty;
            var with = check.With.Count == 0
                ? string.Empty
                : ", settings: { " + string.Join(", ", check.With.Select(w => $"{w.Key}: {Describe(w.Value)}")) + " }";
            console.Out.WriteLine($"  {check.Id}: {{ severity: {check.Severity.Name()}{with} }}{implemented}");
        }

        if (checklist.Manual.Count > 0)
        {
            console.Out.WriteLine("manual:");
            foreach (var item in checklist.Manual)
            {
                console.Out.WriteLine($"  - {{ id: {item.Id}, severity: {item.Severity.Name()}, text: \"{item.Text}\" }}");
            }
        }
    }

    private static string Describe(ConfigNode node) => node switch
    {
        ConfigScalar s => s.Value,
        ConfigList l => "[" + string.Join(", ", l.Items.Select(Describe)) + "]",
        ConfigMap m => "{ " + string.Join(", ", m.Entries.Select(e => $"{e.Key}: {Describe(e.Value)}")) + " }",
        _ => string.Empty,
    };
}
