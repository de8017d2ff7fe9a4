using Readiness.Core.Checklists;
using Readiness.Core.Configuration;
using Readiness.Core.Projects;
using Readiness.Core.Registry;
using Readiness.Core.Reports;
using Readiness.Core.Snapshots;

namespace Readiness.Core.Engine;

/// <summary>
/// The one path every front end takes: snapshot → configuration → checklist → project model → release facts →
/// registry facts → engine → report. Built once; thread-safe.
/// </summary>
public sealed class ReadinessRunner(
    ISnapshotSource snapshots,
    IProjectModelReader projectReader,
    IChecklistSource checklists,
    ChecklistEngine engine,
    TimeProvider time)
{
    public const string DefaultChecklist = "library";

    public ChecklistParser Parser { get; } = new(Checks.CheckIds.All);

    public ChecklistResolver Resolver => new(checklists, Parser, engine.Catalog.DefaultSeverities);

    /// <summary>Runs one inspection. Throws <see cref="RepositoryInspectionException"/> (exit 3) and
    /// <see cref="ConfigurationException"/> (exit 2) for what the user must fix first.</summary>
    public async Task<Report> RunAsync(RunRequest request, RegistrySelector? registries, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(request);
        using var snapshot = snapshots.Open(request.Snapshot);
        return await RunAsync(snapshot, request, registries, cancellationToken).ConfigureAwait(false);
    }

    /// <summary>Runs one inspection on a snapshot the caller opened (and disposes); <c>request.Snapshot</c> is not opened again.</summary>
    public async Task<Report> RunAsync(ReleaseSnapshot snapshot, RunRequest request, RegistrySelector? registries, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(snapshot);
        ArgumentNullException.ThrowIfNull(request);
        var config = request.Config ?? ReadConfig(snapshot.Files);
        var resolver = Resolver;
        var definition = request.Checklist
            ?? (request.ChecklistName is null && config.Checklist is { } own && RepositoryChecklist.IsPath(own)
                ? RepositoryChecklist.Load(snapshot.Files, own, config.Values["checklist"].Mark, Parser)
                : resolver.Load(request.ChecklistName ?? config.Checklist ?? DefaultChecklist,
                    config.Checklist is not null && request.ChecklistName is null ? config.Values["checklist"].Mark : null));
        var checklist = resolver.Resolve(definition, config);
        var packs = PackCommands.Read(snapshot.Files);
        var model = PackageSelection.Apply(projectReader.Read(snapshot.Files), packs, config);
        var projectsRequired = !config.Values.TryGetValue(BuildInventory.ProjectsRequiredKey, out var required)
            || required.AsBool(BuildInventory.ProjectsRequiredKey);
        if (model.Projects.Count == 0 && projectsRequired)
        {
            // No build the tool understands: never a verdict without grounds (exit 3, "could not inspect").
            throw new RepositoryInspectionException(BuildInventory.Describe(snapshot.Files, model));
        }

        var now = time.GetUtcNow();
        var release = ReleaseFactsBuilder.Build(snapshot, model, config, request.Version, now);

        RegistryFacts? registryFacts = null;
        if (checklist.Checks.Any(c => c.Id.StartsWith("registry.", StringComparison.Ordinal)))
        {
            var registry = registries?.Invoke(config);
            try
            {
                registryFacts = registry is null
                    ? RegistryFacts.Offline("offline: no registry was asked (--offline, or none configured)")
                    : await RegistryPhase.GatherAsync(
                        registry,
                        RegistryIds(model),
                        RegistryPhase.Resolve(request.RegistryTimeout, config),
                        cancellationToken).ConfigureAwait(false);
            }
            finally
            {
                (registry as IDisposable)?.Dispose();
            }
        }

        var notes = new List<string>();
        notes.AddRange(checklist.Checks.Where(c => engine.Catalog.Find(c.Id) is null)
            .Select(c => $"{c.Id} is in the checklist but this version of the tool does not implement it yet; it did not run."));
        notes.AddRange(snapshot.Notes);
        notes.AddRange(snapshot.Files.Unread.Select(u => u.ToString()));
        // Unreadable project files are build.readable's errors when the checklist runs it, notes otherwise.
        var readableRuns = checklist.Checks.Any(c => c.Id == Checks.CheckIds.BuildReadable);
        notes.AddRange(model.Problems.Where(p => !readableRuns || p.Kind != ProjectProblemKind.Unreadable).Select(p => p.ToString()));
        if (model.Projects.Count == 0)
        {
            notes.Add($"No .NET project was read; {BuildInventory.ProjectsRequiredKey}: false in {RepositoryConfig.FileName} allows that.");
        }

        notes.Add($"Release tags: {release.TagPatternSource}.");
        notes.AddRange(PackageSelection.Describe(model));
        notes.Add($"Version {release.Version ?? "(unknown)"} taken from {release.VersionSource}.");
        var input = new EngineInput(
            snapshot,
            model,
            checklist,
            config,
            release,
            registryFacts,
            (request.Confirmed ?? []).ToHashSet(StringComparer.Ordinal),
            notes);
        return engine.Run(input);
    }

    /// <summary>Reads <c>.readiness.yml</c> from the candidate's files; no file means defaults.</summary>
    public RepositoryConfig ReadConfig(IFileTree files)
    {
        ArgumentNullException.ThrowIfNull(files);
        string? text;
        try
        {
            text = files.ReadText(RepositoryConfig.FileName, YamlReader.MaxChars);
        }
        catch (FileTooLargeException e)
        {
            throw new ConfigurationException(new ConfigMark(RepositoryConfig.FileName, 1, 1), $"the file is {e.Size:N0} bytes, above the {e.Limit:N0}-byte limit; it was not read");
        }

        return text is null ? RepositoryConfig.Empty : new RepositoryConfigParser(Parser).Parse(RepositoryConfig.FileName, text);
    }

    /// <summary>The packable projects' ids and every package they declare as a dependency.</summary>
    public static IEnumerable<string> RegistryIds(ProjectModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        foreach (var project in model.Packable)
        {
            yield return project.PackageId;
            // Only the dependencies the package will declare: private ones (PrivateAssets="all", IncludeAssets="none")
            // stay out of the nuspec and out of the registry checks, so they cost no lookup.
            foreach (var reference in Checks.Registry.RegistrySubjects.DeclaredDependencies(project))
            {
                yield return reference.Id;
            }
        }
    }
}
