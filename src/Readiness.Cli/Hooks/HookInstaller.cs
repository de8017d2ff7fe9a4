namespace Readiness.Cli.Hooks;

/// <summary>Installs, removes and describes the pre-push hook of one repository.</summary>
/// <param name="repositoryPath">Any folder of the repository.</param>
/// <param name="searchPath">The PATH the hook will search (default: this process's).</param>
public sealed class HookInstaller(string repositoryPath, string? searchPath = null)
{
    public const string HookName = "pre-push";
    public const string ChainedName = "pre-push.readiness-chained";
    public const string Marker = "Readiness pre-push hook";
    public const string CommandSetting = "readiness.command";

    /// <summary>The hooks folder git uses: <c>core.hooksPath</c> when set, else the git directory's <c>hooks/</c>.</summary>
    public string HooksDirectory()
    {
        var path = GitProcess.Require(repositoryPath, "rev-parse", "--git-path", "hooks");
        return Path.GetFullPath(path, repositoryPath);
    }

    public string Install(string hookSource, string command)
    {
        ArgumentNullException.ThrowIfNull(hookSource);
        var hooks = HooksDirectory();
        Directory.CreateDirectory(hooks);
        var target = Path.Combine(hooks, HookName);
        var chained = Path.Combine(hooks, ChainedName);
        var messages = new List<string>();
        if (File.Exists(target) && !IsOurs(target))
        {
            if (File.Exists(chained))
            {
                throw new InvalidOperationException($"{target} is not Readiness's hook and {chained} already exists; move one of them away first");
            }

            File.Move(target, chained);
            messages.Add($"kept the existing hook as {chained}; it runs first");
        }

        File.Copy(hookSource, target, overwrite: true);
        if (!OperatingSystem.IsWindows())
        {
            File.SetUnixFileMode(target, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute
                | UnixFileMode.GroupRead | UnixFileMode.GroupExecute | UnixFileMode.OtherRead | UnixFileMode.OtherExecute);
        }

        GitProcess.Require(repositoryPath, "config", "--local", CommandSetting, command);
        messages.Insert(0, $"installed {target} (readiness command: {command})");
        return string.Join(Environment.NewLine, messages);
    }

    public string Uninstall()
    {
        var hooks = HooksDirectory();
        var target = Path.Combine(hooks, HookName);
        var chained = Path.Combine(hooks, ChainedName);
        var messages = new List<string>();
        if (File.Exists(target) && IsOurs(target))
        {
            File.Delete(target);
            messages.Add($"removed {target}");
        }
        else
        {
            messages.Add($"no Readiness hook at {target}");
        }

        if (File.Exists(chained) && !File.Exists(target))
        {
            File.Move(chained, target);
            messages.Add($"restored the earlier hook to {target}");
        }

        // The recorded command is shared by every hooks folder of this repository: keep it while a Readiness hook
        // remains in another one (the git directory's hooks/ beside core.hooksPath, or the other way round).
        var remaining = HookFolders().Where(f => !SameFolder(f, hooks) && HasOurHook(f)).ToList();
        if (remaining.Count == 0)
        {
            GitProcess.Run(repositoryPath, "config", "--local", "--unset", CommandSetting);
        }
        else
        {
            messages.Add($"kept the recorded readiness command: a Readiness hook remains in {string.Join(", ", remaining)}");
        }

        return string.Join(Environment.NewLine, messages);
    }

    /// <summary>Every hooks folder git may use for this repository: the git directory's <c>hooks/</c> and <c>core.hooksPath</c>.</summary>
    public IReadOnlyList<string> HookFolders()
    {
        var folders = new List<string> { HooksDirectory() };
        var (code, commonDir, _) = GitProcess.Run(repositoryPath, "rev-parse", "--git-common-dir");
        if (code == 0 && commonDir.Length > 0)
        {
            folders.Add(Path.Combine(Path.GetFullPath(commonDir, repositoryPath), "hooks"));
        }

        var (pathCode, hooksPath, _) = GitProcess.Run(repositoryPath, "config", "--get", "core.hooksPath");
        if (pathCode == 0 && hooksPath.Length > 0)
        {
            folders.Add(Path.GetFullPath(hooksPath, repositoryPath));
        }

        return folders.DistinctBy(f => Path.TrimEndingDirectorySeparator(f), StringComparer.Ordinal).ToList();
    }

    private static bool SameFolder(string a, string b) =>
        string.Equals(Path.TrimEndingDirectorySeparator(a), Path.TrimEndingDirectorySeparator(b), StringComparison.Ordinal);

    private static bool HasOurHook(string folder)
    {
        var hook = Path.Combine(folder, HookName);
        return File.Exists(hook) && IsOurs(hook);
    }

    /// <summary>
    /// What is installed, and whether it can work. Returns (healthy, lines). With <paramref name="hookSource"/> (the
    /// hook this program ships), an installed hook that differs from it is named as an older version.
    /// </summary>
    public (bool Healthy, IReadOnlyList<string> Lines) Status(string? hookSource = null)
    {
        var hooks = HooksDirectory();
        var target = Path.Combine(hooks, HookName);
        var lines = new List<string> { $"hooks folder: {hooks}" };
        var healthy = true;
        if (!File.Exists(target))
        {
            lines.Add("pre-push: not installed");
            return (false, lines);
        }

        if (!IsOurs(target))
        {
            lines.Add("pre-push: another tool's hook (not Readiness's)");
            return (false, lines);
        }

        var executable = OperatingSystem.IsWindows() || (File.GetUnixFileMode(target) & UnixFileMode.UserExecute) != 0;
        lines.Add($"pre-push: Readiness hook{(executable ? string.Empty : " (NOT executable: git will ignore it)")}");
        if (hookSource is not null && File.Exists(hookSource) && File.ReadAllText(hookSource) != File.ReadAllText(target))
        {
            lines.Add("pre-push: differs from the hook this readiness ships (an older or edited copy); 'readiness hook install' replaces it");
        }

        healthy &= executable;
        if (File.Exists(Path.Combine(hooks, ChainedName)))
        {
            lines.Add($"chained: {ChainedName} runs first");
        }

        // The hook runs the recorded command, else `readiness` from PATH (hooks/pre-push): either must exist.
        var (code, command, _) = GitProcess.Run(repositoryPath, "config", "--get", CommandSetting);
        if (code == 0)
        {
            var found = File.Exists(command) || CommandOnPath(command, searchPath) is not null;
            lines.Add($"readiness command: {command}{(found ? string.Empty : " (NOT FOUND: the hook will stop every release push)")}");
            healthy &= found;
        }
        else
        {
            var onPath = CommandOnPath("readiness", searchPath);
            lines.Add(onPath is null
                ? "readiness command: not recorded and 'readiness' is not on PATH (NOT FOUND: the hook will stop every release push; run 'readiness hook install' again)"
                : $"readiness command: not recorded; PATH gives {onPath}");
            healthy &= onPath is not null;
        }

        return (healthy, lines);
    }

    public static bool IsOurs(string path) =>
        File.ReadLines(path).Take(5).Any(l => l.Contains(Marker, StringComparison.Ordinal));

    public static string? CommandOnPath(string name, string? searchPath = null)
    {
        foreach (var folder in (searchPath ?? Environment.GetEnvironmentVariable("PATH") ?? string.Empty).Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries))
        {
            var candidate = Path.Combine(folder, name);
            if (File.Exists(candidate))
            {
                return candidate;
            }
        }

        return null;
    }
}
