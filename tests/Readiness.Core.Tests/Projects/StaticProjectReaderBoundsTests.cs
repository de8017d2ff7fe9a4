using Readiness.Core.Projects;
using Readiness.Core.Projects.MsBuild;
using Readiness.Core.Snapshots;
using Readiness.Testing;

namespace Readiness.Core.Tests.Projects;

/// <summary>
/// Hostile project files whose size grows the work: long condition chains, growing values, deep XML, symbolic links.
/// Each ends with an answer (a value, or a named reason), never a stack overflow or unbounded memory.
/// </summary>
public sealed class StaticProjectReaderBoundsTests
{
    private const string Lib = "src/Bramble.Sketches/Bramble.Sketches.csproj";

    [Theory]
    [InlineData(" and ", "'a' == 'a'", "set")]
    [InlineData(" or ", "'a' == 'b'", null)]
    public void ConditionChainOfSixtyThousandTerms_IsEvaluated(string separator, string term, string? expected)
    {
        // MSBuild conditions (learn.microsoft.com/visualstudio/msbuild/msbuild-conditions): 'and'/'or' chains of any length.
        var condition = string.Join(separator, Enumerable.Repeat(term, 60_000));
        var project = Single(Read((Lib, Sdk($"<PropertyGroup Condition=\"{condition}\"><Flag>set</Flag></PropertyGroup>"))));

        Assert.Equal(expected, project.Value("Flag"));
    }

    [Fact]
    public void ChainWithOneTrueTermAtTheEnd_OrIsTrue()
    {
        var condition = string.Join(" or ", Enumerable.Repeat("'a' == 'b'", 1_000)) + " or 'x' == 'x'";
        var project = Single(Read((Lib, Sdk($"<PropertyGroup Condition=\"{condition}\"><Flag>set</Flag></PropertyGroup>"))));

        Assert.Equal("set", project.Value("Flag"));
    }

    [Fact]
    public void ReplaceThatWouldGrowPastTheCap_IsNotBuilt_AndSaysWhy()
    {
        var big = new string('x', 60_000);
        var project = Single(Read((Lib, Sdk($"<PropertyGroup><P>{big}</P><Q>{big}</Q><R>$(P.Replace('x', '$(Q)'))</R></PropertyGroup>"))));

        Assert.True((project.Value("R") ?? string.Empty).Length <= 64 * 1024);
        Assert.Contains(project.Unevaluated, n => n.Contains("Replace would grow the value", StringComparison.Ordinal));
    }

    [Fact]
    public void ChainOfGrowingProperties_StopsAtTheEvaluationBudget()
    {
        // 400 copies of a 60 KB value: each stays under the per-value cap, together they pass the evaluation's budget.
        var body = $"<Base>{new string('v', 60_000)}</Base>" + string.Concat(Enumerable.Range(1, 400).Select(i => $"<P{i}>$(Base)</P{i}>"));
        var project = Single(Read((Lib, Sdk($"<PropertyGroup>{body}</PropertyGroup>"))));

        Assert.Contains(project.Unevaluated, n => n.Contains("characters of values; the rest is not evaluated", StringComparison.Ordinal));
    }

    [Fact]
    public void XmlNestedDeeperThanTheBound_IsAProblemWithItsLine()
    {
        var deep = string.Concat(Enumerable.Repeat("<a>", 20_000)) + string.Concat(Enumerable.Repeat("</a>", 20_000));
        var model = Read((Lib, Sdk($"\n<PropertyGroup>{deep}</PropertyGroup>")));

        Assert.Empty(model.Projects);
        var problem = Assert.Single(model.Problems);
        Assert.Equal(ProjectProblemKind.Unreadable, problem.Kind);
        Assert.Equal(2, problem.Line);
        Assert.Contains("nested deeper than 64 levels", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void InvalidUtf8_IsUnreadable()
    {
        // XML 1.0 §4.3.3: a document in UTF-8 that is not valid UTF-8 is a fatal error.
        var bytes = System.Text.Encoding.UTF8.GetBytes(Sdk("<PropertyGroup><Description>Sketches</Description></PropertyGroup>"));
        bytes[Array.IndexOf(bytes, (byte)'S', 20)] = 0xC3;
        var model = new StaticProjectReader().Read(new InMemoryFileTree().Add(Lib, bytes));

        Assert.Empty(model.Projects);
        Assert.Equal(ProjectProblemKind.Unreadable, Assert.Single(model.Problems).Kind);
    }

    [Fact]
    public void ImportOutsideTheRepository_IsASkippedProblemNamingTheImport()
    {
        var model = Read((Lib, Sdk("\n<Import Project=\"../../../elsewhere/evil.props\" />")));

        Assert.Single(model.Projects);
        var problem = Assert.Single(model.Problems);
        Assert.Equal(ProjectProblemKind.Skipped, problem.Kind);
        Assert.Equal(Lib, problem.Path);
        Assert.Equal(2, problem.Line);
        Assert.Contains("outside the repository", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NotesOfOneEvaluation_AreCapped_WithTheRestCounted()
    {
        var body = string.Concat(Enumerable.Range(0, 500).Select(i => $"<P{i}>$(Undefined{i})</P{i}>"));
        var project = Single(Read((Lib, Sdk($"<PropertyGroup>{body}</PropertyGroup>"))));

        Assert.True(project.Unevaluated.Count <= 201);
        Assert.Contains(project.Unevaluated, n => n.Contains("more notes of this evaluation are not listed", StringComparison.Ordinal));
    }

    private static ProjectModel Read(params (string Path, string Text)[] files) =>
        new StaticProjectReader().Read(new InMemoryFileTree(files.Select(f => KeyValuePair.Create(f.Path, f.Text))));

    private static ProjectInfo Single(ProjectModel model)
    {
        Assert.DoesNotContain(model.Problems, p => p.Kind == ProjectProblemKind.Unreadable);
        return Assert.Single(model.Projects);
    }

    private static string Sdk(string body) => $"<Project Sdk=\"Microsoft.NET.Sdk\">{body}</Project>";
}
