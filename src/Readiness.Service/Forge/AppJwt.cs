using System.Security.Cryptography;
using System.Text;
using System.Text.Json;

namespace Readiness.Service.Forge;

/// <summary>
/// The JSON Web Token an app presents to ask for installation tokens: RS256 (RFC 7518 §3.3) over
/// <c>{"iat","exp","iss"}</c>, issued 60 s in the past and expiring at most 10 minutes ahead (the forge's app
/// authentication docs).
/// </summary>
public static class AppJwt
{
    public static readonly TimeSpan IssuedBack = TimeSpan.FromSeconds(60);
    public static readonly TimeSpan Lifetime = TimeSpan.FromMinutes(9);

    public static string Create(string appId, RSA key, DateTimeOffset now)
    {
        ArgumentException.ThrowIfNullOrEmpty(appId);
        ArgumentNullException.ThrowIfNull(key);
        var header = Base64Url(JsonSerializer.SerializeToUtf8Bytes(new { alg = "RS256", typ = "JWT" }));
        var payload = Base64Url(JsonSerializer.SerializeToUtf8Bytes(new
        {
            iat = (now - IssuedBack).ToUnixTimeSeconds(),
            exp = (now + Lifetime).ToUnixTimeSeconds(),
            iss = appId,
        }));
        var signingInput = header + "." + payload;
        var signature = key.SignData(Encoding.ASCII.GetBytes(signingInput), HashAlgorithmName.SHA256, RSASignaturePadding.Pkcs1);
        return signingInput + "." + Base64Url(signature);
    }

    /// <summary>Base64url without padding (RFC 7515 §2).</summary>
    public static string Base64Url(byte[] bytes) =>
        Convert.ToBase64String(bytes).TrimEnd('=').Replace('+', '-').Replace('/', '_');
}
