using Readiness.Core.Secrets;

namespace Readiness.Core.Configuration;

/// <summary>
/// How a configuration error quotes text from the file: short names in full, anything longer (or shaped like a
/// credential) as a short prefix only, so an error never echoes a secret pasted into the wrong place.
/// </summary>
public static class ConfigQuote
{
    /// <summary>Longest text quoted in full.</summary>
    public const int MaxQuoted = 24;

    /// <summary>Characters shown of a longer text.</summary>
    public const int PrefixLength = 4;

    public static string Of(string? text)
    {
        var value = text ?? string.Empty;
        if (value.Length <= MaxQuoted && !SecretScanner.ScanText(string.Empty, value).Any())
        {
            return value;
        }

        return $"{value[..Math.Min(PrefixLength, value.Length)]}… ({value.Length:N0} characters, not shown)";
    }
}
