using Readiness.Core.Reports;
using Readiness.Core.Secrets;

namespace Readiness.Core.Checks.Secrets;

/// <summary>
/// No tracked file holds a private key, a key container, a credential in nuget.config or a token of the common
/// forges and registries. Evidence names the file and line; the value itself never reaches the report.
/// </summary>
public sealed class NoneCommittedCheck : ICheck
{
    /// <summary>At most this many lines are listed per file.</summary>
    public const int MaxLinesPerFile = 20;

    public const string Advice =
        "Treat the credential as exposed: revoke or rotate it now, following your organisation's security policy "
        + "(deleting the file in a new commit does not remove it from history or from clones). Then remove it from the "
        + "repository and keep credentials in the CI system's secret store or environment variables.";

    public CheckDescriptor Descriptor { get; } = new(
        CheckIds.SecretsNoneCommitted,
        "No secrets are committed",
        Severity.Block,
        Standards.NuGetConfig,
        "Anything committed reaches every clone, fork and mirror, and stays in history. A key or token in a public "
        + "repository is found by automated scanners within minutes.",
        Advice)
    {
        Settings = [PrivateStrongNameKey],
    };

    /// <summary>Set true when the repository's strong-name key must stay private (it then blocks like any key).</summary>
    public const string PrivateStrongNameKey = "strong-name-key-private";

    public IEnumerable<Finding> Run(CheckContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var scan = SecretScanner.Scan(context.Snapshot.Files);
        var extra = Notes(scan);
        var scanned = $"{scan.TextFiles + scan.BinaryFiles} tracked files ({scan.TextFiles} scanned as text, {scan.BinaryFiles} binary checked by name and format)";
        var result = scan;
        if (!context.Parameters.Bool(PrivateStrongNameKey))
        {
            // .NET library guidance (strong naming) recommends committing the key pair of an open-source library so
            // that anyone can build it: it identifies, it does not secure. Information, unless configured private.
            var keys = scan.Hits.Where(h => h.Kind == KeyFiles.StrongNameKeyPair).ToList();
            foreach (var key in keys)
            {
                yield return Finding.Pass(
                    $"{key.Path} is a strong-name key pair: committing it is documented practice for open-source libraries "
                    + $"(.NET library guidance, strong naming), so it is reported, not judged as a secret; set {PrivateStrongNameKey}: true "
                    + "if your organisation's security policy keeps it private.",
                    null,
                    new Evidence(key.Path));
            }

            result = scan with { Hits = scan.Hits.Except(keys).ToList() };
        }

        if (result.Hits.Count == 0)
        {
            // A file that could not be scanned may hold anything: the check cannot pass on it.
            yield return extra.Length == 0
                ? Finding.Pass($"No secret found in {scanned}.")
                : Finding.Error($"No secret found in {scanned}, but not every file could be scanned:{extra}", null, [.. Gaps(result)]);
            yield break;
        }

        foreach (var file in result.Hits.GroupBy(h => h.Path, StringComparer.Ordinal))
        {
            var hits = file.ToArray();
            var kinds = string.Join(", ", hits.Select(h => h.Kind).Distinct(StringComparer.Ordinal));
            var lines = hits.Where(h => h.Line is not null).Select(h => h.Line!.Value).Distinct().Take(MaxLinesPerFile).ToArray();
            var where = lines.Length == 0 ? file.Key : $"{file.Key} (line{(lines.Length == 1 ? string.Empty : "s")} {string.Join(", ", lines)})";
            var evidence = lines.Length == 0 ? [new Evidence(file.Key)] : lines.Select(l => new Evidence(file.Key, l)).ToArray();
            yield return Finding.Fail(
                $"{where} holds {kinds} (recognised from: {string.Join("; ", hits.Select(h => h.Source).Distinct(StringComparer.Ordinal))}).",
                Advice,
                null,
                evidence);
        }

        var flagged = result.Hits.Select(h => h.Path).Distinct(StringComparer.Ordinal).Count();
        var clean = result.TextFiles + result.BinaryFiles - flagged;
        if (clean > 0)
        {
            yield return Finding.Pass($"The other {clean} tracked files hold no secret.");
        }

        if (extra.Length > 0)
        {
            yield return Finding.Error("Not every file could be scanned:" + extra, null, [.. Gaps(result)]);
        }
    }

    private static IEnumerable<Evidence> Gaps(SecretScanResult result) =>
        result.TooLarge.Take(MaxLinesPerFile).Select(p => new Evidence(p));

    private static string Notes(SecretScanResult result)
    {
        var notes = new List<string>();
        if (result.TooLarge.Count > 0)
        {
            notes.Add($"{result.TooLarge.Count} file(s) above {Snapshots.FileLimits.ScanMaxBytes / (1024 * 1024)} MiB were not read: "
                + string.Join(", ", result.TooLarge.Take(5)) + (result.TooLarge.Count > 5 ? ", …" : string.Empty));
        }

        notes.AddRange(result.Notes);
        return notes.Count == 0 ? string.Empty : " " + string.Join("; ", notes) + ".";
    }
}
