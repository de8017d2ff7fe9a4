using System.Text.Json.Nodes;

namespace Readiness.Testing;

/// <summary>Webhook payloads shaped like the forge's (only the documented fields the service reads, plus a few more).</summary>
public static class WebhookPayloads
{
    public static string PullRequest(
        string action, int number, string fullName, string cloneUrl, string headSha, string baseRef,
        IEnumerable<string>? labels = null, string? body = null, long? installation = null)
    {
        var root = new JsonObject
        {
            ["action"] = action,
            ["number"] = number,
            ["pull_request"] = new JsonObject
            {
                ["number"] = number,
                ["state"] = "open",
                ["title"] = "Release 2.4.0",
                ["body"] = body,
                ["head"] = new JsonObject { ["sha"] = headSha, ["ref"] = "prepare-2.4.0" },
                ["base"] = new JsonObject { ["ref"] = baseRef },
                ["labels"] = new JsonArray((labels ?? []).Select(l => (JsonNode)new JsonObject { ["name"] = l }).ToArray()),
            },
            ["repository"] = new JsonObject
            {
                ["full_name"] = fullName,
                ["clone_url"] = cloneUrl,
                ["html_url"] = $"https://git.example/{fullName}",
            },
            ["sender"] = new JsonObject { ["login"] = "dev" },
        };
        if (installation is { } id)
        {
            root["installation"] = new JsonObject { ["id"] = id };
        }

        return root.ToJsonString();
    }
}
