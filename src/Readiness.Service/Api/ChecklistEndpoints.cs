using Readiness.Core.Checklists;
using Readiness.Core.Configuration;

namespace Readiness.Service.Api;

/// <summary>
/// <c>GET /api/checklists</c> and <c>GET /api/checklists/{name}</c>: the organisation's checklists (its folder first,
/// then the built-in ones) so every client applies the same rules.
/// </summary>
public sealed class ChecklistEndpoints(IChecklistSource checklists, BuiltInChecklists builtIn)
{
    public IResult List(HttpRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        var builtInNames = builtIn.Names.ToHashSet(StringComparer.Ordinal);
        var root = $"{request.Scheme}://{request.Host}{request.PathBase}";
        var items = checklists.Names.Select(name => new
        {
            name,
            origin = IsOrganisations(name, builtInNames) ? "organisation" : "built-in",
            url = $"{root}/api/checklists/{Uri.EscapeDataString(name)}",
        });
        return Results.Json(new { checklists = items }, ServiceJson.Options);
    }

    public IResult Get(string name)
    {
        (string File, string Text)? found;
        try
        {
            found = checklists.Find(name);
        }
        catch (ConfigurationException e)
        {
            return Results.Json(new { error = e.Message }, statusCode: StatusCodes.Status500InternalServerError);
        }

        return found is { } f
            ? Results.Text(f.Text, "application/yaml; charset=utf-8")
            : Results.Json(new { error = $"no checklist named '{name}'", available = checklists.Names }, statusCode: StatusCodes.Status404NotFound);
    }

    private bool IsOrganisations(string name, HashSet<string> builtInNames) =>
        !builtInNames.Contains(name) || checklists.Find(name)?.File != builtIn.Find(name)?.File;
}
