using System.Text;

namespace Readiness.Rendering.Tests;

/// <summary>
/// Snapshot comparison against plain files in <c>Expected/</c>. With <c>READINESS_UPDATE_SNAPSHOTS=1</c> the
/// expected file is rewritten instead (review the diff before committing it).
/// </summary>
internal static class ExpectedFile
{
    public const string UpdateVariable = "READINESS_UPDATE_SNAPSHOTS";

    public static void Match(string actual, string fileName)
    {
        var path = Path.Combine(ProjectDirectory(), "Expected", fileName);
        if (Environment.GetEnvironmentVariable(UpdateVariable) == "1")
        {
            Directory.CreateDirectory(Path.GetDirectoryName(path)!);
            File.WriteAllText(path, actual, new UTF8Encoding(false));
            return;
        }

        Assert.True(File.Exists(path), $"No expected file {path}; run the tests with {UpdateVariable}=1 to create it.");
        var expected = File.ReadAllText(path, Encoding.UTF8).Replace("\r\n", "\n", StringComparison.Ordinal);
        if (expected == actual)
        {
            return;
        }

        var received = Path.Combine(AppContext.BaseDirectory, "Received", fileName);
        Directory.CreateDirectory(Path.GetDirectoryName(received)!);
        File.WriteAllText(received, actual, new UTF8Encoding(false));
        Assert.Fail($"{fileName} differs from the expected file {FirstDifference(expected, actual)}. "
            + $"Output written to {received}; set {UpdateVariable}=1 to accept it.");
    }

    private static string FirstDifference(string expected, string actual)
    {
        var e = expected.Split('\n');
        var a = actual.Split('\n');
        for (var i = 0; i < Math.Max(e.Length, a.Length); i++)
        {
            var el = i < e.Length ? e[i] : "<end of file>";
            var al = i < a.Length ? a[i] : "<end of file>";
            if (el != al)
            {
                return $"at line {i + 1}:\n  expected: {el}\n  actual:   {al}";
            }
        }

        return "(same lines, different endings)";
    }

    /// <summary>The test project's source folder, found from the build output by its project file.</summary>
    private static string ProjectDirectory()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "Readiness.Rendering.Tests.csproj")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("Readiness.Rendering.Tests.csproj not found above " + AppContext.BaseDirectory);
    }
}
