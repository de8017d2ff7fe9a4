using System.CommandLine;
using System.CommandLine.Parsing;

namespace Readiness.Cli;

/// <summary>
/// Refuses an option value that is itself one of the command's options (<c>--version --offline</c>): the parser
/// would take <c>--offline</c> as the version and silently drop the intended option.
/// </summary>
public static class OptionValueGuard
{
    /// <summary>One message per swallowed option, empty when the command line is sound.</summary>
    public static IReadOnlyList<string> Problems(ParseResult parse)
    {
        ArgumentNullException.ThrowIfNull(parse);
        var command = parse.CommandResult.Command;
        var names = new HashSet<string>(StringComparer.Ordinal) { "--help", "-h", "-?" };
        foreach (var option in command.Options.Concat(parse.RootCommandResult.Command.Options))
        {
            names.Add(option.Name);
            names.UnionWith(option.Aliases);
        }

        var problems = new List<string>();
        foreach (var result in parse.CommandResult.Children.OfType<OptionResult>())
        {
            if (result.Option.Arity.MaximumNumberOfValues == 0)
            {
                continue;
            }

            foreach (var token in result.Tokens)
            {
                var name = token.Value.Split('=', 2)[0];
                if (names.Contains(name))
                {
                    problems.Add($"{result.Option.Name} needs a value, but the next word is the option {token.Value}");
                }
            }
        }

        return problems;
    }
}
