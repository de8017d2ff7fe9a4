namespace Readiness.Core.Projects.MsBuild;

/// <summary>One evaluation of one project (for one target framework, or none): final properties, items, notes.</summary>
/// <param name="DotNetSdk">The project uses the .NET SDK, whose version and pack defaults are modelled.</param>
internal sealed record Evaluation(
    PropertyTable Properties,
    ItemSet Items,
    IReadOnlyList<string> Imports,
    IReadOnlyList<string> Unevaluated,
    bool DotNetSdk);
