namespace Readiness.Testing;

/// <summary>Finds this solution's own folder (the one holding Readiness.sln) from the test binaries.</summary>
public static class RepositoryRoot
{
    public static string Path
    {
        get
        {
            var folder = new DirectoryInfo(AppContext.BaseDirectory);
            while (folder is not null && !File.Exists(System.IO.Path.Combine(folder.FullName, "Readiness.sln")))
            {
                folder = folder.Parent;
            }

            return folder?.FullName ?? throw new InvalidOperationException("Readiness.sln not found above the test binaries");
        }
    }

    public static bool Updating => Environment.GetEnvironmentVariable("READINESS_UPDATE_SNAPSHOTS") == "1";
}
