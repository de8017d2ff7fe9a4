using System.Security.Cryptography;
using Microsoft.Extensions.Logging.Abstractions;
using Microsoft.Extensions.Time.Testing;
using Readiness.Service.Configuration;
using Readiness.Service.Forge;
using Readiness.Testing;

namespace Readiness.Service.Tests.Forge;

public sealed class AppInstallationCredentialsTests : IAsyncLifetime
{
    private readonly RSA key = RSA.Create(2048);
    private readonly FakeTimeProvider time = new(new DateTimeOffset(2026, 11, 20, 12, 0, 0, TimeSpan.Zero));
    private ForgeStandIn standIn = null!;

    public async Task InitializeAsync()
    {
        standIn = await ForgeStandIn.StartAsync();
        var publicKey = RSA.Create();
        publicKey.ImportSubjectPublicKeyInfo(key.ExportSubjectPublicKeyInfo(), out _);
        standIn.AppPublicKey = publicKey;
        standIn.AppId = "4242";
        standIn.Time = time;
    }

    public async Task DisposeAsync()
    {
        key.Dispose();
        await standIn.DisposeAsync();
    }

    [Fact]
    public async Task Token_IsAskedForOnce_AndCachedUntilShortlyBeforeItExpires()
    {
        var settings = TestSettings.Create(standIn.BaseUrl, "unused", token: null, appId: "4242", pem: key.ExportRSAPrivateKeyPem());
        using var connections = new OctokitConnections(settings);
        using var credentials = new AppInstallationCredentials(
            settings, connections, new ForgeRetryPolicy(2, TimeSpan.FromMilliseconds(10), time, NullLogger<ForgeRetryPolicy>.Instance), new SecretRedactor(settings), time);

        var first = await credentials.TokenAsync(77, default);
        var second = await credentials.TokenAsync(77, default);
        Assert.Equal(first, second);
        Assert.Equal(1, standIn.TokensIssued);
        Assert.StartsWith("/api/v3/app/installations/77/access_tokens", standIn.Calls.Single().Path, StringComparison.Ordinal);

        // Tokens last an hour (the forge's app docs); renewed five minutes before.
        time.Advance(TimeSpan.FromMinutes(54));
        Assert.Equal(first, await credentials.TokenAsync(77, default));
        time.Advance(TimeSpan.FromMinutes(2));
        var renewed = await credentials.TokenAsync(77, default);
        Assert.NotEqual(first, renewed);
        Assert.Equal(2, standIn.TokensIssued);

        // The JWTs the stand-in verified with the public key: iat 60 s back, exp within 10 minutes, iss the app id.
        var claims = standIn.JwtClaims[1];
        var now = time.GetUtcNow().ToUnixTimeSeconds();
        Assert.Equal(now - 60, (long)claims["iat"]!);
        Assert.InRange((long)claims["exp"]! - now, 1, 600);
        Assert.Equal("4242", claims["iss"]!.ToString());
    }

    [Fact]
    public async Task OtherInstallation_GetsItsOwnToken()
    {
        var settings = TestSettings.Create(standIn.BaseUrl, "unused", token: null, appId: "4242", pem: key.ExportRSAPrivateKeyPem());
        using var connections = new OctokitConnections(settings);
        using var credentials = new AppInstallationCredentials(
            settings, connections, new ForgeRetryPolicy(2, TimeSpan.FromMilliseconds(10), time, NullLogger<ForgeRetryPolicy>.Instance), new SecretRedactor(settings), time);
        Assert.NotEqual(await credentials.TokenAsync(1, default), await credentials.TokenAsync(2, default));
        Assert.Equal(2, standIn.TokensIssued);
    }

    [Fact]
    public async Task WrongKey_IsRefusedByTheForge()
    {
        using var otherKey = RSA.Create(2048);
        var settings = TestSettings.Create(standIn.BaseUrl, "unused", token: null, appId: "4242", pem: otherKey.ExportRSAPrivateKeyPem());
        using var connections = new OctokitConnections(settings);
        using var credentials = new AppInstallationCredentials(
            settings, connections, new ForgeRetryPolicy(2, TimeSpan.FromMilliseconds(10), time, NullLogger<ForgeRetryPolicy>.Instance), new SecretRedactor(settings), time);
        await Assert.ThrowsAsync<Octokit.AuthorizationException>(() => credentials.TokenAsync(1, default));
        Assert.Equal(0, standIn.TokensIssued);
    }
}
