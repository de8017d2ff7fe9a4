using Readiness.Service.Configuration;

namespace Readiness.Service.Tests;

public static class TestSettings
{
    public static ServiceSettings Create(Uri forgeApiUrl, string dataFolder, string? token = "forge-token-Xq81", string? appId = null, string? pem = null) => new()
    {
        ForgeApiUrl = forgeApiUrl,
        ForgeToken = token,
        AppId = appId,
        AppPrivateKeyPem = pem,
        WebhookSecret = "webhook-secret-Zr52",
        DataFolder = dataFolder,
        ReleaseBranches = ["release/*"],
        PublicUrl = new Uri("http://127.0.0.1:5080/"),
        ForgeMaxRetries = 3,
        ForgeMaxRetryDelay = TimeSpan.FromMilliseconds(20),
    };
}
