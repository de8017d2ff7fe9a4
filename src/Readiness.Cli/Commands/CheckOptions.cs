using System.CommandLine;
using Readiness.Rendering;

namespace Readiness.Cli.Commands;

/// <summary>The options of <c>readiness check</c> (cli.md), shared with <c>demo</c>.</summary>
public sealed class CheckOptions
{
    public Argument<string?> Path { get; } = new("PATH") { Description = "Repository root or any folder inside it (default: current folder)", Arity = ArgumentArity.ZeroOrOne };

    public Option<string> Ref { get; } = new("--ref") { Description = "Commit, branch or tag to inspect; files are read from that commit", DefaultValueFactory = _ => "HEAD" };

    public Option<bool> Worktree { get; } = new("--worktree") { Description = "Inspect the working tree instead (uncommitted changes included); signing checks skip" };

    public Option<string?> Tag { get; } = new("--tag") { Description = "The release tag (default: a tag pointing at the commit)" };

    public Option<string?> Version { get; } = new("--version") { Description = "The candidate version when there is no tag yet" };

    public Option<string?> Checklist { get; } = new("--checklist") { Description = "Checklist NAME, PATH or URL (default: checklist in .readiness.yml, else library)" };

    public Option<string?> Format { get; } = new("--format") { Description = "text, markdown, html, json, sarif or junit (default: text, also when piped; from --output FILE's extension when given)" };

    public Option<string?> Output { get; } = new("--output") { Description = "Write the report to FILE; a short summary still goes to the terminal" };

    public Option<bool> Offline { get; } = new("--offline") { Description = "No network: registry checks skip" };

    public Option<string?> Registry { get; } = new("--registry") { Description = "NuGet feed (service index URL or local folder) to check against" };

    public Option<double?> RegistryTimeout { get; } = new("--registry-timeout") { Description = "Seconds allowed for the whole registry phase, 1 to 60 (default: READINESS_REGISTRY_TIMEOUT, else registry-timeout in .readiness.yml, else 10)" };

    public Option<bool> NoCache { get; } = new("--no-cache") { Description = "Do not use the on-disk registry cache" };

    public Option<string> FailOn { get; } = new("--fail-on") { Description = "Which failures give exit code 1: block, warn or never", DefaultValueFactory = _ => "block" };

    public Option<string[]> Confirm { get; } = new("--confirm") { Description = "Confirm a manual checklist item (repeatable)", AllowMultipleArgumentsPerToken = false };

    public void AddTo(Command command, bool withPath = true)
    {
        ArgumentNullException.ThrowIfNull(command);
        if (withPath)
        {
            command.Arguments.Add(Path);
        }

        foreach (var option in new Option[] { Ref, Worktree, Tag, Version, Checklist, Format, Output, Offline, Registry, RegistryTimeout, NoCache, FailOn, Confirm })
        {
            command.Options.Add(option);
        }

        FailOn.AcceptOnlyFromAmong("block", "warn", "never");
        Format.AcceptOnlyFromAmong([.. new RendererCatalog().Formats]);
    }
}
