using System.CommandLine;
using Readiness.Core.Configuration;
using Readiness.Core.Reports;

namespace Readiness.Cli.Commands;

/// <summary><c>readiness explain CHECK-ID [--page]</c>: what a check verifies, why, how to fix it, and its standard.</summary>
public sealed class ExplainCommand(Composition composition, CliConsole console)
{
    public Command Build()
    {
        var id = new Argument<string>("CHECK-ID") { Description = "A check id such as changelog.has-entry" };
        var page = new Option<bool>("--page") { Description = "Print the check's whole documentation page (Markdown), carried inside this program" };
        var command = new Command("explain", "Explain a check: what it verifies, why it matters, how to fix a failure.");
        command.Arguments.Add(id);
        command.Options.Add(page);
        command.SetAction(parse => Run(parse.GetValue(id)!, parse.GetValue(page)));
        return command;
    }

    public int Run(string id, bool page = false)
    {
        var check = composition.Catalog.Find(id);
        if (check is null)
        {
            var known = composition.Catalog.Checks.Select(c => c.Descriptor.Id).ToList();
            console.Error.WriteLine($"readiness: no check named '{id}'{NameSuggestion.Hint(id, known)} Known checks:");
            foreach (var c in composition.Catalog.Checks)
            {
                console.Error.WriteLine($"  {c.Descriptor.Id,-34} {c.Descriptor.Title}");
            }

            return ExitCodes.Usage;
        }

        var d = check.Descriptor;
        if (page)
        {
            var text = CheckPage(d.Id);
            if (text is null)
            {
                console.Error.WriteLine($"readiness: this build carries no page for {d.Id}");
                return ExitCodes.Usage;
            }

            console.Out.Write(text);
            return ExitCodes.Ready;
        }

        console.Out.WriteLine($"{d.Id} — {d.Title}");
        console.Out.WriteLine($"default severity: {d.DefaultSeverity.Name()}");
        console.Out.WriteLine();
        console.Out.WriteLine("Why it matters:");
        console.Out.WriteLine("  " + d.Why);
        console.Out.WriteLine();
        console.Out.WriteLine("How to fix a failure:");
        console.Out.WriteLine("  " + d.Fix);
        console.Out.WriteLine();
        if (d.Settings.Count > 0)
        {
            console.Out.WriteLine("Settings (in .readiness.yml, or under the check's settings: in a checklist):");
            console.Out.WriteLine("  " + string.Join(", ", d.Settings));
            console.Out.WriteLine();
        }

        console.Out.WriteLine($"Standard: {d.Standard.Name} <{d.Standard.Url}>");
        console.Out.WriteLine($"The whole page: readiness explain {d.Id} --page");
        return ExitCodes.Ready;
    }

    /// <summary>The check's documentation page, embedded from <c>checklists/checks/ID.md</c> at build time.</summary>
    public static string? CheckPage(string id)
    {
        using var stream = typeof(ExplainCommand).Assembly.GetManifestResourceStream($"Readiness.CheckPages.{id}.md");
        if (stream is null)
        {
            return null;
        }

        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
