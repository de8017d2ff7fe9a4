namespace Readiness.Registries.Tests;

/// <summary>A NuGet configuration with no sources and no credentials, so tests never read the machine user's own.</summary>
internal static class EmptyNuGetConfig
{
    private static readonly Lazy<string> File = new(() =>
    {
        var path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), $"readiness-empty-{Guid.NewGuid():N}.config");
        System.IO.File.WriteAllText(path, "<?xml version=\"1.0\" encoding=\"utf-8\"?>\n<configuration>\n  <packageSources>\n    <clear />\n  </packageSources>\n</configuration>\n");
        return path;
    });

    public static string Path => File.Value;

    /// <summary>A configuration that gives <paramref name="user"/>/<paramref name="password"/> for <paramref name="source"/>.</summary>
    public static string WithCredentials(string folder, string source, string user, string password)
    {
        // nuget.config reference, packageSourceCredentials (learn.microsoft.com/nuget/reference/nuget-config-file).
        var path = System.IO.Path.Combine(folder, "NuGet.Config");
        System.IO.File.WriteAllText(path, $"""
            <?xml version="1.0" encoding="utf-8"?>
            <configuration>
              <packageSources>
                <clear />
                <add key="bramblecote" value="{source}" />
              </packageSources>
              <packageSourceCredentials>
                <bramblecote>
                  <add key="Username" value="{user}" />
                  <add key="ClearTextPassword" value="{password}" />
                </bramblecote>
              </packageSourceCredentials>
            </configuration>
            """);
        return path;
    }
}
