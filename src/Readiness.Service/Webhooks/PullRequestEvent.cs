using System.Text.Json;
using System.Text.RegularExpressions;

namespace Readiness.Service.Webhooks;

/// <summary>
/// The fields of a <c>pull_request</c> delivery the service uses (payload fields per the forge's webhook reference:
/// <c>action</c>, <c>number</c>, <c>pull_request.head.sha</c>, <c>.base.ref</c>, <c>.labels[].name</c>, <c>.body</c>,
/// <c>repository.full_name</c>, <c>repository.clone_url</c>, <c>installation.id</c>).
/// </summary>
public sealed partial record PullRequestEvent(
    string Action,
    int Number,
    string Owner,
    string Name,
    string CloneUrl,
    string HeadSha,
    string BaseRef,
    IReadOnlyList<string> Labels,
    string? Body,
    long? InstallationId)
{
    /// <summary>The actions after which the report may have changed.</summary>
    public static readonly IReadOnlySet<string> RelevantActions =
        new HashSet<string>(["opened", "synchronize", "reopened", "edited", "labeled"], StringComparer.Ordinal);

    public string FullName => $"{Owner}/{Name}";

    /// <summary>Reads a delivery's body; null with a reason when it is not a usable pull request event.</summary>
    public static PullRequestEvent? Parse(ReadOnlySpan<byte> body, out string? problem)
    {
        try
        {
            using var doc = JsonDocument.Parse(body.ToArray(), new JsonDocumentOptions { MaxDepth = 64 });
            var root = doc.RootElement;
            if (root.ValueKind != JsonValueKind.Object)
            {
                problem = $"the payload is a JSON {root.ValueKind.ToString().ToLowerInvariant()}, not an object";
                return null;
            }

            var action = Str(root, "action");
            var pr = Obj(root, "pull_request");
            var repo = Obj(root, "repository");
            var head = pr is { } p ? Obj(p, "head") : null;
            var @base = pr is { } p2 ? Obj(p2, "base") : null;
            var number = root.TryGetProperty("number", out var n) && n.ValueKind == JsonValueKind.Number && n.TryGetInt32(out var num)
                ? num
                : pr is { } p3 && p3.TryGetProperty("number", out var n2) && n2.ValueKind == JsonValueKind.Number && n2.TryGetInt32(out var num2) ? num2 : 0;
            var fullName = repo is { } r ? Str(r, "full_name") : null;
            var cloneUrl = repo is { } r2 ? Str(r2, "clone_url") : null;
            var sha = head is { } h ? Str(h, "sha") : null;
            var baseRef = @base is { } b ? Str(b, "ref") : null;
            if (action is null || number <= 0 || fullName is null || cloneUrl is null || sha is null || baseRef is null)
            {
                problem = "the payload lacks action, number, repository.full_name, repository.clone_url, pull_request.head.sha or pull_request.base.ref";
                return null;
            }

            var parts = fullName.Split('/');
            if (parts.Length != 2 || !NamePart().IsMatch(parts[0]) || !NamePart().IsMatch(parts[1]) || parts.Any(x => x is "." or ".."))
            {
                problem = "repository.full_name is not owner/name";
                return null;
            }

            if (!Sha().IsMatch(sha))
            {
                problem = "pull_request.head.sha is not a 40-digit commit id";
                return null;
            }

            var labels = new List<string>();
            if (pr is { } p4 && p4.TryGetProperty("labels", out var ls) && ls.ValueKind == JsonValueKind.Array)
            {
                labels.AddRange(ls.EnumerateArray().Select(l => l.ValueKind == JsonValueKind.Object ? Str(l, "name") : null).OfType<string>());
            }

            long? installation = root.TryGetProperty("installation", out var inst) && inst.ValueKind == JsonValueKind.Object
                && inst.TryGetProperty("id", out var id) && id.ValueKind == JsonValueKind.Number && id.TryGetInt64(out var iid) ? iid : null;
            problem = null;
            return new PullRequestEvent(action, number, parts[0], parts[1], cloneUrl, sha.ToLowerInvariant(), baseRef, labels,
                pr is { } p5 ? Str(p5, "body") : null, installation);
        }
        catch (JsonException)
        {
            problem = "the payload is not JSON";
            return null;
        }
        catch (InvalidOperationException)
        {
            // A field of an unexpected JSON type that a check above let through: still the sender's error, one line.
            problem = "a field of the payload has the wrong JSON type";
            return null;
        }
    }

    private static JsonElement? Obj(JsonElement e, string name) =>
        e.ValueKind == JsonValueKind.Object && e.TryGetProperty(name, out var v) && v.ValueKind == JsonValueKind.Object ? v : null;

    private static string? Str(JsonElement e, string name) =>
        e.ValueKind == JsonValueKind.Object && e.TryGetProperty(name, out var v) && v.ValueKind == JsonValueKind.String ? v.GetString() : null;

    [GeneratedRegex("^[A-Za-z0-9_.-]{1,100}$", RegexOptions.CultureInvariant)]
    private static partial Regex NamePart();

    [GeneratedRegex("^[0-9a-fA-F]{40}$", RegexOptions.CultureInvariant)]
    private static partial Regex Sha();
}
