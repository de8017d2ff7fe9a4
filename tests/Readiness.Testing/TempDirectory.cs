namespace Readiness.Testing;

/// <summary>A fresh folder under the system temp folder, deleted (with everything in it) on dispose.</summary>
public sealed class TempDirectory : IDisposable
{
    public TempDirectory(string prefix = "readiness-")
    {
        Path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), prefix + Guid.NewGuid().ToString("N")[..12]);
        Directory.CreateDirectory(Path);
    }

    public string Path { get; }

    /// <summary>A path inside the folder (not created).</summary>
    public string Combine(params string[] parts) => System.IO.Path.Combine([Path, .. parts]);

    public void Dispose() => Delete(Path);

    /// <summary>Deletes a folder tree, clearing read-only flags (git makes object files read-only).</summary>
    public static void Delete(string path)
    {
        if (!Directory.Exists(path))
        {
            return;
        }

        try
        {
            Directory.Delete(path, recursive: true);
        }
        catch (UnauthorizedAccessException)
        {
            // Windows refuses to delete read-only files (git makes object files read-only): clear the flag, retry.
            var options = new EnumerationOptions { RecurseSubdirectories = true, AttributesToSkip = FileAttributes.ReparsePoint };
            foreach (var file in Directory.EnumerateFiles(path, "*", options))
            {
                File.SetAttributes(file, FileAttributes.Normal);
            }

            TryDelete(path);
        }
        catch (IOException)
        {
            TryDelete(path);
        }
    }

    private static void TryDelete(string path)
    {
        try
        {
            Directory.Delete(path, recursive: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Best effort: a leftover temp folder must not fail a test.
        }
    }
}
