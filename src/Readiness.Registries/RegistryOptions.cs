namespace Readiness.Registries;

/// <summary>How the registry adapters behave: time bound, on-disk cache, and where the user's NuGet configuration is.</summary>
public sealed record RegistryOptions
{
    public static readonly TimeSpan DefaultTimeout = Core.Engine.RegistryPhase.DefaultTimeout;
    public static readonly TimeSpan DefaultCacheTimeToLive = TimeSpan.FromMinutes(10);

    /// <summary>Longest time one HTTP request may take (the registry phase bounds the whole lookup separately).</summary>
    public TimeSpan Timeout { get; init; } = DefaultTimeout;

    /// <summary>Ask the feed every time; neither read nor write the on-disk cache.</summary>
    public bool NoCache { get; init; }

    /// <summary>Where cached answers live; null for <see cref="DefaultCacheFolder"/>.</summary>
    public string? CacheFolder { get; init; }

    /// <summary>How long a cached answer is used.</summary>
    public TimeSpan CacheTimeToLive { get; init; } = DefaultCacheTimeToLive;

    public TimeProvider TimeProvider { get; init; } = TimeProvider.System;

    /// <summary>
    /// Also ask the feed's search service who owns each id (one more request per id). Worth it only when the
    /// configuration lists <c>owners</c>; otherwise owners stay unknown.
    /// </summary>
    public bool AskOwners { get; init; }

    /// <summary>
    /// A NuGet configuration file to take feed credentials from instead of the user's own configuration (the
    /// user-wide and machine-wide files). Never a file of the inspected repository.
    /// </summary>
    public string? NuGetConfigFile { get; init; }

    /// <summary><c>$XDG_CACHE_HOME/readiness/registry-cache</c> when that variable is set, else
    /// <c>{LocalApplicationData}/readiness/registry-cache</c>.</summary>
    public static string DefaultCacheFolder
    {
        get
        {
            var xdg = Environment.GetEnvironmentVariable("XDG_CACHE_HOME");
            var root = !string.IsNullOrWhiteSpace(xdg) && Path.IsPathFullyQualified(xdg)
                ? xdg
                : Environment.GetFolderPath(Environment.SpecialFolder.LocalApplicationData, Environment.SpecialFolderOption.Create);
            return Path.Combine(root, "readiness", "registry-cache");
        }
    }
}
