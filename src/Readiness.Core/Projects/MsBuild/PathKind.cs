namespace Readiness.Core.Projects.MsBuild;

/// <summary>Where an expanded path points.</summary>
internal enum PathKind
{
    Empty,
    Inside,
    Outside,
}
