using System.Globalization;
using System.Text;

using Readiness.Testing;

namespace Readiness.Bench;

/// <summary>Builds large test histories quickly by streaming them into <c>git fast-import</c> (git-fast-import(1)).</summary>
public static class FastImportRepository
{
    /// <summary>
    /// Fills an empty <paramref name="repo"/>: <paramref name="commits"/> commits on main spreading
    /// <paramref name="files"/> files, a tag every <c>commits / tags</c> commits (every other one annotated), and a side
    /// branch off the middle with <paramref name="sideTags"/> tags that main never reaches.
    /// </summary>
    public static void Fill(TestRepository repo, int commits, int files, int tags, int sideTags = 0)
    {
        ArgumentNullException.ThrowIfNull(repo);
        var stream = new StringBuilder();
        var start = TestRepository.DefaultStartDate.ToUnixTimeSeconds();
        var tagEvery = Math.Max(1, commits / Math.Max(1, tags));
        var tagged = 0;
        for (var i = 1; i <= commits; i++)
        {
            stream.Append("commit refs/heads/main\n").Append(CultureInfo.InvariantCulture, $"mark :{i}\n");
            Ident(stream, "committer", start + (i * 60));
            Data(stream, $"Change {i}\n");
            if (i > 1)
            {
                stream.Append(CultureInfo.InvariantCulture, $"from :{i - 1}\n");
            }

            // The first commit writes every file; later ones touch one file each, round robin.
            var first = i == 1 ? 0 : (i - 2) % files;
            var last = i == 1 ? files : first + 1;
            for (var f = first; f < last; f++)
            {
                stream.Append(CultureInfo.InvariantCulture, $"M 100644 inline {FilePath(f)}\n");
                Data(stream, $"// file {f}, change {i}\nnamespace Bramble.Sketches;\n");
            }

            stream.Append('\n');
            if (i % tagEvery == 0 && tagged < tags)
            {
                tagged++;
                Tag(stream, $"v1.{tagged / 100}.{tagged % 100}", i, annotated: tagged % 2 == 0, start + (i * 60));
            }
        }

        for (var s = 1; s <= sideTags; s++)
        {
            stream.Append("commit refs/heads/side\n").Append(CultureInfo.InvariantCulture, $"mark :{commits + s}\n");
            Ident(stream, "committer", start + (s * 61));
            Data(stream, $"Side change {s}\n");
            stream.Append(CultureInfo.InvariantCulture, $"from :{(s == 1 ? commits / 2 : commits + s - 1)}\n");
            stream.Append("M 100644 inline side.txt\n");
            Data(stream, $"side {s}\n");
            stream.Append('\n');
            Tag(stream, $"side-{s}", commits + s, annotated: s % 2 == 0, start + (s * 61));
        }

        repo.GitWithInput(stream.ToString(), "fast-import", "--quiet");
        repo.Git("reset", "-q", "--hard", "main");
    }

    public static string FilePath(int index) =>
        $"src/Bramble.Sketches/Part{index / 20:00}/Sketch{index:000}.cs";

    private static void Tag(StringBuilder stream, string name, int mark, bool annotated, long when)
    {
        if (annotated)
        {
            stream.Append(CultureInfo.InvariantCulture, $"tag {name}\nfrom :{mark}\n");
            Ident(stream, "tagger", when);
            Data(stream, $"Release {name}\n");
        }
        else
        {
            stream.Append(CultureInfo.InvariantCulture, $"reset refs/tags/{name}\nfrom :{mark}\n\n");
        }
    }

    private static void Ident(StringBuilder stream, string role, long when) =>
        stream.Append(CultureInfo.InvariantCulture, $"{role} {GitCli.UserName} <{GitCli.UserEmail}> {when} +0000\n");

    private static void Data(StringBuilder stream, string text) =>
        stream.Append(CultureInfo.InvariantCulture, $"data {Encoding.UTF8.GetByteCount(text)}\n").Append(text).Append('\n');
}
