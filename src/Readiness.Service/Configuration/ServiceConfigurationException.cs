namespace Readiness.Service.Configuration;

/// <summary>The service's configuration is missing a setting or has a bad one; start-up stops with this message.</summary>
public sealed class ServiceConfigurationException(string setting, string problem)
    : Exception($"configuration setting {setting}: {problem} (set it in appsettings.json or the environment variable {setting.Replace(":", "__", StringComparison.Ordinal)})")
{
    /// <summary>The setting's key, e.g. <c>Readiness:Forge:WebhookSecret</c>.</summary>
    public string Setting { get; } = setting;
}
