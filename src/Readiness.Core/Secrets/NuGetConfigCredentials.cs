using System.Xml;

namespace Readiness.Core.Secrets;

/// <summary>
/// Credentials written into a <c>nuget.config</c>: <c>packageSourceCredentials</c> entries <c>ClearTextPassword</c>
/// and <c>Password</c> (encrypted, but still a credential in the repository), and <c>apikeys</c> entries
/// (https://learn.microsoft.com/nuget/reference/nuget-config-file). Values that only name an environment variable
/// (<c>%NAME%</c>, which NuGet expands) are not secrets. Read without DTDs.
/// </summary>
public static class NuGetConfigCredentials
{
    public static bool IsNuGetConfig(string path) =>
        string.Equals(Path.GetFileName(path), "nuget.config", StringComparison.OrdinalIgnoreCase);

    public static IEnumerable<SecretHit> Find(string path, string text, ICollection<string> notes)
    {
        ArgumentNullException.ThrowIfNull(notes);
        var hits = new List<SecretHit>();
        var settings = new XmlReaderSettings
        {
            DtdProcessing = DtdProcessing.Prohibit,
            XmlResolver = null,
            MaxCharactersInDocument = 4 * 1024 * 1024,
            IgnoreComments = true,
        };
        try
        {
            using var reader = XmlReader.Create(new StringReader(text), settings);
            var stack = new List<string>();
            while (reader.Read())
            {
                if (reader.NodeType == XmlNodeType.EndElement)
                {
                    stack.RemoveAt(stack.Count - 1);
                    continue;
                }

                if (reader.NodeType != XmlNodeType.Element)
                {
                    continue;
                }

                var name = reader.LocalName;
                if (name.Equals("add", StringComparison.OrdinalIgnoreCase) && Check(stack, reader) is { } kind)
                {
                    hits.Add(new SecretHit(path, ((IXmlLineInfo)reader).LineNumber, kind, Source));
                }

                if (!reader.IsEmptyElement)
                {
                    stack.Add(name);
                }
            }
        }
        catch (XmlException e)
        {
            notes.Add($"{path}:{e.LineNumber}: not readable as XML ({e.Message}); its credentials were not checked");
        }

        return hits;
    }

    private const string Source = "nuget.config reference: packageSourceCredentials, apikeys";

    private static string? Check(List<string> stack, XmlReader reader)
    {
        var key = reader.GetAttribute("key") ?? string.Empty;
        var value = reader.GetAttribute("value") ?? string.Empty;
        if (value.Trim().Length == 0 || IsEnvironmentReference(value))
        {
            return null;
        }

        var inCredentials = stack.Count >= 2 && stack[^2].Equals("packageSourceCredentials", StringComparison.OrdinalIgnoreCase);
        if (inCredentials && key.Equals("ClearTextPassword", StringComparison.OrdinalIgnoreCase))
        {
            return "clear-text password in nuget.config (packageSourceCredentials)";
        }

        if (inCredentials && key.Equals("Password", StringComparison.OrdinalIgnoreCase))
        {
            return "encrypted password in nuget.config (packageSourceCredentials)";
        }

        return stack.Count >= 1 && stack[^1].Equals("apikeys", StringComparison.OrdinalIgnoreCase)
            ? "API key in nuget.config (apikeys)"
            : null;
    }

    private static bool IsEnvironmentReference(string value)
    {
        var v = value.Trim();
        return v.Length > 2 && v[0] == '%' && v[^1] == '%' && v.IndexOf('%', 1) == v.Length - 1;
    }
}
