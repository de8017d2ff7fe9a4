using System.CommandLine;
using Readiness.Cli.Commands;
using Readiness.Core.Configuration;
using Readiness.Core.Snapshots;

namespace Readiness.Cli;

/// <summary>The <c>readiness</c> command line: parses, dispatches, and maps failures to cli.md's exit codes.</summary>
public sealed class CliApp(CliConsole console, TimeProvider time)
{
    public async Task<int> RunAsync(string[] args, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(args);
        var composition = new Composition(time);
        var check = new CheckCommand(composition, console);
        var root = new RootCommand("Readiness: executable release checklists for .NET libraries.");
        root.Subcommands.Add(check.Build());
        root.Subcommands.Add(new ChecklistCommand(composition, console).Build());
        root.Subcommands.Add(new ExplainCommand(composition, console).Build());
        root.Subcommands.Add(new DemoCommand(composition, console, check).Build());
        root.Subcommands.Add(new HookCommand(composition, console, check).Build());

        var parse = root.Parse(args);
        if (parse.Errors.Count > 0)
        {
            foreach (var error in parse.Errors)
            {
                await console.Error.WriteLineAsync($"readiness: {error.Message}").ConfigureAwait(false);
            }

            await console.Error.WriteLineAsync("Run 'readiness --help' for usage.").ConfigureAwait(false);
            return ExitCodes.Usage;
        }

        if (OptionValueGuard.Problems(parse) is { Count: > 0 } swallowed)
        {
            foreach (var problem in swallowed)
            {
                await console.Error.WriteLineAsync($"readiness: {problem}").ConfigureAwait(false);
            }

            return ExitCodes.Usage;
        }

        try
        {
            return await parse.InvokeAsync(new InvocationConfiguration { Output = console.Out, Error = console.Error, EnableDefaultExceptionHandler = false }, cancellationToken).ConfigureAwait(false);
        }
        catch (ConfigurationException e)
        {
            await console.Error.WriteLineAsync($"readiness: {e.Message}").ConfigureAwait(false);
            return ExitCodes.Usage;
        }
        catch (RepositoryInspectionException e)
        {
            await console.Error.WriteLineAsync($"readiness: {e.Message}").ConfigureAwait(false);
            return ExitCodes.Uninspectable;
        }
    }
}
