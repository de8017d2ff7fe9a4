using Readiness.Service.Configuration;
using Readiness.Testing;

namespace Readiness.Service.Tests.EndToEnd;

public sealed class StartupTests
{
    [Fact]
    public async Task MissingWebhookSecret_StopsStartUp_NamingTheSetting()
    {
        using var data = new TempDirectory("readiness-startup-");
        await using var host = new ServiceHost(new Uri("http://127.0.0.1:9/"), data.Path, new CapturedLogs(), new Dictionary<string, string?> { ["Readiness:Forge:WebhookSecret"] = "" });
        var e = Assert.Throws<ServiceConfigurationException>(() => host.Server);
        Assert.Equal("Readiness:Forge:WebhookSecret", e.Setting);
        Assert.Contains("Readiness__Forge__WebhookSecret", e.Message, StringComparison.Ordinal);
        Assert.DoesNotContain(ServiceHost.Token, e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task DataFolderThatIsAFile_StopsStartUp_NamingTheSetting()
    {
        using var data = new TempDirectory("readiness-startup-");
        var file = data.Combine("not-a-folder");
        File.WriteAllText(file, "x");
        await using var host = new ServiceHost(new Uri("http://127.0.0.1:9/"), file, new CapturedLogs());
        var e = Assert.Throws<ServiceConfigurationException>(() => host.Server);
        Assert.Equal("Readiness:DataFolder", e.Setting);
    }
}
