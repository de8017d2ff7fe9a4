using System.CommandLine;
using Readiness.Cli.Hooks;

namespace Readiness.Cli.Commands;

/// <summary><c>readiness hook install|uninstall|status [PATH]</c> and <c>readiness hook pre-push REMOTE URL</c>.</summary>
public sealed class HookCommand(Composition composition, CliConsole console, CheckCommand check)
{
    public Command Build()
    {
        var command = new Command("hook", "Install or run the pre-push hook that stops release tags that are not ready.");
        command.Subcommands.Add(Manage("install", "Install the pre-push hook (honours core.hooksPath, chains an existing hook).", installer =>
            installer.Install(HookSource(), CommandPath())));
        command.Subcommands.Add(Manage("uninstall", "Remove the pre-push hook and restore a chained one.", installer => installer.Uninstall()));

        var statusPath = PathArgument();
        var status = new Command("status", "Say what is installed and whether it works.");
        status.Arguments.Add(statusPath);
        status.SetAction(parse =>
        {
            var (healthy, lines) = new HookInstaller(console.FullPath(parse.GetValue(statusPath) ?? "."), console.Env("PATH")).Status(HookSource());
            foreach (var line in lines)
            {
                console.Out.WriteLine(line);
            }

            return healthy ? ExitCodes.Ready : ExitCodes.NotReady;
        });
        command.Subcommands.Add(status);

        var remote = new Argument<string>("REMOTE") { Description = "The remote's name (git passes it)" };
        var url = new Argument<string>("URL") { Description = "The remote's URL (git passes it)" };
        var offline = new Option<bool>("--offline") { Description = "Do not ask the registry" };
        var prePush = new Command("pre-push", "What the hook runs: reads git's pre-push lines on standard input.");
        prePush.Arguments.Add(remote);
        prePush.Arguments.Add(url);
        prePush.Options.Add(offline);
        prePush.SetAction((parse, token) => new PrePushRunner(composition, console).RunAsync(
            parse.GetValue(remote)!,
            parse.GetValue(url)!,
            parse.GetValue(offline) || console.Env("READINESS_OFFLINE") is not null ? null : check.RegistriesFor(console.Env("READINESS_REGISTRY"), PrePushRunner.RegistryTimeout, noCache: false),
            token));
        command.Subcommands.Add(prePush);
        return command;
    }

    private static Argument<string?> PathArgument() =>
        new("PATH") { Description = "Repository root or any folder inside it", Arity = ArgumentArity.ZeroOrOne };

    private Command Manage(string name, string description, Func<HookInstaller, string> action)
    {
        var path = PathArgument();
        var command = new Command(name, description);
        command.Arguments.Add(path);
        command.SetAction(parse =>
        {
            try
            {
                console.Out.WriteLine(action(new HookInstaller(console.FullPath(parse.GetValue(path) ?? "."))));
                return ExitCodes.Ready;
            }
            catch (InvalidOperationException e)
            {
                console.Error.WriteLine($"readiness: {e.Message}");
                return ExitCodes.Usage;
            }
        });
        return command;
    }

    private static string HookSource() => Path.Combine(AppContext.BaseDirectory, "hooks", "pre-push");

    /// <summary>How the hook finds this program: the command on PATH if it is this one, else this program's own path.</summary>
    private string CommandPath()
    {
        if (console.Env("READINESS_COMMAND") is { } configured)
        {
            return configured;
        }

        var onPath = HookInstaller.CommandOnPath("readiness");
        if (onPath is not null)
        {
            return onPath;
        }

        var apphost = Path.Combine(AppContext.BaseDirectory, OperatingSystem.IsWindows() ? "readiness.exe" : "readiness");
        return File.Exists(apphost) ? apphost : Environment.ProcessPath ?? "readiness";
    }
}
