using System.CommandLine;
using Readiness.Cli.Commands;
using Readiness.Core.Configuration;
using Readiness.Core.Snapshots;
using Readiness.Rendering;

namespace Readiness.Cli;

/// <summary>The <c>readiness</c> command line: parses, dispatches, and maps failures to cli.md's exit codes.</summary>
public sealed class CliApp(CliConsole console, TimeProvider time)
{
    /// <summary>Prints the stack trace of an unexpected failure (otherwise one line names it).</summary>
    private readonly Option<bool> verbose = new("--verbose") { Description = "On an unexpected failure, print the stack trace too", Recursive = true };

    public async Task<int> RunAsync(string[] args, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(args);
        var composition = new Composition(time);
        var check = new CheckCommand(composition, console);
        var root = new RootCommand("Readiness: executable release checklists for .NET libraries.");
        root.Options.Add(verbose);
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
                await console.Error.WriteLineAsync($"readiness: {SafeText.Terminal(error.Message)}").ConfigureAwait(false);
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
            await console.Error.WriteLineAsync($"readiness: {SafeText.Terminal(e.Message)}").ConfigureAwait(false);
            return ExitCodes.Usage;
        }
        catch (RepositoryInspectionException e)
        {
            await console.Error.WriteLineAsync($"readiness: {SafeText.Terminal(e.Message)}").ConfigureAwait(false);
            return ExitCodes.Uninspectable;
        }
        catch (Exception e) when (e is not OutOfMemoryException and not OperationCanceledException)
        {
            // The one guard for what no reader expected: one line naming the input, the trace only on request.
            // Out-of-memory is not caught here: the readers' bounds prevent it.
            await console.Error.WriteLineAsync($"readiness: could not inspect {SafeText.Terminal(InputOf(parse))}: unexpected {e.GetType().Name}: {SafeText.Terminal(FirstLine(e.Message))}{(parse.GetValue(verbose) ? string.Empty : " (--verbose shows the stack trace)")}").ConfigureAwait(false);
            if (parse.GetValue(verbose))
            {
                await console.Error.WriteLineAsync(SafeText.Json(e.ToString())).ConfigureAwait(false);
            }

            return ExitCodes.Uninspectable;
        }
    }

    /// <summary>The repository the command was about: its PATH argument (made absolute), else the current folder.</summary>
    private string InputOf(ParseResult parse)
    {
        var path = parse.CommandResult.Command.Arguments.FirstOrDefault(a => a.Name == "PATH") is Argument<string?> argument ? parse.GetValue(argument) : null;
        return console.FullPath(string.IsNullOrEmpty(path) ? "." : path);
    }

    private static string FirstLine(string message)
    {
        var line = message.Split('\n', 2)[0].Trim();
        return line.Length > 200 ? line[..200] + "..." : line;
    }
}
