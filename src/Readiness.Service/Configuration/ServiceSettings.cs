using System.Security.Cryptography;

namespace Readiness.Service.Configuration;

/// <summary>
/// The service's settings, read once from the usual ASP.NET Core sources (section <c>Readiness</c>) and checked:
/// a missing or bad value throws <see cref="ServiceConfigurationException"/> naming the setting.
/// </summary>
public sealed class ServiceSettings
{
    public const string Section = "Readiness";
    public static readonly Uri DefaultForgeApiUrl = new("https://api.github.com/");

    /// <summary>The forge's API base URL.</summary>
    public required Uri ForgeApiUrl { get; init; }

    /// <summary>
    /// The only host clone URLs may name (<c>Readiness:Forge:CloneHost</c>; by default the API's host, without a
    /// leading <c>api.</c>): the forge's token is offered to no other.
    /// </summary>
    public string CloneHost => ConfiguredCloneHost ?? (ForgeApiUrl.Host.StartsWith("api.", StringComparison.OrdinalIgnoreCase) ? ForgeApiUrl.Host[4..] : ForgeApiUrl.Host);

    public string? ConfiguredCloneHost { get; init; }

    /// <summary>A plain token, for setups without an app.</summary>
    public string? ForgeToken { get; init; }

    /// <summary>The app's id (or client id), the JWT issuer.</summary>
    public string? AppId { get; init; }

    /// <summary>The app's private key (PEM text, read from the configured file).</summary>
    public string? AppPrivateKeyPem { get; init; }

    /// <summary>The secret the forge signs webhook deliveries with.</summary>
    public required string WebhookSecret { get; init; }

    /// <summary>The bearer token hook clients present to <c>POST /api/runs</c>; null disables recording.</summary>
    public string? ApiToken { get; init; }

    /// <summary>Where the database and the repository mirrors live.</summary>
    public required string DataFolder { get; init; }

    /// <summary>The organisation's checklists (<c>NAME.yml</c>), if any.</summary>
    public string? ChecklistFolder { get; init; }

    /// <summary>Base branches that make a pull request a release candidate (<see cref="Core.Configuration.NameGlob"/> patterns).</summary>
    public required IReadOnlyList<string> ReleaseBranches { get; init; }

    /// <summary>The label that makes a pull request a release candidate.</summary>
    public string ReleaseLabel { get; init; } = "release";

    /// <summary>The service's address as people reach it, for links in statuses and comments.</summary>
    public required Uri PublicUrl { get; init; }

    /// <summary>The NuGet feed registry checks ask, or null for none (registry checks then skip).</summary>
    public string? Registry { get; init; }

    /// <summary>
    /// Whether deliveries may name clone URLs other than https (file paths, <c>file://</c>, ssh): for tests and
    /// for forges on the same machine. Off by default.
    /// </summary>
    public bool AllowNonHttpsCloneUrls { get; init; }

    public int WorkerCount { get; init; } = 2;

    public TimeSpan Lease { get; init; } = TimeSpan.FromMinutes(2);

    public TimeSpan Poll { get; init; } = TimeSpan.FromSeconds(5);

    /// <summary>How long a queued job waits after its pull request's last event before it may run.</summary>
    public TimeSpan Quiet { get; init; } = TimeSpan.FromSeconds(1);

    /// <summary>The longest a job waits for its pull request's events to stop, from the first one.</summary>
    public TimeSpan MaxQuiet { get; init; } = TimeSpan.FromMinutes(1);

    public int MaxAttempts { get; init; } = 5;

    /// <summary>Queued jobs one repository may hold; deliveries beyond it are answered 503.</summary>
    public int MaxQueuedPerRepository { get; init; } = 1000;

    /// <summary>Jobs of one repository running at once, across all instances.</summary>
    public int MaxRunningPerRepository { get; init; } = 4;

    /// <summary>How long deliveries and finished jobs are kept (runs, the history, are kept).</summary>
    public TimeSpan Retention { get; init; } = TimeSpan.FromDays(30);

    /// <summary>
    /// A PostgreSQL connection string (<c>Readiness:PostgresConnection</c>): when set, deliveries, jobs and runs live
    /// there and several instances may share them; when not, in the SQLite file in <see cref="DataFolder"/>.
    /// </summary>
    public string? PostgresConnection { get; init; }

    /// <summary>The options the job store applies.</summary>
    public Storage.JobStoreOptions JobOptions => new(Quiet, MaxQuiet, MaxAttempts, MaxQueuedPerRepository, MaxRunningPerRepository);

    public int ForgeMaxRetries { get; init; } = 4;

    public TimeSpan ForgeMaxRetryDelay { get; init; } = TimeSpan.FromMinutes(2);

    public TimeSpan JobRetryDelay { get; init; } = TimeSpan.FromSeconds(30);

