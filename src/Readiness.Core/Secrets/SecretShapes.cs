using System.Text.RegularExpressions;

namespace Readiness.Core.Secrets;

/// <summary>
/// The credential shapes the secrets check recognises, each with its source. Header strings are assembled from
/// parts so that this file itself holds no complete key header.
/// </summary>
public static class SecretShapes
{
    private const string Dashes = "-----";
    // Not RegexOptions.Compiled: compiling every shape to IL and JIT-compiling it costs more at start than the
    // interpreter spends on the few files whose prefixes match; the ahead-of-time build interprets them anyway.
    private const RegexOptions Options = RegexOptions.CultureInvariant | RegexOptions.ExplicitCapture;
    private static readonly TimeSpan Timeout = TimeSpan.FromSeconds(2);

    /// <summary>The start of every PEM-style armour line (RFC 7468 §2).</summary>
    public static readonly string ArmorBegin = Dashes + "BEGIN ";

    public static IReadOnlyList<SecretShape> All { get; } =
    [
        // Private key armour followed by a base64 body (raw, or inside a string with \n escapes).
        // Labels: "PRIVATE KEY" and "ENCRYPTED PRIVATE KEY" (RFC 7468 §10, §11); "RSA/EC/DSA PRIVATE KEY" (OpenSSL's
        // traditional forms, named in RFC 7468 §1 as legacy); "OPENSSH PRIVATE KEY" (OpenSSH PROTOCOL.key);
        // "PGP PRIVATE KEY BLOCK" (RFC 4880 §6.2).
        new(
            "private-key",
            "private key block",
            [ArmorBegin],
            new Regex(
                Regex.Escape(ArmorBegin) + "(?<label>(RSA |EC |DSA |OPENSSH |ENCRYPTED |PGP )?PRIVATE KEY( BLOCK)?)" + Dashes
                + @"[ \t]*(\\r)?(\\n|\r?\n)([A-Za-z-]+:[^\r\n\\]*(\\r)?(\\n|\r?\n))*[ \t]*(\\r)?(\\n|\r?\n)?[ \t]*(?<body>[A-Za-z0-9+/]{16,})",
                Options,
                Timeout),
            "RFC 7468 (textual encodings), OpenSSH PROTOCOL.key, RFC 4880 §6.2"),

        // GitHub: ghp_ (classic personal), gho_ (OAuth), ghu_ (user-to-server), ghs_ (server-to-server), ghr_ (refresh);
        // prefixes from the GitHub blog "Behind GitHub's new authentication token formats" (2021-04-05); the 36-character
        // base62 body is common practice, no published source.
        Token("github-token", "GitHub token", ["ghp_", "gho_", "ghu_", "ghs_", "ghr_"], @"gh[pousr]_(?<body>[A-Za-z0-9]{36})",
            "GitHub blog, \"Behind GitHub's new authentication token formats\" (2021) for the prefixes; length: common practice, no published source"),

        // Fine-grained personal access tokens: github_pat_ + 22 + '_' + 59 characters. Common practice, no published source.
        Token("github-fine-grained-token", "GitHub fine-grained personal access token", ["github_pat_"],
            @"github_pat_(?<body>[A-Za-z0-9]{22}_[A-Za-z0-9]{59})", "common practice, no published source"),

        // GitLab personal access tokens: prefix glpat- (GitLab docs, "Token overview: token prefixes"); 20 or more
        // characters follow (common practice).
        Token("gitlab-token", "GitLab personal access token", ["glpat-"], "glpat-(?<body>[A-Za-z0-9_-]{20,})",
            "GitLab documentation, token prefixes (glpat-); length: common practice, no published source"),

        // npm access tokens: npm_ + 36 base62 characters (prefix announced by npm in 2021; length common practice).
        Token("npm-token", "npm access token", ["npm_"], "npm_(?<body>[A-Za-z0-9]{36})",
            "npm access token format (npm_ prefix, 2021); length: common practice, no published source"),

        // NuGet.org API keys: oy2 + 43 lower-case alphanumerics. Common practice, no published source.
        Token("nuget-api-key", "NuGet API key", ["oy2"], "oy2(?<body>[a-z0-9]{43})", "common practice, no published source"),

        // AWS access key ids: AKIA (long-term) and ASIA (temporary) + 16 upper-case alphanumerics; AWS IAM User Guide,
        // "IAM identifiers: unique identifier prefixes".
        Token("aws-access-key-id", "AWS access key id", ["AKIA", "ASIA"], "(AKIA|ASIA)(?<body>[0-9A-Z]{16})",
            "AWS IAM User Guide, unique identifier prefixes (AKIA, ASIA)"),

        // Slack tokens: xoxb- (bot), xoxp- (user), xoxa-/xoxr- (app, refresh), xoxs-; Slack API documentation, "Token types".
        Token("slack-token", "Slack token", ["xoxa-", "xoxb-", "xoxp-", "xoxr-", "xoxs-"], "xox[abprs]-(?<body>[0-9A-Za-z-]{10,})",
            "Slack API documentation, token types"),

        // Azure Storage account keys in connection strings: AccountKey=<88-character base64> (Microsoft docs,
        // "Configure Azure Storage connection strings"; the 64-byte key length is from memory).
        new(
            "azure-storage-key",
            "Azure Storage account key",
            ["AccountKey="],
            new Regex(@"AccountKey=(?<body>[A-Za-z0-9+/]{86}==)", Options, Timeout),
            "Microsoft docs, Azure Storage connection strings (AccountKey); key length from memory"),
    ];

    private static SecretShape Token(string id, string name, string[] prefixes, string pattern, string source) =>
        new(id, name, prefixes, new Regex("(?<![A-Za-z0-9_])" + pattern + "(?![A-Za-z0-9_])", Options, Timeout), source);
}
