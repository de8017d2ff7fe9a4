namespace Readiness.Core.Configuration;

/// <summary>A configuration or checklist error a user can act on: names the file, line and column. Exit code 2.</summary>
public sealed class ConfigurationException(ConfigMark mark, string problem)
    : Exception($"{mark}: {problem}")
{
    public ConfigMark Mark { get; } = mark;

    public string Problem { get; } = problem;
}
