using System.Globalization;
using System.Text;

using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>A large repository made in one <c>git fast-import</c> (git-fast-import(1)): many packable projects, many files.</summary>
public static class ManyProjectsRepository
{
    /// <summary>
    /// A released library (the sample's root files) with <paramref name="projects"/> packable projects, filled with
    /// source files to <paramref name="files"/> files in all, committed once and tagged <c>v3.0.0</c> (annotated).
    /// </summary>
    public static TestRepository Create(int projects, int files)
    {
        var repo = TestRepository.Create();
        repo.WriteLibrary("3.0.0", "2026-11-20").Commit("Library");
        var stream = new StringBuilder();
        var when = TestRepository.DefaultStartDate.ToUnixTimeSeconds() + 86_400;
        stream.Append("commit refs/heads/main\n");
        stream.Append(CultureInfo.InvariantCulture, $"committer {GitCli.UserName} <{GitCli.UserEmail}> {when} +0000\n");
        Data(stream, $"{projects} packages\n");
        stream.Append("from refs/heads/main^0\n");
        var perProject = Math.Max(1, (files - (projects * 2)) / projects);
        for (var p = 0; p < projects; p++)
        {
            var name = $"Bramble.Part{p:000}";
            stream.Append(CultureInfo.InvariantCulture, $"M 100644 inline src/{name}/{name}.csproj\n");
            Data(stream, SampleLibrary.Project.Replace("Bramble.Sketches", name, StringComparison.Ordinal));
            stream.Append(CultureInfo.InvariantCulture, $"M 100644 inline src/{name}/README.md\n");
            Data(stream, $"# {name}\n");
            for (var f = 0; f < perProject; f++)
            {
                stream.Append(CultureInfo.InvariantCulture, $"M 100644 inline src/{name}/Sketch{f:000}.cs\n");
                Data(stream, $"namespace {name};\n\n/// <summary>Sketch {f} of {name}.</summary>\npublic sealed class Sketch{f:000} {{ }}\n");
            }
        }

        stream.Append('\n');
        repo.GitWithInput(stream.ToString(), "fast-import", "--quiet");
        repo.Git("reset", "-q", "--hard", "main");
        repo.AnnotatedTag("v3.0.0", "3.0.0\n");
        return repo;
    }

    private static void Data(StringBuilder stream, string text) =>
        stream.Append(CultureInfo.InvariantCulture, $"data {Encoding.UTF8.GetByteCount(text)}\n").Append(text).Append('\n');
}
