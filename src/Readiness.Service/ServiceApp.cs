using Microsoft.Extensions.Logging.Abstractions;
using Readiness.Core.Checklists;
using Readiness.Core.Engine;
using Readiness.Core.Forge;
using Readiness.Core.Projects;
using Readiness.Core.Projects.MsBuild;
using Readiness.Core.Snapshots;
using Readiness.Git;
using Readiness.Rendering;
using Readiness.Service.Api;
using Readiness.Service.Configuration;
using Readiness.Service.Forge;
using Readiness.Service.Mirrors;
using Readiness.Service.Pages;
using Readiness.Service.Storage;
using Readiness.Service.Webhooks;
using Readiness.Service.Worker;

namespace Readiness.Service;

/// <summary>Builds the service: settings, storage, forge adapter, worker, endpoints.</summary>
public static class ServiceApp
{
    public const string DefaultUrl = "http://127.0.0.1:5080";

    /// <summary>The web application, ready to run; <paramref name="configure"/> may add settings or services first.</summary>
    public static WebApplication Build(string[] args, Action<WebApplicationBuilder>? configure = null)
    {
        // Database reads and git work block pool threads for moments; on a two-core machine the pool would start
        // with two threads and add more only slowly, which shows as webhook answers of hundreds of milliseconds.
        ThreadPool.GetMinThreads(out var workerThreads, out var ioThreads);
        ThreadPool.SetMinThreads(Math.Max(workerThreads, 64), ioThreads);
        var builder = WebApplication.CreateBuilder(args);
        if (string.IsNullOrWhiteSpace(builder.Configuration["urls"]))
        {
            builder.WebHost.UseUrls(DefaultUrl);
        }

        builder.WebHost.ConfigureKestrel(k => k.AddServerHeader = false);
        AddServices(builder.Services);
        configure?.Invoke(builder);
        var app = builder.Build();
        MapEndpoints(app);
        return app;
    }

    public static void AddServices(IServiceCollection services)
    {
        ArgumentNullException.ThrowIfNull(services);

        // Start-up check first: a bad setting stops the host before anything listens or works.
        services.AddHostedService<StartupCheck>();
        services.AddSingleton(TimeProvider.System);
        services.AddSingleton(sp => ServiceSettings.Load(
            sp.GetRequiredService<IConfiguration>(), sp.GetRequiredService<IHostEnvironment>().ContentRootPath));
        services.AddSingleton<SecretRedactor>();
        AddStores(services);
        services.AddSingleton<JobSignal>();

        services.AddSingleton<OctokitConnections>();
        services.AddSingleton(sp =>
        {
            var s = sp.GetRequiredService<ServiceSettings>();
            return new ForgeRetryPolicy(s.ForgeMaxRetries, s.ForgeMaxRetryDelay, sp.GetRequiredService<TimeProvider>(),
                sp.GetService<ILogger<ForgeRetryPolicy>>() ?? NullLogger<ForgeRetryPolicy>.Instance,
                sp.GetRequiredService<IForgeLimitStore>(), s.ForgeCallTimeout);
        });
        services.AddSingleton<IForgeCredentials>(sp =>
        {
            var s = sp.GetRequiredService<ServiceSettings>();
            return s.ForgeToken is { } token
                ? new PlainTokenCredentials(token)
                : ActivatorUtilities.CreateInstance<AppInstallationCredentials>(sp);
        });
        services.AddSingleton<IForge, OctokitForge>();
        services.AddSingleton(sp => new MirrorStore(sp.GetRequiredService<ServiceSettings>().MirrorFolder, sp.GetRequiredService<ServiceSettings>().CloneHost));

        services.AddSingleton<BuiltInChecklists>();
        services.AddSingleton<IChecklistSource>(sp =>
        {
            var s = sp.GetRequiredService<ServiceSettings>();
            var builtIn = sp.GetRequiredService<BuiltInChecklists>();
            return s.ChecklistFolder is { } folder
                ? new ChecklistSources([new FolderChecklists(folder), builtIn])
                : builtIn;
        });
        services.AddSingleton<ISnapshotSource, GitSnapshotSource>();
        services.AddSingleton<IProjectModelReader, StaticProjectReader>();
        services.AddSingleton(sp => new ChecklistEngine(CheckCatalog.BuiltIn(), sp.GetRequiredService<TimeProvider>()));
        services.AddSingleton<ReadinessRunner>();
        services.AddSingleton<ReleaseCandidateTriage>();
        services.AddSingleton(_ => new ReportDocuments([new MarkdownRenderer(), new JsonRenderer(), new HtmlRenderer()], JsonReportReader.Parse));
        services.AddSingleton<PullRequestJobProcessor>();
        services.AddHostedService<JobWorker>();
        services.AddHostedService<RetentionService>();

        services.AddSingleton<WebhookEndpoint>();
        services.AddSingleton<HomePage>();
        services.AddSingleton<RunPages>();
        services.AddSingleton<ChecklistEndpoints>();
        services.AddSingleton<RunsApi>();
        services.AddSingleton<HealthEndpoints>();
    }