    /// <summary>How long one forge call may take before it is cancelled and retried.</summary>
    public TimeSpan ForgeCallTimeout { get; init; } = TimeSpan.FromSeconds(15);

    public bool UsesApp => AppId is not null;

    /// <summary>The password inside <see cref="PostgresConnection"/>, for redaction.</summary>
    public string? PostgresPassword => PostgresConnection is { } cs ? new Npgsql.NpgsqlConnectionStringBuilder(cs).Password : null;

    public string DatabasePath => Path.Combine(DataFolder, "readiness.db");

    public string MirrorFolder => Path.Combine(DataFolder, "mirrors");

    /// <summary>Every secret value configured, for redaction.</summary>
    public IReadOnlyList<string> Secrets =>
        new[] { ForgeToken, WebhookSecret, ApiToken, AppPrivateKeyPem, PostgresPassword }.OfType<string>().Where(s => s.Length > 0).ToArray();

    /// <summary>Reads and checks the <c>Readiness</c> section.</summary>
    public static ServiceSettings Load(IConfiguration configuration, string contentRoot)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        var c = configuration.GetSection(Section);
        static string Key(string name) => $"{Section}:{name}";

        var apiUrlText = c["Forge:ApiUrl"];
        var apiUrl = DefaultForgeApiUrl;
        if (!string.IsNullOrWhiteSpace(apiUrlText)
            && (!Uri.TryCreate(apiUrlText, UriKind.Absolute, out apiUrl) || apiUrl.Scheme is not ("http" or "https")))
        {
            throw new ServiceConfigurationException(Key("Forge:ApiUrl"), $"'{apiUrlText}' is not an absolute http or https URL");
        }

        var token = NullIfBlank(c["Forge:Token"]);
        var appId = NullIfBlank(c["Forge:AppId"]);
        var keyFile = NullIfBlank(c["Forge:PrivateKeyFile"]);
        string? pem = null;
        if (token is not null && (appId is not null || keyFile is not null))
        {
            throw new ServiceConfigurationException(Key("Forge:Token"), "set either a token or an app (Forge:AppId with Forge:PrivateKeyFile), not both");
        }

        if (token is null)
        {
            if (appId is null)
            {
                throw new ServiceConfigurationException(
                    Key("Forge:AppId"), "missing: configure an app (Forge:AppId with Forge:PrivateKeyFile) or a plain Forge:Token");
            }

            if (keyFile is null)
            {
                throw new ServiceConfigurationException(Key("Forge:PrivateKeyFile"), "missing: the app's private key file (PEM) is needed with Forge:AppId");
            }

            var keyPath = Path.GetFullPath(keyFile, contentRoot);
            if (!File.Exists(keyPath))
            {
                throw new ServiceConfigurationException(Key("Forge:PrivateKeyFile"), $"no file at {keyPath}");
            }

            if (new FileInfo(keyPath).Length > 64 * 1024)
            {
                throw new ServiceConfigurationException(Key("Forge:PrivateKeyFile"), $"{keyPath} is too large to be a private key");
            }

            pem = File.ReadAllText(keyPath);
            try
            {
                using var rsa = RSA.Create();
                rsa.ImportFromPem(pem);
            }
            catch (Exception e) when (e is ArgumentException or CryptographicException)
            {
                // The key's text never goes into the message.
                throw new ServiceConfigurationException(Key("Forge:PrivateKeyFile"), $"{keyPath} does not hold an RSA private key in PEM form");
            }
        }

        var secret = NullIfBlank(c["Forge:WebhookSecret"])
            ?? throw new ServiceConfigurationException(Key("Forge:WebhookSecret"), "missing: the secret the forge signs webhook deliveries with");

        var dataFolder = Path.GetFullPath(NullIfBlank(c["DataFolder"]) ?? "data", contentRoot);
        var checklistFolder = NullIfBlank(c["ChecklistFolder"]) is { } cf ? Path.GetFullPath(cf, contentRoot) : null;
        if (checklistFolder is not null && !Directory.Exists(checklistFolder))
        {
            throw new ServiceConfigurationException(Key("ChecklistFolder"), $"no folder at {checklistFolder}");
        }

        Uri? publicUrl = null;
        if (NullIfBlank(c["PublicUrl"]) is { } publicText
            && (!Uri.TryCreate(publicText, UriKind.Absolute, out publicUrl) || publicUrl.Scheme is not ("http" or "https")))
        {
            throw new ServiceConfigurationException(Key("PublicUrl"), $"'{publicText}' is not an absolute http or https URL");
        }

