using System.Diagnostics;
using Microsoft.Extensions.Configuration;
using Readiness.Service.Configuration;
using Readiness.Testing;

namespace Readiness.Service.Tests.EndToEnd;

public sealed class StartupTests
{
    [Fact]
    public async Task MissingWebhookSecret_StopsStartUp_NamingTheSetting()
    {
        using var data = new TempDirectory("readiness-startup-");
        var e = await StartAsync(data.Path, ("Readiness:Forge:Token", "a-token-not-to-show"));
        Assert.Equal("Readiness:Forge:WebhookSecret", e.Setting);
        Assert.Contains("Readiness__Forge__WebhookSecret", e.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("a-token-not-to-show", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task DataFolderThatIsAFile_StopsStartUp_NamingTheSetting()
    {
        using var data = new TempDirectory("readiness-startup-");
        var file = data.Combine("not-a-folder");
        File.WriteAllText(file, "x");
        var e = await StartAsync(file, ("Readiness:Forge:Token", "t"), ("Readiness:Forge:WebhookSecret", "s"));
        Assert.Equal("Readiness:DataFolder", e.Setting);
    }

    [Fact]
    public async Task ServiceProgram_WithoutASecret_ExitsWithOneClearMessage()
    {
        // The real program, as `dotnet run` starts it: exit code 2 and one line naming the setting on stderr.
        using var data = new TempDirectory("readiness-startup-");
        var start = new ProcessStartInfo("dotnet") { RedirectStandardError = true, RedirectStandardOutput = true, WorkingDirectory = data.Path };
        start.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, "Readiness.Service.dll"));
        start.ArgumentList.Add("--urls=http://127.0.0.1:0");
        start.Environment["Readiness__Forge__Token"] = "a-token-not-to-show";
        start.Environment["Readiness__DataFolder"] = data.Path;
        start.Environment["Readiness__Forge__WebhookSecret"] = string.Empty;
        using var process = Process.Start(start)!;
        var stderr = process.StandardError.ReadToEndAsync();
        var stdout = process.StandardOutput.ReadToEndAsync();
        Assert.True(process.WaitForExit(60_000), "the service did not stop");
        var errors = await stderr;
        Assert.Equal(2, process.ExitCode);
        var line = Assert.Single(errors.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.StartsWith("readiness service: configuration setting Readiness:Forge:WebhookSecret: missing", line, StringComparison.Ordinal);
        Assert.DoesNotContain("a-token-not-to-show", errors + await stdout, StringComparison.Ordinal);
    }

    [Fact]
    public async Task ServiceProgram_OnAPortInUse_ExitsWithOneLineNamingIt()
    {
        using var data = new TempDirectory("readiness-startup-");
        using var taken = new System.Net.Sockets.TcpListener(System.Net.IPAddress.Loopback, 0);
        taken.Start();
        var port = ((System.Net.IPEndPoint)taken.LocalEndpoint).Port;
        var start = new ProcessStartInfo("dotnet") { RedirectStandardError = true, RedirectStandardOutput = true, WorkingDirectory = data.Path };
        start.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, "Readiness.Service.dll"));
        start.ArgumentList.Add($"--urls=http://127.0.0.1:{port}");
        start.Environment["Readiness__Forge__Token"] = "a-token-not-to-show";
        start.Environment["Readiness__DataFolder"] = data.Path;
        start.Environment["Readiness__Forge__WebhookSecret"] = "a-secret";
        start.Environment["Logging__LogLevel__Default"] = "None";
        using var process = Process.Start(start)!;
        var stderr = process.StandardError.ReadToEndAsync();
        var stdout = process.StandardOutput.ReadToEndAsync();
        Assert.True(process.WaitForExit(60_000), "the service did not stop");
        var errors = await stderr;
        Assert.Equal(Program.CannotListen, process.ExitCode);
        var line = Assert.Single(errors.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.StartsWith("readiness service: cannot listen: ", line, StringComparison.Ordinal);
        Assert.Contains($"127.0.0.1:{port}", line, StringComparison.Ordinal);
        Assert.DoesNotContain(" at ", await stdout + errors, StringComparison.Ordinal);
    }

    private static async Task<ServiceConfigurationException> StartAsync(string dataFolder, params (string Key, string Value)[] settings)
    {
        var app = ServiceApp.Build(["--urls=http://127.0.0.1:0"], b => b.Configuration.AddInMemoryCollection(
            settings.Select(s => new KeyValuePair<string, string?>(s.Key, s.Value))
                .Append(new("Readiness:DataFolder", dataFolder))
                .Append(new("Readiness:Registry", "offline"))));
        try
        {
            return await Assert.ThrowsAsync<ServiceConfigurationException>(() => app.StartAsync());
        }
        finally
        {
            await app.DisposeAsync();
        }
    }
}