    /// <summary>
    /// The stores the settings choose: PostgreSQL when <c>Readiness:PostgresConnection</c> is set, else the SQLite
    /// file. Both implement <see cref="IJobStore"/> and <see cref="IRunStore"/>; nothing else knows which it has.
    /// </summary>
    private static void AddStores(IServiceCollection services)
    {
        services.AddSingleton(sp => new SqliteDatabase(sp.GetRequiredService<ServiceSettings>().DatabasePath));
        services.AddSingleton(sp => new PostgresDatabase(sp.GetRequiredService<ServiceSettings>().PostgresConnection
            ?? throw new InvalidOperationException("no PostgreSQL connection string is configured")));
        services.AddSingleton<IJobStore>(sp =>
        {
            var s = sp.GetRequiredService<ServiceSettings>();
            var time = sp.GetRequiredService<TimeProvider>();
            return s.PostgresConnection is null
                ? new SqliteJobStore(sp.GetRequiredService<SqliteDatabase>(), time, s.JobOptions)
                : new PostgresJobStore(sp.GetRequiredService<PostgresDatabase>(), time, s.JobOptions);
        });
        services.AddSingleton<IForgeLimitStore>(sp => sp.GetRequiredService<ServiceSettings>().PostgresConnection is null
            ? new SqliteForgeLimitStore(sp.GetRequiredService<SqliteDatabase>())
            : new PostgresForgeLimitStore(sp.GetRequiredService<PostgresDatabase>()));
        services.AddSingleton<IRunStore>(sp =>
        {
            var time = sp.GetRequiredService<TimeProvider>();
            return sp.GetRequiredService<ServiceSettings>().PostgresConnection is null
                ? new SqliteRunStore(sp.GetRequiredService<SqliteDatabase>(), time)
                : new PostgresRunStore(sp.GetRequiredService<PostgresDatabase>(), time);
        });
    }

    public static void MapEndpoints(WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        app.MapPost(WebhookEndpoint.Path, (HttpContext c, WebhookEndpoint e) => e.HandleAsync(c));
        app.MapGet("/", (HomePage p) => p.Render());
        app.MapGet("/runs/{id:long}", (long id, RunPages p) => p.Html(id));
        app.MapGet("/runs/{id:long}.json", (long id, RunPages p) => p.Json(id));
        app.MapGet("/runs/{id:long}.md", (long id, RunPages p) => p.Markdown(id));
        app.MapGet("/api/checklists", (HttpRequest r, ChecklistEndpoints e) => e.List(r));
        app.MapGet("/api/checklists/{name}", (string name, ChecklistEndpoints e) => e.Get(name));
        app.MapPost("/api/runs", (HttpContext c, RunsApi a) => a.PostAsync(c));
        app.MapGet("/healthz", (HealthEndpoints h) => h.Live());
        app.MapGet("/readyz", (HealthEndpoints h) => h.Ready());
        app.MapFallback((HttpContext c) => NotFoundPage.Render(c));
    }
}