        publicUrl ??= DefaultPublicUrl(configuration["urls"]);
        return new ServiceSettings
        {
            ForgeApiUrl = apiUrl,
            ForgeToken = token,
            ConfiguredCloneHost = NullIfBlank(c["Forge:CloneHost"]),
            AppId = appId,
            AppPrivateKeyPem = pem,
            WebhookSecret = secret,
            ApiToken = NullIfBlank(c["ApiToken"]),
            DataFolder = dataFolder,
            ChecklistFolder = checklistFolder,
            ReleaseBranches = ReadPatterns(c, Key("ReleaseBranches")),
            ReleaseLabel = NullIfBlank(c["ReleaseLabel"]) ?? "release",
            PublicUrl = publicUrl,
            Registry = NullIfBlank(c["Registry"]),
            AllowNonHttpsCloneUrls = Bool(c, "AllowNonHttpsCloneUrls"),
            WorkerCount = Int(c, "Worker:Count", 2, 1, 64),
            Lease = TimeSpan.FromSeconds(Int(c, "Worker:LeaseSeconds", 120, 1, 3600)),
            Poll = TimeSpan.FromMilliseconds(Int(c, "Worker:PollMilliseconds", 5000, 10, 600_000)),
            MaxAttempts = Int(c, "Worker:MaxAttempts", 5, 1, 100),
            Quiet = TimeSpan.FromMilliseconds(Int(c, "Worker:QuietMilliseconds", 1000, 0, 600_000)),
            MaxQuiet = TimeSpan.FromMilliseconds(Int(c, "Worker:MaxQuietMilliseconds", 60_000, 0, 3_600_000)),
            MaxQueuedPerRepository = Int(c, "Worker:MaxQueuedPerRepository", 1000, 1, 1_000_000),
            MaxRunningPerRepository = Int(c, "Worker:MaxRunningPerRepository", 4, 1, 1000),
            Retention = TimeSpan.FromDays(Int(c, "RetentionDays", 30, 1, 3650)),
            PostgresConnection = ReadPostgresConnection(c, Key("PostgresConnection")),
            JobRetryDelay = TimeSpan.FromMilliseconds(Int(c, "Worker:RetryDelayMilliseconds", 30_000, 0, 3_600_000)),
            ForgeMaxRetries = Int(c, "Forge:MaxRetries", 4, 0, 20),
            ForgeCallTimeout = TimeSpan.FromMilliseconds(Int(c, "Forge:CallTimeoutMilliseconds", 15_000, 50, 300_000)),
            ForgeMaxRetryDelay = TimeSpan.FromMilliseconds(Int(c, "Forge:MaxRetryDelayMilliseconds", 120_000, 0, 3_600_000)),
        };
    }

    private static string? ReadPostgresConnection(IConfigurationSection c, string key)
    {
        var text = NullIfBlank(c["PostgresConnection"]);
        if (text is null)
        {
            return null;
        }

        try
        {
            _ = new Npgsql.NpgsqlConnectionStringBuilder(text);
            return text;
        }
        catch (ArgumentException e)
        {
            // The message names the bad keyword, never the value (it may hold a password).
            throw new ServiceConfigurationException(key, $"not a PostgreSQL connection string: {e.Message}");
        }
    }

    /// <summary>The first listening address when it names a host, else the default one.</summary>
    private static Uri DefaultPublicUrl(string? urls)
    {
        var first = urls?.Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).FirstOrDefault();
        return first is not null && Uri.TryCreate(first, UriKind.Absolute, out var uri) && uri.Host is not ("+" or "*" or "0.0.0.0" or "[::]") && uri.Port != 0
            ? uri
            : new Uri("http://127.0.0.1:5080/");
    }

    private static IReadOnlyList<string> ReadPatterns(IConfigurationSection c, string key)
    {
        var section = c.GetSection("ReleaseBranches");
        var texts = section.GetChildren().Select(s => s.Value).OfType<string>().ToList();
        if (texts.Count == 0 && section.Value is { } single)
        {
            texts.AddRange(single.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));
        }

        if (texts.Count == 0)
        {
            texts.Add("release/*");
        }

        if (texts.Any(string.IsNullOrWhiteSpace))
        {
            throw new ServiceConfigurationException(key, "a pattern is empty");
        }

        return texts.Select(t => t.Trim()).ToArray();
    }

    private static int Int(IConfigurationSection c, string name, int fallback, int min, int max)
    {
        var text = NullIfBlank(c[name]);
        if (text is null)
        {
            return fallback;
        }

        if (!int.TryParse(text, System.Globalization.NumberStyles.Integer, System.Globalization.CultureInfo.InvariantCulture, out var value)
            || value < min || value > max)
        {
            throw new ServiceConfigurationException($"{Section}:{name}", $"'{text}' is not a whole number from {min} to {max}");
        }

        return value;
    }

    private static bool Bool(IConfigurationSection c, string name)
    {
        var text = NullIfBlank(c[name]);
        return text is null ? false
            : bool.TryParse(text, out var value) ? value
            : throw new ServiceConfigurationException($"{Section}:{name}", $"'{text}' is neither true nor false");
    }

    private static string? NullIfBlank(string? text) => string.IsNullOrWhiteSpace(text) ? null : text.Trim();
}
