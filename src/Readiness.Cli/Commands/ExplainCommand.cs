using System.CommandLine;
using Readiness.Core.Reports;

namespace Readiness.Cli.Commands;

/// <summary><c>readiness explain CHECK-ID</c>: what a check verifies, why, how to fix it, and its standard.</summary>
public sealed class ExplainCommand(Composition composition, CliConsole console)
{
    public Command Build()
    {
        var id = new Argument<string>("CHECK-ID") { Description = "A check id such as changelog.has-entry" };
        var command = new Command("explain", "Explain a check: what it verifies, why it matters, how to fix a failure.");
        command.Arguments.Add(id);
        command.SetAction(parse => Run(parse.GetValue(id)!));
        return command;
    }

    public int Run(string id)
    {
        var check = composition.Catalog.Find(id);
        if (check is null)
        {
            console.Error.WriteLine($"readiness: no check named '{id}'. Known checks:");
            foreach (var c in composition.Catalog.Checks)
            {
                console.Error.WriteLine($"  {c.Descriptor.Id,-34} {c.Descriptor.Title}");
            }

            return ExitCodes.Usage;
        }

        var d = check.Descriptor;
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
            console.Out.WriteLine("Settings (in .readiness.yml, or under the check's with: in a checklist):");
            console.Out.WriteLine("  " + string.Join(", ", d.Settings));
            console.Out.WriteLine();
        }

        console.Out.WriteLine($"Standard: {d.Standard.Name} <{d.Standard.Url}>");
        console.Out.WriteLine($"Documentation: checklists/checks/{d.Id}.md");
        return ExitCodes.Ready;
    }
}
