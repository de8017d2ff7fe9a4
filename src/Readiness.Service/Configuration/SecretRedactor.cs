namespace Readiness.Service.Configuration;

/// <summary>Replaces every configured secret (and installation tokens seen at run time) in a text with <c>***</c>.</summary>
public sealed class SecretRedactor
{
    private readonly Lock gate = new();
    private readonly List<string> secrets;

    public SecretRedactor(ServiceSettings settings)
    {
        ArgumentNullException.ThrowIfNull(settings);
        secrets = [.. settings.Secrets];
    }

    /// <summary>Adds a secret learnt at run time (an installation token).</summary>
    public void Add(string secret)
    {
        if (string.IsNullOrEmpty(secret))
        {
            return;
        }

        lock (gate)
        {
            if (!secrets.Contains(secret))
            {
                secrets.Add(secret);
            }
        }
    }

    public string Redact(string? text)
    {
        if (string.IsNullOrEmpty(text))
        {
            return text ?? string.Empty;
        }

        lock (gate)
        {
            foreach (var secret in secrets)
            {
                text = text.Replace(secret, "***", StringComparison.Ordinal);
            }
        }

        return text;
    }
}
