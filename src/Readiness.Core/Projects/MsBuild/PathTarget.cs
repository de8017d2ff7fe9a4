namespace Readiness.Core.Projects.MsBuild;

/// <summary>An expanded path resolved against the repository: a repository-relative path, or outside it.</summary>
internal readonly record struct PathTarget(PathKind Kind, string Path)
{
    public static PathTarget Empty => new(PathKind.Empty, string.Empty);

    public static PathTarget Inside(string path) => new(PathKind.Inside, path);

    public static PathTarget Outside(string path) => new(PathKind.Outside, path);
}
