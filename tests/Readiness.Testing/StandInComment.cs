using System.Text.Json.Nodes;

namespace Readiness.Testing;

/// <summary>A pull request comment the forge stand-in holds; <see cref="Edits"/> counts updates.</summary>
public sealed record StandInComment(long Id, string Owner, string Repo, int Number, string Body, int Edits)
{
    public JsonObject ToJson(Uri baseUrl) => new()
    {
        ["id"] = Id,
        ["node_id"] = $"IC_{Id}",
        ["url"] = $"{baseUrl}api/v3/repos/{Owner}/{Repo}/issues/comments/{Id}",
        ["html_url"] = $"https://git.example/{Owner}/{Repo}/pull/{Number}#issuecomment-{Id}",
        ["body"] = Body,
        ["user"] = new JsonObject { ["login"] = "readiness[bot]", ["id"] = 1, ["type"] = "Bot" },
        ["created_at"] = "2026-11-20T12:00:00Z",
        ["updated_at"] = "2026-11-20T12:00:00Z",
    };
}
