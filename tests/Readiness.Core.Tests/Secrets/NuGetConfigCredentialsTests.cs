using Readiness.Core.Secrets;

namespace Readiness.Core.Tests.Secrets;

// Element and key names from the nuget.config reference
// (https://learn.microsoft.com/nuget/reference/nuget-config-file#packagesourcecredentials, #apikeys).
public sealed class NuGetConfigCredentialsTests
{
    private static readonly string Password = SecretFixtures.Random("abcdefghijkLMNOP0123456789", 18, 42);

    private static string Config(string credentials) => $"""
        <?xml version="1.0" encoding="utf-8"?>
        <configuration>
          <packageSources>
            <add key="bramblecote" value="https://git.example/bramblecote/_packaging/index.json" />
          </packageSources>
          {credentials}
        </configuration>
        """;

    private static List<SecretHit> Find(string text, List<string>? notes = null) =>
        NuGetConfigCredentials.Find("nuget.config", text, notes ?? []).ToList();

    [Fact]
    public void ClearTextPassword_IsFoundAtItsLine()
    {
        var hits = Find(Config($"""
            <packageSourceCredentials>
                <bramblecote>
                  <add key="Username" value="dev@bramblecote.example" />
                  <add key="ClearTextPassword" value="{Password}" />
                </bramblecote>
              </packageSourceCredentials>
            """));

        var hit = Assert.Single(hits);
        Assert.Equal(9, hit.Line);
        Assert.Contains("clear-text password", hit.Kind, StringComparison.Ordinal);
    }

    [Fact]
    public void EncryptedPasswordAndApiKey_AreFound()
    {
        var hits = Find(Config($"""
            <packageSourceCredentials>
                <bramblecote>
                  <add key="Username" value="dev" />
                  <add key="Password" value="AQAAANCMnd8BFdERjHoAwE{Password}" />
                </bramblecote>
              </packageSourceCredentials>
              <apikeys>
                <add key="https://git.example/bramblecote/_packaging/index.json" value="AQAAANCMnd8B{Password}" />
              </apikeys>
            """));

        Assert.Equal(["encrypted password in nuget.config (packageSourceCredentials)", "API key in nuget.config (apikeys)"], hits.Select(h => h.Kind));
    }

    [Fact]
    public void EnvironmentVariableReference_IsNotASecret()
    {
        var hits = Find(Config("""
            <packageSourceCredentials>
                <bramblecote>
                  <add key="Username" value="%FEED_USER%" />
                  <add key="ClearTextPassword" value="%FEED_TOKEN%" />
                </bramblecote>
              </packageSourceCredentials>
            """));

        Assert.Empty(hits);
    }

    [Fact]
    public void Dtd_IsRefusedAndNoted()
    {
        var notes = new List<string>();

        var hits = Find("<?xml version=\"1.0\"?><!DOCTYPE c [<!ENTITY x \"y\">]><configuration>&x;</configuration>", notes);

        Assert.Empty(hits);
        Assert.Contains(notes, n => n.StartsWith("nuget.config:", StringComparison.Ordinal));
    }
}
