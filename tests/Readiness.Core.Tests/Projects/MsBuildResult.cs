namespace Readiness.Core.Tests.Projects;

/// <summary>What <c>dotnet msbuild -getProperty -getItem</c> printed: properties, and items with their metadata.</summary>
internal sealed record MsBuildResult(
    IReadOnlyDictionary<string, string> Properties,
    IReadOnlyDictionary<string, IReadOnlyList<IReadOnlyDictionary<string, string>>> Items,
    string Json)
{
    public string Property(string name) => Properties.TryGetValue(name, out var v) ? v : string.Empty;

    public IReadOnlyList<IReadOnlyDictionary<string, string>> ItemsOf(string type) =>
        Items.TryGetValue(type, out var list) ? list : [];
}
